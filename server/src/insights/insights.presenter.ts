import { stringify } from 'csv-stringify/sync';
import type { InsightsView } from '@mantlepiece/shared';

/** `from_day`, `to_day`: the range counted, days of the venue's `time_zone`, both included; on every row so a row copied elsewhere keeps them. */
const CSV_COLUMNS = [
  'figure', 'story_id', 'story_title', 'panel_id', 'panel_position', 'widget_type', 'param', 'locale', 'switch', 'count', 'median_dwell_ms', 'from_day', 'to_day', 'time_zone',
] as const;
type CsvRecord = Partial<Record<(typeof CSV_COLUMNS)[number], string | number | null>>;

/** The page's figures as one table, a `figure` column naming what each row counts. */
export function toInsightsCsv(view: InsightsView): string {
  const records: CsvRecord[] = [
    ...view.stories.map((s) => ({ figure: 'story_opens', story_id: s.storyId, story_title: s.title, count: s.opens })),
    ...view.panels.map((p) => ({
      figure: 'panel_views', story_id: p.storyId, story_title: p.storyTitle, panel_id: p.panelId, panel_position: p.position, count: p.views, median_dwell_ms: p.medianDwellMs,
    })),
    ...view.widgets.flatMap((w) => w.params.map((p) => ({ figure: 'widget_touches', widget_type: w.widgetType, param: p.param, count: p.touches }))),
    ...view.languages.map((l) => ({ figure: 'language_chosen', locale: l.locale, count: l.chosen })),
    ...view.switches.map((s) => ({ figure: 'switch_used', switch: s.switch, count: s.used })),
  ].map((record) => ({ ...record, from_day: view.from, to_day: view.to, time_zone: view.timeZone }));
  // Story titles are staff text: a cell that starts like a formula is defused (OWASP, CSV injection).
  return stringify(records, { header: true, columns: [...CSV_COLUMNS], quoted: true, record_delimiter: 'windows', escape_formulas: true });
}
