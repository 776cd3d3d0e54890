import type { WidgetIssue } from '@mantlepiece/shared';

/** One input of a widget's side form, read from the JSON Schema the widget registry publishes. */
export interface WidgetFormField {
  path: string[];
  label: string;
  unit: string;
  kind: 'number' | 'choice';
  choices?: (string | number)[];
  min?: number;
  max?: number;
  minExclusive?: boolean;
  required: boolean;
}

export interface WidgetFormGroup {
  /** Set for an optional nested object (e.g. physical properties) that the curator switches on. */
  path: string[];
  label: string;
  optional: boolean;
  fields: WidgetFormField[];
}

type Schema = Record<string, unknown>;

const asSchema = (value: unknown): Schema => (typeof value === 'object' && value !== null ? (value as Schema) : {});
const num = (value: unknown) => (typeof value === 'number' ? value : undefined);

function fieldOf(name: string, schema: Schema, required: boolean, parent: string[]): WidgetFormField {
  const choices = Array.isArray(schema.enum) ? (schema.enum as (string | number)[]) : undefined;
  return {
    path: [...parent, name],
    label: typeof schema.title === 'string' ? schema.title : name,
    unit: typeof schema.unit === 'string' ? schema.unit : '',
    kind: choices ? 'choice' : 'number',
    choices,
    min: num(schema.minimum) ?? num(schema.exclusiveMinimum),
    max: num(schema.maximum),
    minExclusive: schema.exclusiveMinimum !== undefined,
    required,
  };
}

/** The form's groups: top-level settings first, then each nested object as its own group. */
export function widgetFormGroups(jsonSchema: Schema): WidgetFormGroup[] {
  const required = new Set(Array.isArray(jsonSchema.required) ? (jsonSchema.required as string[]) : []);
  const top: WidgetFormGroup = { path: [], label: '', optional: false, fields: [] };
  const nested: WidgetFormGroup[] = [];
  for (const [name, raw] of Object.entries(asSchema(jsonSchema.properties))) {
    const schema = asSchema(raw);
    if (schema.type === 'object') {
      const inner = new Set(Array.isArray(schema.required) ? (schema.required as string[]) : []);
      nested.push({
        path: [name],
        label: typeof schema.title === 'string' ? schema.title : name,
        optional: !required.has(name),
        fields: Object.entries(asSchema(schema.properties)).map(([child, childSchema]) => fieldOf(child, asSchema(childSchema), inner.has(child), [name])),
      });
    } else {
      top.fields.push(fieldOf(name, schema, required.has(name), []));
    }
  }
  return [top, ...nested];
}

/** What an input's text means as a param: nothing, a number, or (left for validation to refuse) the text itself. */
export function parseFieldText(text: string, field: Pick<WidgetFormField, 'kind' | 'choices'>): unknown {
  const trimmed = text.trim().replace(/\u2212/g, '-');
  if (trimmed === '') return undefined;
  if (field.kind === 'choice') return field.choices?.find((choice) => String(choice) === trimmed) ?? trimmed;
  const value = Number(trimmed.replace(',', '.'));
  return Number.isFinite(value) ? value : trimmed;
}

export function valueAt(params: Record<string, unknown>, path: string[]): unknown {
  return path.reduce<unknown>((node, key) => (typeof node === 'object' && node !== null ? (node as Record<string, unknown>)[key] : undefined), params);
}

/** A copy of the params with one value set (or removed when undefined), creating nested objects on the way. */
export function withValueAt(params: Record<string, unknown>, path: string[], value: unknown): Record<string, unknown> {
  const [head, ...rest] = path;
  if (head === undefined) return params;
  const next = { ...params };
  if (rest.length === 0) {
    if (value === undefined) delete next[head];
    else next[head] = value;
    return next;
  }
  const child = typeof next[head] === 'object' && next[head] !== null ? (next[head] as Record<string, unknown>) : {};
  next[head] = withValueAt(child, rest, value);
  return next;
}

/** Validation issues by field path ("physical.depthM"); issues on no field are kept under "". */
export function issuesByField(issues: readonly WidgetIssue[]): Map<string, string[]> {
  const byField = new Map<string, string[]>();
  for (const issue of issues) {
    const key = issue.path.join('.');
    byField.set(key, [...(byField.get(key) ?? []), issue.message]);
  }
  return byField;
}
