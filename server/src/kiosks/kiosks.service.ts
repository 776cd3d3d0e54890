import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, QueryTypes } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { EventsResponse, KioskView, Page } from '@mantlepiece/shared';
import { AuditService } from '../audit/audit.service.js';
import { personAt, scopeWhere, venueScope, type Member } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { pageWindow, toPage } from '../common/page.js';
import { unknownReference } from '../common/validation.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import { ReleasePanel } from '../releases/models/release-panel.model.js';
import { ReleaseStory } from '../releases/models/release-story.model.js';
import { Release } from '../releases/models/release.model.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Station } from '../venues/models/station.model.js';
import type { HeartbeatDto, KioskEventDto, KioskEventsDto, ListKiosksQuery } from './dto/kiosk-report.dto.js';
import type { PairedKiosk } from './device-token.guard.js';
import { FLEET_KEEPERS, refuseIfRevoked } from './kiosk-policy.js';
import { servableReleasesOf } from './kiosk-releases.service.js';
import { toKioskView } from './kiosks.presenter.js';
import { KioskHeartbeat } from './models/kiosk-heartbeat.model.js';
import { Kiosk } from './models/kiosk.model.js';

type PlacedKiosk = Kiosk & { station: Station & { gallery: Gallery } };

const EVENT_COLUMNS = ['id', 'kiosk_id', 'gallery_id', 'type', 'at', 'story_id', 'panel_id', 'widget_type', 'param', 'locale', 'dwell_ms', 'switch', 'received_at'];

@Injectable()
export class KiosksService {
  constructor(
    @InjectModel(Kiosk) private readonly kiosks: typeof Kiosk,
    @InjectModel(KioskHeartbeat) private readonly heartbeats: typeof KioskHeartbeat,
    @InjectModel(Release) private readonly releases: typeof Release,
    @InjectModel(ReleaseStory) private readonly releaseStories: typeof ReleaseStory,
    @InjectModel(ReleasePanel) private readonly releasePanels: typeof ReleasePanel,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  /** The latest report on the kiosk row, where the fleet list reads it, and every report as history. */
  async recordHeartbeat(kiosk: PairedKiosk, dto: HeartbeatDto): Promise<void> {
    // Only a release the kiosk could have been sent: another gallery's, or none, is refused.
    if (dto.releaseId !== null && !(await this.releases.findOne({ where: { id: dto.releaseId, ...servableReleasesOf(kiosk.station.galleryId) }, attributes: ['id'] }))) {
      throw unknownReference(['releaseId'], `Release ${dto.releaseId} is not one of this gallery’s published releases.`);
    }
    const receivedAt = this.clock.now();
    const fields = {
      appVersion: dto.appVersion, uptimeS: dto.uptimeS, storageUsedBytes: dto.storageUsedBytes, lastError: dto.lastError,
      publicationSequence: dto.publicationSequence ?? null,
      publicationExpiresAt: dto.publicationExpiresAt ? new Date(dto.publicationExpiresAt) : null,
      publicationExpired: dto.publicationExpired ?? false,
    };
    // The kiosk's row first: the heartbeat's foreign key takes a shared lock on it, so two heartbeats
    // of one kiosk that inserted first would each wait for the other's lock to update it (a deadlock).
    await this.sequelize.transaction(async (transaction) => {
      await this.kiosks.update({ lastHeartbeatAt: receivedAt, lastReleaseId: dto.releaseId, ...fields }, { where: { id: kiosk.id }, transaction });
      await this.heartbeats.create({ kioskId: kiosk.id, receivedAt, releaseId: dto.releaseId, ...fields }, { transaction });
    });
  }

  /**
   * Each event once, by its id: INSERT IGNORE's affected rows are the ones new to us. An event
   * naming a story or panel that no published release of the kiosk's gallery carries is dropped
   * and counted, not refused: the kiosk's outbox would otherwise resend the batch for ever.
   */
  async recordEvents(kiosk: PairedKiosk, dto: KioskEventsDto): Promise<EventsResponse> {
    const events = await this.ofGalleryReleases(kiosk, dto.events);
    const dropped = dto.events.length - events.length;
    if (events.length === 0) return { stored: 0, duplicates: 0, dropped };
    const receivedAt = this.clock.now();
    const rows = events.map((event) => [
      event.id.toLowerCase(), kiosk.id, kiosk.station.galleryId, event.type, new Date(event.at), event.storyId ?? null, event.panelId ?? null,
      event.widgetType ?? null, event.param ?? null, event.locale ?? null, event.dwellMs ?? null, event.switch ?? null, receivedAt,
    ]);
    const [, affected] = (await this.sequelize.query(
      `INSERT IGNORE INTO kiosk_events (${EVENT_COLUMNS.join(', ')}) VALUES ${rows.map(() => `(${EVENT_COLUMNS.map(() => '?').join(', ')})`).join(', ')}`,
      { replacements: rows.flat(), type: QueryTypes.INSERT },
    )) as unknown as [number, number];
    return { stored: affected, duplicates: events.length - affected, dropped };
  }

  /** The events whose story and panel a published release of the kiosk's gallery carries (a panel under its own story). */
  private async ofGalleryReleases(kiosk: PairedKiosk, events: KioskEventDto[]): Promise<KioskEventDto[]> {
    const storyIds = [...new Set(events.flatMap((event) => (event.storyId === undefined ? [] : [event.storyId])))];
    const panelIds = [...new Set(events.flatMap((event) => (event.panelId === undefined ? [] : [event.panelId])))];
    const released = { model: Release, attributes: [], where: servableReleasesOf(kiosk.station.galleryId) };
    const [stories, panels] = await Promise.all([
      storyIds.length ? this.releaseStories.findAll({ attributes: ['storyId'], where: { storyId: storyIds }, include: [released] }) : [],
      panelIds.length ? this.releasePanels.findAll({ attributes: ['storyId', 'panelId'], where: { panelId: panelIds }, include: [released] }) : [],
    ]);
    const knownStories = new Set(stories.map((row) => row.storyId));
    const knownPanels = new Set(panels.map((row) => `${row.storyId}:${row.panelId}`));
    const panelsAnyStory = new Set(panels.map((row) => row.panelId));
    return events.filter((event) =>
      (event.storyId === undefined || knownStories.has(event.storyId)) &&
      (event.panelId === undefined || (event.storyId === undefined ? panelsAnyStory.has(event.panelId) : knownPanels.has(`${event.storyId}:${event.panelId}`))));
  }

  /**
   * The fleet: every kiosk of the venues where the member looks after the fleet, with its station,
   * gallery, last heartbeat and the releases it plays and should play.
   */
  async list(query: ListKiosksQuery, member: Member): Promise<Page<KioskView>> {
    const galleries = { [Op.and]: [scopeWhere(venueScope(member, FLEET_KEEPERS)), ...(query.venueId ? [{ venueId: query.venueId }] : [])] };
    const access = { active: { revokedAt: null }, revoked: { revokedAt: { [Op.ne]: null } } };
    const { rows, count } = await this.kiosks.findAndCountAll({
      where: query.access ? access[query.access] : {},
      include: [{
        model: Station, required: true, where: query.galleryId ? { galleryId: query.galleryId } : {},
        include: [{ model: Gallery, required: true, where: galleries }],
      }],
      // By gallery, so the Fleet page can head each gallery's rows; revoked kiosks last within it.
      order: [['station', 'gallery', 'name', 'ASC'], ['station', 'galleryId', 'ASC'], ['revokedAt', 'ASC'], ['station', 'name', 'ASC'], ['id', 'ASC']],
      ...pageWindow(query),
    });
    return toPage(await this.views(rows as PlacedKiosk[], member), count, query);
  }

  /** Ends the kiosk's access at once: the guard reads the kiosk on every request. */
  async revoke(id: number, technician: Member): Promise<KioskView> {
    const venueId = (await this.find(id, technician)).station.gallery.venueId;
    await this.sequelize.transaction(async (transaction) => {
      const kiosk = await this.kiosks.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!kiosk) throw new NotFoundException('There is no such kiosk.');
      refuseIfRevoked(kiosk);
      await kiosk.update({ revokedAt: this.clock.now(), deviceTokenHash: null }, { transaction });
      await this.audit.record({ actorId: technician.id, action: 'kiosk.revoked', targetType: 'kiosk', targetId: kiosk.id, venueId, detail: { stationId: kiosk.stationId } }, transaction);
    });
    return this.get(id, technician);
  }

