import { median } from './median.js';

/** One panel view's time on screen, as the kiosk measured it. */
export interface DwellSample {
  panelId: number;
  dwellMs: number;
}

export interface PanelDwell {
  panelId: number;
  views: number;
  medianDwellMs: number;
}

/** Views and the exact median dwell of each panel, most viewed first (ties by panel id). */
export function dwellByPanel(samples: readonly DwellSample[]): PanelDwell[] {
  const byPanel = new Map<number, number[]>();
  for (const { panelId, dwellMs } of samples) {
    const dwells = byPanel.get(panelId) ?? [];
    dwells.push(dwellMs);
    byPanel.set(panelId, dwells);
  }
  return [...byPanel]
    .map(([panelId, dwells]) => ({ panelId, views: dwells.length, medianDwellMs: median(dwells)! }))
    .sort((a, b) => b.views - a.views || a.panelId - b.panelId);
}

/** Touches of one widget type for one param; `param` is null for a touch that moved nothing. */
export interface WidgetParamCount {
  widgetType: string;
  param: string | null;
  touches: number;
}

export interface WidgetUse {
  widgetType: string;
  touches: number;
  params: { param: string | null; touches: number }[];
}

/** Counts per (widget type, param) gathered per widget type, both levels most touched first, ties by name. */
export function widgetUse(counts: readonly WidgetParamCount[]): WidgetUse[] {
  const byType = new Map<string, WidgetUse>();
  for (const { widgetType, param, touches } of counts) {
    const use = byType.get(widgetType) ?? { widgetType, touches: 0, params: [] };
    use.touches += touches;
    use.params.push({ param, touches });
    byType.set(widgetType, use);
  }
  // Among equals, a touch that moved nothing comes after every param.
  const byParam = (a: { param: string | null; touches: number }, b: { param: string | null; touches: number }) =>
    b.touches - a.touches || (a.param === null ? 1 : 0) - (b.param === null ? 1 : 0) || (a.param ?? '').localeCompare(b.param ?? '');
  return [...byType.values()]
    .map((use) => ({ ...use, params: use.params.sort(byParam) }))
    .sort((a, b) => b.touches - a.touches || a.widgetType.localeCompare(b.widgetType));
}
