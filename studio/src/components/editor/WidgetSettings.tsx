import { useState } from 'react';
import { Field, Input, makeStyles, MessageBar, MessageBarBody, Select, Switch, Text, tokens } from '@fluentui/react-components';
import type { Editor } from '@tiptap/react';
import { isWidgetType, widgetJsonSchema, widgetModule, widgetStrings, type PanelWidgetRef } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { issuesByField, parseFieldText, valueAt, widgetFormGroups, withValueAt, type WidgetFormField } from './widget-form';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  group: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusMedium, padding: tokens.spacingHorizontalM, margin: 0 },
  legend: { fontWeight: tokens.fontWeightSemibold, padding: `0 ${tokens.spacingHorizontalXS}` },
  unit: { color: tokens.colorNeutralForeground3, whiteSpace: 'nowrap' },
});

const rangeHint = (field: WidgetFormField) =>
  field.min !== undefined && field.max !== undefined ? `${field.minExclusive ? '>' : ''}${field.min} – ${field.max}${field.unit ? ` ${field.unit}` : ''}` : undefined;

/**
 * The settings of one widget, built from its JSON Schema. Every change goes straight into the
 * document (so the widget and its live values redraw at once); the messages come from the same
 * `validate` the server runs, and a panel with a widget set wrong is not sent until it is fixed.
 */
export function WidgetSettings({ editor, widget }: { editor: Editor; widget: PanelWidgetRef }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  // What the curator is typing, kept as text so "0." or "1e" survive until they become numbers.
  const [texts, setTexts] = useState<Record<string, string>>({});
  if (!isWidgetType(widget.widgetType)) {
    return <MessageBar intent="error"><MessageBarBody>{t('editor.widget.unknownType', { type: widget.widgetType })}</MessageBarBody></MessageBar>;
  }
  const module = widgetModule(widget.widgetType);
  const groups = widgetFormGroups(widgetJsonSchema(widget.widgetType));
  const checked = module.validate(widget.params);
  const issues = issuesByField(checked.ok ? [] : checked.errors);
  const warnings = checked.ok ? module.modelLimits(checked.params) : [];
  const fieldKeys = new Set(groups.flatMap((group) => group.fields.map((field) => field.path.join('.'))));
  const formIssues = [...issues].filter(([key]) => !fieldKeys.has(key)).flatMap(([, messages]) => messages);

  const setParams = (params: Record<string, unknown>) => editor.commands.setWidgetParams(widget.widgetId, params);
  const setField = (field: WidgetFormField, text: string) => {
    const key = field.path.join('.');
    setTexts((current) => ({ ...current, [key]: text }));
    setParams(withValueAt(widget.params, field.path, parseFieldText(text, field)));
  };
  const shownText = (field: WidgetFormField) => {
    const key = field.path.join('.');
    const stored = valueAt(widget.params, field.path);
    const typed = texts[key];
    return typed !== undefined && parseFieldText(typed, field) === stored ? typed : stored === undefined ? '' : String(stored);
  };
  const toggleGroup = (path: string[], on: boolean) => {
    const defaults = valueAt(module.defaults as Record<string, unknown>, path);
    setParams(withValueAt(widget.params, path, on ? (defaults ?? {}) : undefined));
  };

  const input = (field: WidgetFormField) => {
    const key = field.path.join('.');
    const message = issues.get(key)?.join(' ');
    return (
      <Field key={key} label={field.label} required={field.required} hint={message ? undefined : rangeHint(field)} validationMessage={message}>
        {field.kind === 'choice' ? (
          <Select value={shownText(field)} onChange={(_event, data) => setField(field, data.value)}>
            {field.required ? null : <option value="">{t('editor.widget.notSet')}</option>}
            {field.choices?.map((choice) => <option key={String(choice)} value={String(choice)}>{String(choice)}</option>)}
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
    <section className={styles.root} aria-label={t('editor.widget.settingsOf', { name: t(`widgetTypes.${widget.widgetType}`) })}>
      <MessageBar intent="info" layout="multiline">
        <MessageBarBody>{widgetStrings(i18n.resolvedLanguage ?? 'en').caution}</MessageBarBody>
      </MessageBar>
      {formIssues.map((message) => (
        <MessageBar key={message} intent="error" layout="multiline"><MessageBarBody>{message}</MessageBarBody></MessageBar>
      ))}
      {groups.map((group) =>
        group.path.length === 0 ? (
          group.fields.map(input)
        ) : (
          <fieldset key={group.path.join('.')} className={styles.group}>
            <legend className={styles.legend}>{group.label}</legend>
            {group.optional ? (
              <Switch
                label={t('editor.widget.useGroup')}
                checked={valueAt(widget.params, group.path) !== undefined}
                onChange={(_event, data) => toggleGroup(group.path, data.checked)}
              />
            ) : null}
            {valueAt(widget.params, group.path) !== undefined ? group.fields.map(input) : null}
          </fieldset>
        ),
      )}
      {warnings.map((warning) => (
        <MessageBar key={warning.code} intent="warning" layout="multiline"><MessageBarBody>{warning.message}</MessageBarBody></MessageBar>
      ))}
      {checked.ok ? <Text size={200}>{module.describe(checked.params, i18n.resolvedLanguage ?? 'en')}</Text> : null}
    </section>
  );
}
