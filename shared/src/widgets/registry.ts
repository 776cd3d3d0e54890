import { z } from '../zod.js';
import { convectionCell } from './convection-cell/index.js';
import { plateForces } from './plate-forces/index.js';
import { seaFloorDepth } from './sea-floor-depth/index.js';
import { slopeForce } from './slope-force/index.js';
import type { ModelCard, ModelLimitWarning, WidgetIssue, WidgetModule } from './types.js';

/** Every widget a panel can hold, keyed by its type. */
export const widgetRegistry = {
  [slopeForce.type]: slopeForce,
  [convectionCell.type]: convectionCell,
  [seaFloorDepth.type]: seaFloorDepth,
  [plateForces.type]: plateForces,
} as const;

export type WidgetRegistry = typeof widgetRegistry;
export type WidgetType = keyof WidgetRegistry;
export const WIDGET_TYPES = Object.keys(widgetRegistry) as WidgetType[];

export const isWidgetType = (type: unknown): type is WidgetType => typeof type === 'string' && Object.hasOwn(widgetRegistry, type);

// The registry holds modules of different param types; callers that pick one by a runtime type string see them through this.
export type AnyWidgetModule = WidgetModule<unknown, unknown>;
export const widgetModule = (type: WidgetType): AnyWidgetModule => widgetRegistry[type] as unknown as AnyWidgetModule;

/** A widget type as the studio needs it: JSON Schema of its params (what a curator may type), defaults and its model card. */
export interface WidgetDescriptor {
  type: WidgetType;
  version: number;
  title: string;
  jsonSchema: Record<string, unknown>;
  defaults: unknown;
  model: ModelCard;
}

export function widgetJsonSchema(type: WidgetType): Record<string, unknown> {
  // Input shape: optional fields stay optional, which is what a form fills in.
  return z.toJSONSchema(widgetRegistry[type].schema, { io: 'input' }) as Record<string, unknown>;
}

export function describeWidgetTypes(): WidgetDescriptor[] {
  return WIDGET_TYPES.map((type) => {
    const jsonSchema = widgetJsonSchema(type);
    return {
      type,
      version: widgetRegistry[type].version,
      title: typeof jsonSchema.title === 'string' ? jsonSchema.title : type,
      jsonSchema,
      defaults: widgetRegistry[type].defaults,
      model: widgetRegistry[type].model,
    };
  });
}

export type WidgetCheck =
  | { ok: true; type: WidgetType; params: unknown; result: unknown; warnings: ModelLimitWarning[] }
  | { ok: false; errors: WidgetIssue[] };

/** Validates params for any widget type, and computes its result when they pass. The server and the studio run the same check. */
export function checkWidget(type: unknown, params: unknown): WidgetCheck {
  if (!isWidgetType(type)) {
    return {
      ok: false,
      errors: [{ path: ['type'], message: `Unknown widget type ${JSON.stringify(type)}; the known types are ${WIDGET_TYPES.join(', ')}.` }],
    };
  }
  const module = widgetModule(type);
  const validation = module.validate(params);
  if (!validation.ok) return { ok: false, errors: validation.errors.map((issue) => ({ ...issue, path: ['params', ...issue.path] })) };
  return { ok: true, type, params: validation.params, result: module.compute(validation.params), warnings: module.modelLimits(validation.params) };
}
