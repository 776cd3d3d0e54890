import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { addDays, dayIn, dayStartIn, KIOSK_SWITCHES, visitorSettingsOf, type KioskEventType, type KioskSwitch, type RevisionSnapshot } from '@mantlepiece/shared';
import { NOBODY } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { KioskEvent } from '../kiosks/models/kiosk-event.model.js';
import { KioskHeartbeat } from '../kiosks/models/kiosk-heartbeat.model.js';
import { Kiosk } from '../kiosks/models/kiosk.model.js';
import { ReleasesService } from '../releases/releases.service.js';
import { ReleasesWorker } from '../releases/releases.worker.js';
import { Revision } from '../revisions/models/revision.model.js';
import { User } from '../users/models/user.model.js';
import { VenueMembership } from '../users/models/venue-membership.model.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Station } from '../venues/models/station.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { DEMO_GALLERY, DEMO_KIOSK_STATION } from './demo-scenario.js';

const MINUTE_MS = 60_000;
const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;
/** Thirty days of visits, so Insights' default range is full on a first start. */
const DAYS = 30;
/** Six hours of reports every five minutes, with a network drop in the middle, for the kiosk's history. */
const HEARTBEAT_EVERY_MS = 5 * MINUTE_MS;
const HEARTBEATS = 72;
const APP_VERSION = '0.1.0';

/** A small seeded generator (mulberry32), so every first start invents the same gallery. */
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

/** An id shaped like a kiosk's random UUID, drawn from the seeded generator. */
function uuidFrom(random: () => number): string {
  const hex = Array.from({ length: 32 }, () => Math.floor(random() * 16).toString(16));
  hex[12] = '4';
  hex[16] = ((parseInt(hex[16]!, 16) & 0x3) | 0x8).toString(16);
  const s = hex.join('');
  return `${s.slice(0, 8)}-${s.slice(8, 12)}-${s.slice(12, 16)}-${s.slice(16, 20)}-${s.slice(20)}`;
}

const pick = <T>(random: () => number, items: readonly T[]): T => items[Math.floor(random() * items.length)]!;

type EventRow = Pick<KioskEvent, 'id' | 'kioskId' | 'galleryId' | 'type' | 'at' | 'storyId' | 'panelId' | 'widgetType' | 'param' | 'locale' | 'dwellMs' | 'switch' | 'receivedAt'>;

interface ReleasedStory {
  storyId: number;
  panels: { id: number; widgets: { widgetType: string; params: string[] }[] }[];
}

/**
 * The demo venue as a first start should show it: the approved stories in a published release, a
 * demo kiosk that has reported for six hours, and thirty days of invented visits to its stories.
 * The kiosk is marked demo, so the studio says so and the fleet watcher leaves it alone.
 */
@Injectable()
export class DemoFleet {
  constructor(
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    @InjectModel(Station) private readonly stations: typeof Station,
    @InjectModel(User) private readonly users: typeof User,
    @InjectModel(Kiosk) private readonly kiosks: typeof Kiosk,
    @InjectModel(KioskHeartbeat) private readonly heartbeats: typeof KioskHeartbeat,
    @InjectModel(KioskEvent) private readonly events: typeof KioskEvent,
    @InjectModel(Revision) private readonly revisions: typeof Revision,
    private readonly releases: ReleasesService,
    private readonly worker: ReleasesWorker,
    private readonly clock: Clock,
  ) {}

  async seed(technicianEmail: string): Promise<void> {
    const gallery = await this.galleries.findOne({ where: { name: DEMO_GALLERY.name }, include: [Venue] });
    const technician = await this.users.findOne({ where: { email: technicianEmail }, include: [VenueMembership] });
    if (!gallery || !technician) throw new Error('the demo gallery and technician must exist before the demo fleet');
    const releaseId = await this.publishFirstRelease(gallery.id, technician);
    const station = await this.stations.create({ ...DEMO_KIOSK_STATION, galleryId: gallery.id });
    const now = this.clock.now();
    const random = seededRandom(20_270_301);
    const kiosk = await this.kiosks.create({
      stationId: station.id,
      pairedAt: new Date(now.getTime() - DAYS * DAY_MS),
      pairedById: technician.id,
      demo: true,
      ...this.lastReport(now, releaseId),
    });
    await this.heartbeats.bulkCreate(this.heartbeatHistory(kiosk.id, releaseId, now));
    const stories = await this.releasedStories(releaseId);
    const rows = this.visits(random, kiosk.id, gallery.id, stories, now, gallery.venue!.timeZone);
    // In slices, so no single INSERT grows past the server's packet limit.
    for (let start = 0; start < rows.length; start += 2000) await this.events.bulkCreate(rows.slice(start, start + 2000));
  }

