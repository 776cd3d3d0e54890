import { widgetStrings } from '../../i18n/index.js';
import { isWidgetType, widgetModule, type AnyWidgetModule, type SimulationReport, type WidgetOutput, type WidgetState } from '../../widgets/index.js';
import { liveValuesIn, widgetsIn, type PanelLiveValueRef, type PanelWidgetRef } from '../panel-queries.js';
import type { PanelPath } from '../panel-json.js';
import { formatLiveValue, type LiveValueFormat } from './live-value-format.js';

/** An output's value now: a number, a state, or null while its simulation has not reported yet. */
export type OutputValue = number | WidgetState | null;

/** What a widget on the panel puts out with its current params, or why it cannot. */
export type WidgetReading =
  /** `state` is the widget's declared state now (a live phrase's choice), null for a widget without states. */
  | { ok: true; outputs: Readonly<Record<string, OutputValue>>; state: string | null }
  | { ok: false; reason: 'unknown-widget-type' | 'invalid-params' };

/** One output a live value can show, with its value now: what the studio's live-value menu lists. */
export interface WidgetOutputChoice {
  name: string;
  kind: 'number' | 'state';
  unit: LiveValueFormat['unit'];
  source: 'settings' | 'simulation';
  value: OutputValue;
}

type AnyOutput = WidgetOutput<unknown, unknown>;

function valueOf(output: AnyOutput, result: unknown, params: unknown, report: SimulationReport | undefined): OutputValue {
  if (output.source === 'simulation') {
    if (!report) return null;
    const value = output.read(report, params);
    return Number.isFinite(value) ? value : null;
  }
  return output.read(result, params);
}

interface ComputedWidget {
  widget: AnyWidgetModule;
  params: unknown;
  result: unknown;
}

function computeWidget(widgetType: string, params: unknown): ComputedWidget | null {
  if (!isWidgetType(widgetType)) return null;
  const widget = widgetModule(widgetType);
  const checked = widget.validate(params);
  return checked.ok ? { widget, params: checked.params, result: widget.compute(checked.params) } : null;
}

function outputChoices({ widget, params, result }: ComputedWidget, report: SimulationReport | undefined): WidgetOutputChoice[] {
  return (widget.outputs as readonly AnyOutput[])
    .filter((output) => output.appliesTo?.(params) ?? true)
    .map((output) => ({
      name: output.name,
      kind: output.kind,
      unit: output.kind === 'number' ? output.unit : '',
      source: output.source,
      value: valueOf(output, result, params, report),
    }));
}

/** The widget's declared outputs that apply to these params, with their values; null when the params are not valid. */
export function widgetOutputChoices(widgetType: string, params: unknown, report?: SimulationReport): WidgetOutputChoice[] | null {
  const computed = computeWidget(widgetType, params);
  return computed && outputChoices(computed, report);
}

/** `report` is what the widget's running simulation last said, where it has one. */
export function readWidget(widgetType: string, params: unknown, report?: SimulationReport): WidgetReading {
  if (!isWidgetType(widgetType)) return { ok: false, reason: 'unknown-widget-type' };
  const computed = computeWidget(widgetType, params);
  if (!computed) return { ok: false, reason: 'invalid-params' };
  const outputs = Object.fromEntries(outputChoices(computed, report).map((choice) => [choice.name, choice.value]));
  const states = computed.widget.states;
  return { ok: true, outputs, state: states ? states.read(computed.result, computed.params) : null };
}

/**
 * Readings for every widget on a panel, keyed by widget id. `paramsById` lets a kiosk pass the
 * params a visitor has just set with a slider, and `reportsById` what each running simulation last
 * reported, so the live values follow the simulation.
 */
export function readPanelWidgets(
  widgets: readonly PanelWidgetRef[],
  paramsById: ReadonlyMap<string, unknown> = new Map(),
  reportsById: ReadonlyMap<string, SimulationReport> = new Map(),
): Map<string, WidgetReading> {
  const readings = new Map<string, WidgetReading>();
  for (const widget of widgets) {
    if (readings.has(widget.widgetId)) continue;
    readings.set(widget.widgetId, readWidget(widget.widgetType, paramsById.get(widget.widgetId) ?? widget.params, reportsById.get(widget.widgetId)));
  }
  return readings;
}

export type LiveValueReading =
  | { ok: true; value: number }
  | { ok: true; state: WidgetState }
  | { ok: false; reason: 'no-widget' | 'widget-not-computable' | 'no-output' | 'not-reported' };

export function readLiveValue(liveValue: { widgetId: string; output: string }, readings: ReadonlyMap<string, WidgetReading>): LiveValueReading {
  const reading = readings.get(liveValue.widgetId);
  if (!reading) return { ok: false, reason: 'no-widget' };
  if (!reading.ok) return { ok: false, reason: 'widget-not-computable' };
  if (!Object.hasOwn(reading.outputs, liveValue.output)) return { ok: false, reason: 'no-output' };
  const value = reading.outputs[liveValue.output];
  if (value === null || value === undefined) return { ok: false, reason: 'not-reported' };
  return typeof value === 'number' ? { ok: true, value } : { ok: true, state: value };
}

/**
 * A live value as text: a number in the locale, a state in the visitor's language, or an em dash
 * where it cannot be computed or the simulation has not reported yet (never a stale or typed number).
 */
export function liveValueText(reading: LiveValueReading, format: LiveValueFormat, locale: string): string {
  if (!reading.ok) return '—';
  return 'state' in reading ? widgetStrings(locale).states[reading.state] : formatLiveValue(reading.value, format, locale);
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
    if (reading.ok || reading.reason === 'widget-not-computable' || reading.reason === 'not-reported') return [];
    const { path, widgetId, output } = liveValue;
    const message =
      reading.reason === 'no-widget'
        ? `This live value shows "${output}" of widget ${widgetId}, which is no longer on this panel.`
        : `Widget ${widgetId} puts out nothing called "${output}" with its current settings.`;
    return [{ path, widgetId, output, reason: reading.reason, message }];
  });
}
