import { useState } from 'react';
import { Field, Input, makeStyles, Select, tokens } from '@fluentui/react-components';
import { ORIENTATIONS } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useGalleries, useSaveSetting, useVenues, type SettingsCollection, type SettingsView } from '../../api/settings';
import { FormDialog } from '../../components/FormDialog';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError, serverFieldMessage } from '../../components/forms/describe-error';
import { TimeZonePicker } from '../../components/forms/TimeZonePicker';
import { LanguagePicker } from '../../components/forms/LanguagePicker';
import { hasProblems, parseLocales } from '../../components/forms/validation';
import { SETTINGS_FORMS, type SettingsInput, type SettingsValues } from './settings-forms';
import { CHOICES_BY_NAME } from '../../components/lists/list-search';

const useStyles = makeStyles({
  unit: { color: tokens.colorNeutralForeground3 },
});

/** Create or change one venue, gallery, station or exhibit; the server's answer lands by its field. */
export function SettingsDialog<C extends SettingsCollection>({ collection, editing, onClose }: { collection: C; editing: SettingsView<C> | null; onClose: () => void }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const form = SETTINGS_FORMS[collection];
  const save = useSaveSetting(collection);
  const venues = useVenues(CHOICES_BY_NAME);
  const galleries = useGalleries(CHOICES_BY_NAME);
  const [values, setValues] = useState<SettingsValues>(() => (editing ? form.valuesOf(editing) : form.empty));
  const [problems, setProblems] = useState<Record<string, string | undefined>>({});

  const submit = () => {
    const found = form.problems(t, values);
    setProblems(found);
    if (!hasProblems(found)) save.mutate({ id: editing?.id, fields: form.toFields(values) }, { onSuccess: onClose });
  };
  const message = (name: string) => problems[name] ?? serverFieldMessage(save.error, name);
  const unplaced = save.error && !form.inputs.some((input) => serverFieldMessage(save.error, input.name)) ? describeError(t, save.error, { 409: t('settings.conflict') }) : null;
  const set = (name: string, value: string) => setValues((current) => ({ ...current, [name]: value }));
  // A row stays where it was made: the server takes no new venue or gallery in a change, so the
  // field is shown disabled, not required, and says why.
  const isFixed = (input: SettingsInput) => editing !== null && (input.kind === 'venue' || input.kind === 'gallery');
  const hintOf = (input: SettingsInput) => {
    if (isFixed(input)) return t(input.kind === 'venue' ? 'settings.hints.venueFixed' : 'settings.hints.galleryFixed');
    return input.hint ? t(`settings.hints.${input.hint}`) : undefined;
  };
  const languagesInUse = venues.data?.items.flatMap((venue) => [venue.sourceLocale, ...venue.targetLocales]);

  const control = (input: SettingsInput) => {
    const value = values[input.name] ?? '';
    switch (input.kind) {
      case 'venue':
      case 'gallery': {
        const options = (input.kind === 'venue' ? venues.data?.items : galleries.data?.items) ?? [];
        return (
          <Select value={value} disabled={isFixed(input)} onChange={(_event, data) => set(input.name, data.value)}>
            <option value="">{t('settings.choose')}</option>
            {options.map((option) => <option key={option.id} value={String(option.id)}>{option.name}</option>)}
          </Select>
        );
      }
      case 'timeZone':
        return <TimeZonePicker value={value} onChange={(zone) => set(input.name, zone)} />;
      case 'language':
        return <LanguagePicker value={value} offered={languagesInUse} onChange={(tag) => set(input.name, tag)} />;
      case 'languages':
        return <LanguagePicker multiple value={parseLocales(value).locales} offered={languagesInUse} onChange={(tags) => set(input.name, tags.join(', '))} />;
      case 'orientation':
        return (
          <Select value={value} onChange={(_event, data) => set(input.name, data.value)}>
            {ORIENTATIONS.map((orientation) => <option key={orientation} value={orientation}>{t(`settings.orientations.${orientation}`)}</option>)}
          </Select>
        );
      default:
        return (
          <Input
            type={input.kind === 'date' ? 'date' : 'text'}
            inputMode={input.kind === 'number' ? 'numeric' : undefined}
            value={value}
            onChange={(_event, data) => set(input.name, data.value)}
            contentAfter={input.unit ? <span className={styles.unit}>{input.unit}</span> : undefined}
          />
        );
    }
  };

  return (
    <FormDialog
      title={editing ? t(`settings.${collection}.edit`) : t(`settings.${collection}.create`)}
      submitLabel={save.isPending ? t('common.saving') : t('common.save')}
      pending={save.isPending}
      onSubmit={submit}
      onClose={onClose}
    >
      {unplaced ? <FormAlert intent="error">{unplaced}</FormAlert> : null}
      {form.inputs.map((input) => (
        <Field
          key={input.name}
          label={t(`settings.fields.${input.name as 'name'}`)}
          required={input.required && !isFixed(input)}
          hint={hintOf(input)}
          validationMessage={message(input.name)}
        >
          {control(input)}
        </Field>
      ))}
    </FormDialog>
  );
}
