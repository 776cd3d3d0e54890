import type { KioskSwitch } from '../release/kiosk-api.js';
import type { WidgetUse } from './figures.js';

/**
 * What visitors did in one gallery over a date range (issue 8). Counts of anonymous kiosk
 * events only: nothing here names a visitor or a kiosk.
 */
export interface InsightsView {
  galleryId: number;
  /** YYYY-MM-DD, days of the venue's time zone, both included. */
  from: string;
  to: string;
  /** The venue's IANA time zone, whose days `from` and `to` are. */
  timeZone: string;
  /** `demoEvents`: how many of the events are invented ones from the demo venue's kiosk. */
  totals: { events: number; storyOpens: number; panelViews: number; widgetTouches: number; demoEvents: number };
  stories: { storyId: number; title: string | null; opens: number }[];
  panels: {
    panelId: number;
    storyId: number | null;
    storyTitle: string | null;
    /** 1-based place in its story now; null once the panel is gone. */
    position: number | null;
    views: number;
    medianDwellMs: number;
  }[];
  widgets: WidgetUse[];
  languages: { locale: string; chosen: number }[];
  switches: { switch: KioskSwitch; used: number }[];
}
