import { Field, Input, makeStyles, Select, Switch, tokens } from '@fluentui/react-components';
import type { WidgetIssue } from '@mantlepiece/shared';

/** The parts of JSON Schema that zod's toJSONSchema writes for our widget params. */
export interface PropertySchema {
  type?: string;
  title?: string;
  unit?: string;
  enum?: (string | number)[];
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  properties?: Record<string, PropertySchema>;
  required?: string[];
}

export type Params = Record<string, unknown>;

const useStyles = makeStyles({
  group: { display: 'grid', gap: tokens.spacingVerticalM, border: 'none', margin: 0, padding: 0 },
  nested: { display: 'grid', gap: tokens.spacingVerticalM, paddingLeft: tokens.spacingHorizontalL, borderLeft: `3px solid ${tokens.colorNeutralStroke2}` },
});

const label = (name: string, schema: PropertySchema) => (schema.unit ? `${schema.title ?? name} (${schema.unit})` : (schema.title ?? name));

/** Issues for exactly this field (not its children), joined for Fluent's validation message. */
const messageAt = (errors: WidgetIssue[], path: string[]) =>
  errors.filter((error) => error.path.length === path.length && error.path.every((part, i) => part === path[i])).map((error) => error.message).join(' ') || undefined;

/** A starting value for a field switched on: the middle of its range, or its first option. */
function startingValue(schema: PropertySchema): unknown {
  if (schema.enum) return schema.enum[0];
  if (schema.type === 'object') return Object.fromEntries(Object.entries(schema.properties ?? {}).map(([key, child]) => [key, startingValue(child)]));
  const low = schema.minimum ?? schema.exclusiveMinimum ?? 0;
  return schema.maximum === undefined ? low : Math.max(low, Math.min(schema.maximum, 1));
}

interface FieldProps {
  name: string;
  path: string[];
  schema: PropertySchema;
  value: unknown;
  errors: WidgetIssue[];
  onChange: (value: unknown) => void;
}

function SchemaField({ name, path, schema, value, errors, onChange }: FieldProps) {
  const styles = useStyles();
  const message = messageAt(errors, path);
  if (schema.type === 'object') {
    return (
      <fieldset className={styles.nested}>
        <legend>{schema.title ?? name}</legend>
        {message ? <Field validationMessage={message} validationState="error" /> : null}
        <SchemaFields schema={schema} value={(value as Params) ?? {}} errors={errors} path={path} onChange={(next) => onChange(next)} />
      </fieldset>
    );
  }
  if (schema.enum) {
    return (
      <Field label={label(name, schema)} validationMessage={message} validationState={message ? 'error' : 'none'}>
        <Select value={String(value ?? '')} onChange={(_, data) => onChange(schema.enum!.find((option) => String(option) === data.value))}>
          {schema.enum.map((option) => (
            <option key={String(option)} value={String(option)}>
              {String(option)}
            </option>
          ))}
        </Select>
      </Field>
    );
  }
  return (
    <Field label={label(name, schema)} validationMessage={message} validationState={message ? 'error' : 'none'}>
      <Input
        type="number"
        inputMode="decimal"
        value={value === undefined ? '' : String(value)}
        // An empty or half-typed number is sent as it is, so the check names the problem.
        onChange={(_, data) => onChange(data.value === '' ? undefined : Number.isNaN(Number(data.value)) ? data.value : Number(data.value))}
      />
    </Field>
  );
}

/** A form for a widget's params, built from the JSON Schema the server lists, with each check's message under its field. */
export function SchemaFields({ schema, value, errors, path = [], onChange, setLabel = 'Set' }: { schema: PropertySchema; value: Params; errors: WidgetIssue[]; path?: string[]; onChange: (value: Params) => void; setLabel?: string }) {
  const styles = useStyles();
  const required = new Set(schema.required ?? []);
  return (
    <div className={styles.group}>
      {Object.entries(schema.properties ?? {}).map(([name, child]) => {
        const fieldPath = [...path, name];
        const present = value[name] !== undefined;
        const update = (next: unknown) => {
          const copy = { ...value };
          if (next === undefined) delete copy[name];
          else copy[name] = next;
          onChange(copy);
        };
        if (required.has(name)) return <SchemaField key={name} name={name} path={fieldPath} schema={child} value={value[name]} errors={errors} onChange={update} />;
        return (
          <div key={name} className={styles.group}>
            <Switch label={`${setLabel}: ${child.title ?? name}`} checked={present} onChange={(_, data) => update(data.checked ? startingValue(child) : undefined)} />
            {present ? <SchemaField name={name} path={fieldPath} schema={child} value={value[name]} errors={errors} onChange={update} /> : messageAt(errors, fieldPath) ? <Field validationMessage={messageAt(errors, fieldPath)} validationState="error" /> : null}
          </div>
        );
      })}
    </div>
  );
}