  async get(id: number, member: Member): Promise<KioskView> {
    const [view] = await this.views([await this.find(id, member)], member);
    return view!;
  }

  /** The kiosk with its station and gallery, for a member who looks after the fleet at its venue. */
  private async find(id: number, member: Member): Promise<PlacedKiosk> {
    const kiosk = (await this.kiosks.findByPk(id, { include: [{ model: Station, include: [Gallery] }] })) as PlacedKiosk | null;
    actingAt(member, withinReach(member, kiosk?.station.gallery, 'There is no such kiosk.').venueId, FLEET_KEEPERS);
    return kiosk!;
  }

  private async views(kiosks: PlacedKiosk[], member: Member): Promise<KioskView[]> {
    const playing = kiosks.flatMap((k) => (k.lastReleaseId === null ? [] : [k.lastReleaseId]));
    const galleryIds = [...new Set(kiosks.map((k) => k.station.galleryId))];
    const [played, live] = await Promise.all([
      playing.length ? this.releases.findAll({ where: { id: playing }, attributes: ['id', 'number'] }) : [],
      galleryIds.length ? this.releases.findAll({ where: { liveGalleryId: galleryIds }, attributes: ['id', 'number', 'galleryId'] }) : [],
    ]);
    const byId = new Map(played.map((r) => [r.id, r]));
    const liveByGallery = new Map(live.map((r) => [r.galleryId, r]));
    return kiosks.map((kiosk) => toKioskView(kiosk, byId, liveByGallery, personAt(member, kiosk.station.gallery.venueId)));
  }
}
