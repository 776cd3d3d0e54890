import { isWidgetType, widgetModule } from '../../widgets/index.js';
import { liveValuesIn, widgetsIn, type PanelLiveValueRef, type PanelWidgetRef } from '../panel-queries.js';
import type { PanelPath } from '../panel-json.js';
import { formatLiveValue, type LiveValueFormat } from './live-value-format.js';

/** What a widget on the panel computes with its current params, or why it cannot. */
export type WidgetReading =
  | { ok: true; outputs: Readonly<Record<string, unknown>> }
  | { ok: false; reason: 'unknown-widget-type' | 'invalid-params' };

export function readWidget(widgetType: string, params: unknown): WidgetReading {
  if (!isWidgetType(widgetType)) return { ok: false, reason: 'unknown-widget-type' };
  const widget = widgetModule(widgetType);
  const checked = widget.validate(params);
  if (!checked.ok) return { ok: false, reason: 'invalid-params' };
  const outputs = widget.compute(checked.params);
  return { ok: true, outputs: typeof outputs === 'object' && outputs !== null ? (outputs as Record<string, unknown>) : {} };
}

/**
 * Readings for every widget on a panel, keyed by widget id. `paramsById` lets a kiosk pass the
 * params a visitor has just set with a slider, so the live values follow the simulation.
 */
export function readPanelWidgets(
  widgets: readonly PanelWidgetRef[],
  paramsById: ReadonlyMap<string, unknown> = new Map(),
): Map<string, WidgetReading> {
  const readings = new Map<string, WidgetReading>();
  for (const widget of widgets) {
    if (readings.has(widget.widgetId)) continue;
    readings.set(widget.widgetId, readWidget(widget.widgetType, paramsById.get(widget.widgetId) ?? widget.params));
  }
  return readings;
}

export type LiveValueReading =
  | { ok: true; value: number }
  | { ok: false; reason: 'no-widget' | 'widget-not-computable' | 'no-output' };

export function readLiveValue(liveValue: { widgetId: string; output: string }, readings: ReadonlyMap<string, WidgetReading>): LiveValueReading {
  const reading = readings.get(liveValue.widgetId);
  if (!reading) return { ok: false, reason: 'no-widget' };
  if (!reading.ok) return { ok: false, reason: 'widget-not-computable' };
  const value = Object.hasOwn(reading.outputs, liveValue.output) ? reading.outputs[liveValue.output] : undefined;
  return typeof value === 'number' && Number.isFinite(value) ? { ok: true, value } : { ok: false, reason: 'no-output' };
}

/** A live value as text, or an em dash where it cannot be computed (never a stale or typed number). */
export function liveValueText(reading: LiveValueReading, format: LiveValueFormat, locale: string): string {
  return reading.ok ? formatLiveValue(reading.value, format, locale) : '—';
}

export interface DanglingLiveValue {
  path: PanelPath;
  widgetId: string;
  output: string;
  reason: 'no-widget' | 'no-output';
  message: string;
}

/**
 * Live values that point at no widget on their panel, or at an output their widget does not
 * compute. A widget whose own params are invalid is reported by the params check, not here.
 */
export function danglingLiveValues(doc: unknown): DanglingLiveValue[] {
  const readings = readPanelWidgets(widgetsIn(doc));
  return liveValuesIn(doc).flatMap((liveValue: PanelLiveValueRef): DanglingLiveValue[] => {
    const reading = readLiveValue(liveValue, readings);
    if (reading.ok || reading.reason === 'widget-not-computable') return [];
    const { path, widgetId, output } = liveValue;
    const message =
      reading.reason === 'no-widget'
        ? `This live value shows "${output}" of widget ${widgetId}, which is no longer on this panel.`
        : `Widget ${widgetId} computes no number called "${output}".`;
    return [{ path, widgetId, output, reason: reading.reason, message }];
  });
}
