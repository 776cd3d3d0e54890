import type { z } from 'zod';

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
}
