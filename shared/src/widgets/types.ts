import type { z } from '../zod.js';
import type { WidgetLocale } from '../i18n/index.js';
import type { LiveValueUnit } from '../panel/live-value/live-value-format.js';

/** One problem with a widget's params: where it is (property names from the params root) and what to do. */
export interface WidgetIssue {
  path: string[];
  message: string;
}

export type WidgetValidation<P> = { ok: true; params: P } | { ok: false; errors: WidgetIssue[] };

/** A setting that is allowed but takes the model outside the range where it holds; preflight shows these. */
export interface ModelLimitWarning {
  path: string[];
  code: string;
  message: string;
}

/** What a running simulation reports as it goes (the convection cell's solver: time, Nu, Vrms). */
export type SimulationReport = Readonly<Record<string, number>>;

interface OutputBase<P> {
  /** The name a live value refers to; never renamed, since stored panels point at it. */
  name: string;
  /** Left out where the output means nothing for these params (a speed in cm/yr without physical properties). */
  appliesTo?: (params: P) => boolean;
}

/**
 * A number or a state a widget puts out, which a panel's live values can show. Each widget declares
 * its outputs once, so the studio's live-value menu, the kiosk renderer and the server's preflight
 * agree on what exists and in which unit.
 */
export type WidgetOutput<P, R> = OutputBase<P> &
  (
    | { kind: 'number'; unit: LiveValueUnit; source: 'settings'; read: (result: R, params: P) => number }
    /** Comes from the running simulation, so it exists only once the simulation has reported. */
    | { kind: 'number'; unit: LiveValueUnit; source: 'simulation'; read: (report: SimulationReport, params: P) => number }
    | { kind: 'state'; states: readonly WidgetState[]; source: 'settings'; read: (result: R, params: P) => WidgetState }
  );

/**
 * States a widget can be in, each worded in every visitor language (widgetStrings(locale).states):
 * the slope's block holds or slides; of the plate forces, slab pull or ridge push is the bigger;
 * sea floor still sinks as √age or levels off.
 */
export const WIDGET_STATES = ['holds', 'slides', 'slab-pull-dominates', 'ridge-push-dominates', 'still-sinking', 'levelling-off'] as const;
export type WidgetState = (typeof WIDGET_STATES)[number];

/**
 * The states a widget can be in, declared once so a live phrase can offer one wording per state,
 * the kiosk can pick the wording that matches what the visitor sees, and preflight can tell when
 * plain text names a state that may no longer hold.
 */
export interface WidgetStates<P, R, S extends string = string> {
  /** Every state, in the order the studio offers them; a live phrase keeps one wording per state. */
  values: readonly S[];
  /** The state for these params; a kiosk passes the params the visitor has just set. */
  read: (result: R, params: P) => S;
  /** Whether a visitor can move the widget from one state to another on the kiosk (tilting the slope). */
  visitorChangesState: boolean;
  /**
   * Words that name a state in running text, per visitor language (lower case, whole words).
   * Plain text holding one, on a panel where the visitor changes the state, may contradict the widget.
   */
  stateWords: Readonly<Record<string, readonly string[]>>;
}

/**
 * An optional group of params (the convection cell's physical properties) as a curator switches it
 * on or off: the whole params it leads to, so the form never opens on a page of errors, and where
 * each starting value comes from.
 */
export interface WidgetParamGroup {
  switchOn(params: Record<string, unknown>): Record<string, unknown>;
  switchOff(params: Record<string, unknown>): Record<string, unknown>;
  /** Field name → where its starting value comes from, shown beside the field. */
  sources: Readonly<Record<string, string>>;
}

/** A published work a widget's model rests on. */
export interface ModelSource {
  citation: string;
  /** Left out for works without one (a book chapter, a resolution of the CGPM). */
  doi?: string;
}

/** A model card's words in one language; `equations[i]` says in words what the card's i-th equation is. */
export interface ModelCardWords {
  summary: string;
  equations: readonly string[];
  assumptions: readonly string[];
  /** Where the model holds; preflight warns (modelLimits) when a widget is set outside it. */
  range: readonly string[];
}

/**
 * What a widget's model is, what it assumes, where it holds and where it comes from: shown to
 * reviewers beside the settings and, where a curator wants it, to visitors. The equations are
 * written in symbols, the same in every language; the words come in every UI language.
 */
export interface ModelCard {
  equations: readonly string[];
  sources: readonly ModelSource[];
  words: Readonly<Record<WidgetLocale, ModelCardWords>>;
}

/**
 * Every widget has this shape so the studio form, the kiosk renderer and the server's checks handle
 * any widget the same way.
 */
export interface WidgetModule<P, R, T extends string = string> {
  type: T;
  version: number;
  schema: z.ZodType<P>;
  defaults: P;
  /** Never throws: anything a curator, an import or an attacker sends comes back as ok or as errors. */
  validate(params: unknown): WidgetValidation<P>;
  compute(params: P): R;
  /** A plain-language account of the current state, for screen readers and the printed label. */
  describe(params: P, locale: string): string;
  modelLimits(params: P): ModelLimitWarning[];
  outputs: readonly WidgetOutput<P, R>[];
  model: ModelCard;
  /** The states a live phrase can follow; left out by widgets that have none. */
  states?: WidgetStates<P, R>;
  /** Optional param groups by name, for those whose empty start would not validate. */
  paramGroups?: Readonly<Record<string, WidgetParamGroup>>;
}
