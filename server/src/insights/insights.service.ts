import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { QueryTypes } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import {
  addDays, dayEndIn, dayIn, dayStartIn, dwellByPanel, INSIGHTS_DEFAULT_DAYS, widgetUse,
  type DwellSample, type InsightsView, type KioskEventType, type KioskSwitch, type Role, type WidgetParamCount,
} from '@mantlepiece/shared';
import type { Member } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { invalidField } from '../common/validation.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Venue } from '../venues/models/venue.model.js';
import type { InsightsQuery } from './dto/insights.query.js';

/** Who reads what visitors did. */
export const INSIGHTS_READERS: readonly Role[] = ['curator', 'educator', 'technician', 'admin'];

interface Range {
  from: string;
  to: string;
}

/**
 * Figures of what visitors did, from the anonymous kiosk events of one gallery. Counts are
 * grouped in SQL; medians need every dwell time, so those are read and taken exactly in shared.
 */
@Injectable()
export class InsightsService {
  constructor(
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  /** Another venue's gallery answers as one that does not exist. */
  async figures(query: InsightsQuery, member: Member): Promise<InsightsView> {
    const gallery = await this.galleries.findByPk(query.galleryId, { attributes: ['id', 'venueId'], include: [{ model: Venue, attributes: ['timeZone'] }] });
    actingAt(member, withinReach(member, gallery, 'There is no such gallery.').venueId, INSIGHTS_READERS);
    // Days are the venue's: a visit at 23:30 local time counts on that local day, and a day across a clock change has its 23 or 25 hours.
    const { timeZone } = gallery!.venue!;
    const range = this.rangeOf(query, timeZone);
    const scope = { galleryId: query.galleryId, start: dayStartIn(range.from, timeZone), end: dayEndIn(range.to, timeZone) };
    const events = (type: KioskEventType, columns: string, extra = '', tail = '') =>
      this.sequelize.query(
        `SELECT ${columns} FROM kiosk_events e ${extra} WHERE e.gallery_id = :galleryId AND e.type = :type AND e.at >= :start AND e.at < :end ${tail}`,
        { replacements: { ...scope, type }, type: QueryTypes.SELECT },
      );

    const [totals, [demo], stories, dwells, widgets, languages, switches] = await Promise.all([
      this.sequelize.query<{ type: KioskEventType; n: number }>(
        'SELECT type, COUNT(*) AS n FROM kiosk_events WHERE gallery_id = :galleryId AND at >= :start AND at < :end GROUP BY type',
        { replacements: scope, type: QueryTypes.SELECT },
      ),
      this.sequelize.query<{ n: number }>(
        'SELECT COUNT(*) AS n FROM kiosk_events e JOIN kiosks k ON k.id = e.kiosk_id WHERE k.demo AND e.gallery_id = :galleryId AND e.at >= :start AND e.at < :end',
        { replacements: scope, type: QueryTypes.SELECT },
      ),
      events('story_opened', 'e.story_id AS storyId, s.title, COUNT(*) AS opens', 'LEFT JOIN stories s ON s.id = e.story_id',
        'AND e.story_id IS NOT NULL GROUP BY e.story_id, s.title ORDER BY opens DESC, e.story_id') as Promise<{ storyId: number; title: string | null; opens: number }[]>,
      events('panel_viewed', 'e.panel_id AS panelId, e.dwell_ms AS dwellMs', '', 'AND e.panel_id IS NOT NULL AND e.dwell_ms IS NOT NULL') as Promise<DwellSample[]>,
      events('widget_touched', 'e.widget_type AS widgetType, e.param, COUNT(*) AS touches', '',
        'AND e.widget_type IS NOT NULL GROUP BY e.widget_type, e.param') as Promise<WidgetParamCount[]>,
      events('language_chosen', 'e.locale, COUNT(*) AS chosen', '', 'AND e.locale IS NOT NULL GROUP BY e.locale ORDER BY chosen DESC, e.locale') as Promise<{ locale: string; chosen: number }[]>,
      events('switch_used', 'e.switch, COUNT(*) AS used', '', 'AND e.switch IS NOT NULL GROUP BY e.switch ORDER BY used DESC, e.switch') as Promise<{ switch: KioskSwitch; used: number }[]>,
    ]);

    const count = (type: KioskEventType) => Number(totals.find((row) => row.type === type)?.n ?? 0);
    return {
      galleryId: query.galleryId,
      ...range,
      timeZone,
      totals: {
        events: totals.reduce((sum, row) => sum + Number(row.n), 0),
        storyOpens: count('story_opened'),
        panelViews: count('panel_viewed'),
        widgetTouches: count('widget_touched'),
        demoEvents: Number(demo?.n ?? 0),
      },
      stories: stories.map((row) => ({ storyId: row.storyId, title: row.title, opens: Number(row.opens) })),
      panels: await this.placePanels(dwells.map((row) => ({ panelId: row.panelId, dwellMs: Number(row.dwellMs) }))),
      widgets: widgetUse(widgets.map((row) => ({ ...row, touches: Number(row.touches) }))),
      languages: languages.map((row) => ({ locale: row.locale, chosen: Number(row.chosen) })),
      switches: switches.map((row) => ({ switch: row.switch, used: Number(row.used) })),
    };
  }

  /** Each viewed panel with its story and place in it as they are now; a deleted panel keeps its figures. */
  private async placePanels(samples: DwellSample[]): Promise<InsightsView['panels']> {
    const figures = dwellByPanel(samples);
    if (!figures.length) return [];
    const places = await this.sequelize.query<{ panelId: number; storyId: number; storyTitle: string; position: number }>(
      'SELECT p.id AS panelId, p.story_id AS storyId, s.title AS storyTitle, p.position FROM panels p JOIN stories s ON s.id = p.story_id WHERE p.id IN (:ids)',
      { replacements: { ids: figures.map((figure) => figure.panelId) }, type: QueryTypes.SELECT },
    );
    const byId = new Map(places.map((place) => [place.panelId, place]));
    return figures.map((figure) => {
      const place = byId.get(figure.panelId);
      return { ...figure, storyId: place?.storyId ?? null, storyTitle: place?.storyTitle ?? null, position: place ? place.position + 1 : null };
    });
  }

  private rangeOf(query: InsightsQuery, timeZone: string): Range {
    const to = query.to ?? dayIn(this.clock.now(), timeZone);
    const from = query.from ?? addDays(to, -(INSIGHTS_DEFAULT_DAYS - 1));
    if (from > to) {
      throw invalidField(['to'], 'The range ends before it starts.');
    }
    return { from, to };
  }
}