  /** Built and published as a technician would, but waited for here, so the seed ends with it Live. */
  private async publishFirstRelease(galleryId: number, technician: User): Promise<number> {
    const { id } = await this.releases.requestRelease(galleryId, {}, technician);
    // Built here, unless the worker's own pass (kicked by the request) claimed it first: then that
    // pass is running, and the seed waits for it to end.
    await this.worker.buildQueued();
    await this.worker.idle();
    const built = await this.releases.get(id, technician);
    if (built.state !== 'ready') throw new Error(`the demo release ended ${built.state}: ${built.failure ?? 'no reason given'}`);
    await this.releases.publish(id, technician);
    return id;
  }

  private lastReport(now: Date, releaseId: number) {
    return {
      lastHeartbeatAt: new Date(now.getTime() - 40_000),
      lastReleaseId: releaseId,
      appVersion: APP_VERSION,
      uptimeS: 6 * 3600,
      storageUsedBytes: 48_234_496,
      lastError: null,
    };
  }

  private heartbeatHistory(kioskId: number, releaseId: number, now: Date) {
    const last = now.getTime() - 40_000;
    return Array.from({ length: HEARTBEATS }, (_unused, back) => back)
      // Twenty minutes without reports two hours ago: the venue's network dropped, the kiosk played on from its store.
      .filter((back) => back < 24 || back > 27)
      .map((back) => ({
        kioskId,
        receivedAt: new Date(last - back * HEARTBEAT_EVERY_MS),
        releaseId,
        appVersion: APP_VERSION,
        uptimeS: Math.max(60, 6 * 3600 - back * (HEARTBEAT_EVERY_MS / 1000)),
        storageUsedBytes: 48_234_496,
        lastError: back === 23 ? 'The network was unreachable for 20 minutes; played the stored release.' : null,
      }))
      .reverse();
  }

  private async releasedStories(releaseId: number): Promise<ReleasedStory[]> {
    const { stories } = await this.releases.get(releaseId, NOBODY);
    const revisions = new Map((await this.revisions.findAll({ where: { id: stories.map((s) => s.revisionId) } })).map((r) => [r.id, r.snapshot as RevisionSnapshot]));
    return stories.map(({ storyId, revisionId }) => ({
      storyId,
      panels: (revisions.get(revisionId)?.panels ?? []).map((panel) => ({
        id: panel.id,
        widgets: panel.widgets.map((widget) => ({ widgetType: widget.widgetType, params: visitorSettingsOf(widget.widgetType) })),
      })),
    }));
  }

  /**
   * Invented visits in opening hours (10:00 to 17:00 on the venue's clock; an hour off on the two
   * days a year its clocks change), busier at weekends: a language chosen now and then, a story
   * opened, some of its panels read, its widgets tried. Nothing after now.
   */
  private visits(random: () => number, kioskId: number, galleryId: number, stories: ReleasedStory[], now: Date, timeZone: string): EventRow[] {
    const rows: EventRow[] = [];
    const today = dayIn(now, timeZone);
    const add = (type: KioskEventType, at: number, fields: Partial<EventRow> = {}) => {
      if (at >= now.getTime()) return;
      rows.push({
        id: uuidFrom(random), kioskId, galleryId, type, at: new Date(at), storyId: null, panelId: null, widgetType: null, param: null,
        locale: null, dwellMs: null, switch: null, receivedAt: new Date(at + 30_000), ...fields,
      });
    };
    for (let day = DAYS - 1; day >= 0; day -= 1) {
      const date = addDays(today, -day);
      const dayStart = dayStartIn(date, timeZone).getTime();
      const weekday = new Date(`${date}T00:00:00Z`).getUTCDay();
      const visitors = (weekday === 0 || weekday === 6 ? 45 : 25) + Math.floor(random() * 15);
      for (let visitor = 0; visitor < visitors; visitor += 1) {
        let at = dayStart + 10 * HOUR_MS + Math.floor(random() * 7 * HOUR_MS);
        if (random() < 0.3) add('language_chosen', (at += 4000), { locale: random() < 0.6 ? 'fr' : 'es' });
        if (random() < 0.08) add('switch_used', (at += 3000), { switch: pick<KioskSwitch>(random, KIOSK_SWITCHES) });
        // The first story in the menu is opened most, as the first card on a screen is.
        const story = stories[Math.min(stories.length - 1, Math.floor(random() ** 1.6 * stories.length))];
        if (!story) continue;
        add('story_opened', (at += 5000), { storyId: story.storyId });
        for (const panel of story.panels) {
          const dwellMs = 4000 + Math.floor(random() * random() * 40_000);
          for (const widget of panel.widgets) {
            if (widget.params.length === 0 || random() < 0.3) continue;
            for (let touch = Math.floor(random() * 4); touch >= 0; touch -= 1) {
              add('widget_touched', at + Math.floor(random() * dwellMs), { storyId: story.storyId, panelId: panel.id, widgetType: widget.widgetType, param: pick(random, widget.params) });
            }
          }
          add('panel_viewed', (at += dwellMs), { storyId: story.storyId, panelId: panel.id, dwellMs });
          if (random() < 0.25) break;
        }
      }
    }
    return rows;
  }
}
