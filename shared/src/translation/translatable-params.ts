import { isPlainObject } from '../panel/panel-json.js';

export interface TranslatableParam {
  param: string[];
  text: string;
}

/**
 * A widget marks a param as curator-written visible text with `.meta({ translatable: true })` on a
 * string field of its zod schema, which `z.toJSONSchema` carries into the JSON Schema. Numbers,
 * enums and built-in labels are never units: built-in labels are translated in the i18n resources.
 * Neither current widget (slope force box, convection cell) has such a field yet.
 */
export function translatableParams(jsonSchema: Record<string, unknown>, params: unknown): TranslatableParam[] {
  const found: TranslatableParam[] = [];
  const walk = (schema: unknown, value: unknown, path: string[]) => {
    if (!isPlainObject(schema)) return;
    if (schema.translatable === true && typeof value === 'string') {
      found.push({ param: path, text: value });
      return;
    }
    if (!isPlainObject(schema.properties) || !isPlainObject(value)) return;
    for (const [key, child] of Object.entries(schema.properties)) walk(child, value[key], [...path, key]);
  };
  walk(jsonSchema, params, []);
  return found;
}
