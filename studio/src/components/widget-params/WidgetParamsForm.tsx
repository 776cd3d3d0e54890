import { useState } from 'react';
import { Field, Input, makeStyles, MessageBar, MessageBarBody, Select, Switch, tokens } from '@fluentui/react-components';
import { settingChoiceName, settingName, widgetJsonSchema, widgetModule, type WidgetType } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { issuesByField, parseFieldText, valueAt, widgetFormGroups, withValueAt, type WidgetFormField } from './widget-form';

type Params = Record<string, unknown>;

const useStyles = makeStyles({
  group: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusMedium, padding: tokens.spacingHorizontalM, margin: 0 },
  legend: { fontWeight: tokens.fontWeightSemibold, padding: `0 ${tokens.spacingHorizontalXS}` },
  unit: { color: tokens.colorNeutralForeground3, whiteSpace: 'nowrap' },
});

const rangeHint = (field: WidgetFormField) =>
  field.min !== undefined && field.max !== undefined ? `${field.minExclusive ? '>' : ''}${field.min} – ${field.max}${field.unit ? ` ${field.unit}` : ''}` : undefined;

/**
 * A widget's params as a form, built from its JSON Schema, for the panel editor's side form and the
 * widget workbench alike. Every change goes to `onChange` at once, set wrong or not; the messages
 * come from the same `validate` the server runs, each under the field it names.
 */
export function WidgetParamsForm({ widgetType, params, onChange }: { widgetType: WidgetType; params: Params; onChange: (params: Params) => void }) {
  const { t, i18n } = useTranslation();
  const language = i18n.resolvedLanguage ?? 'en';
  const styles = useStyles();
  // Setting names and choices in the studio's language; the schema's English title for anything the widget strings lack.
  const nameOf = (path: string[], title: string) => settingName(widgetType, path, language) ?? title;
  const choiceName = (path: string[], choice: string | number) => settingChoiceName(widgetType, path, choice, language) ?? String(choice);
  // What is being typed, kept as text so "0." or "1e" survive until they become numbers.
  const [texts, setTexts] = useState<Record<string, string>>({});
  const module = widgetModule(widgetType);
  const groups = widgetFormGroups(widgetJsonSchema(widgetType));
  const checked = module.validate(params);
  const issues = issuesByField(checked.ok ? [] : checked.errors);
  const fieldKeys = new Set(groups.flatMap((group) => group.fields.map((field) => field.path.join('.'))));
  const formIssues = [...issues].filter(([key]) => !fieldKeys.has(key)).flatMap(([, messages]) => messages);

  const setField = (field: WidgetFormField, text: string) => {
    const key = field.path.join('.');
    setTexts((current) => ({ ...current, [key]: text }));
    onChange(withValueAt(params, field.path, parseFieldText(text, field)));
  };
  const shownText = (field: WidgetFormField) => {
    const key = field.path.join('.');
    const stored = valueAt(params, field.path);
    const typed = texts[key];
    if (typed !== undefined && parseFieldText(typed, field) === stored) return typed;
    // A field holds a number, a string or a yes/no; nothing else has a text to show.
    return typeof stored === 'number' || typeof stored === 'string' || typeof stored === 'boolean' ? String(stored) : '';
  };
  const toggleGroup = (path: string[], on: boolean) => {
    const group = module.paramGroups?.[path.join('.')];
    if (group) return onChange(on ? group.switchOn(params) : group.switchOff(params));
    const defaults = valueAt(module.defaults as Params, path);
    onChange(withValueAt(params, path, on ? (defaults ?? {}) : undefined));
  };
  const sourceOf = (field: WidgetFormField) => module.paramGroups?.[field.path.slice(0, -1).join('.')]?.sources[field.path.at(-1) ?? ''];

  const input = (field: WidgetFormField) => {
    const key = field.path.join('.');
    const message = issues.get(key)?.join(' ');
    const source = sourceOf(field);
    const hint = message ? undefined : [rangeHint(field), source && t('editor.widget.startingValue', { source })].filter(Boolean).join(' · ');
    return (
      <Field key={key} label={nameOf(field.path, field.label)} required={field.required} hint={hint || undefined} validationMessage={message}>
        {field.kind === 'choice' ? (
          <Select value={shownText(field)} onChange={(_event, data) => setField(field, data.value)}>
            {field.required ? null : <option value="">{t('editor.widget.notSet')}</option>}
            {field.choices?.map((choice) => <option key={String(choice)} value={String(choice)}>{choiceName(field.path, choice)}</option>)}
          </Select>
        ) : (
          <Input
            inputMode="decimal"
            value={shownText(field)}
            onChange={(_event, data) => setField(field, data.value)}
            contentAfter={field.unit ? <span className={styles.unit}>{field.unit}</span> : undefined}
            placeholder={field.required ? undefined : t('editor.widget.optional')}
          />
        )}
      </Field>
    );
  };

  return (
    <>
      {formIssues.map((message) => (
        <MessageBar key={message} intent="error" layout="multiline"><MessageBarBody>{message}</MessageBarBody></MessageBar>
      ))}
      {groups.map((group) =>
        group.path.length === 0 ? (
          group.fields.map(input)
        ) : (
          <fieldset key={group.path.join('.')} className={styles.group}>
            <legend className={styles.legend}>{nameOf(group.path, group.label)}</legend>
            {group.optional ? (
              <Switch
                label={t('editor.widget.useGroup')}
                checked={valueAt(params, group.path) !== undefined}
                onChange={(_event, data) => toggleGroup(group.path, data.checked)}
              />
            ) : null}
            {valueAt(params, group.path) !== undefined ? group.fields.map(input) : null}
          </fieldset>
        ),
      )}
    </>
  );
}
