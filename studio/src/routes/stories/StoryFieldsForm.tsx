import { Field, Input, makeStyles, Select, tokens } from '@fluentui/react-components';
import { AUDIENCES, type Audience } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useExhibits, useVenues } from '../../api/settings';
import { LanguagePicker } from '../../components/forms/LanguagePicker';
import { CHOICES_BY_NAME } from '../../components/lists/list-search';
import type { StoryField, StoryValues } from './story-fields';

const useStyles = makeStyles({
  grid: { display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(12rem, 1fr))', gap: tokens.spacingHorizontalM, alignItems: 'start' },
});

/** Exhibits to choose from; a venue has a handful, so one page of them is all of them. */
export function useExhibitChoices() {
  return useExhibits(CHOICES_BY_NAME);
}

/** Title, exhibit, audience and source locale: the create dialog and the story header both use these. */
export function StoryFieldsForm({ values, onChange, messages, layout = 'stack', onBlur }: {
  values: StoryValues;
  onChange: (values: StoryValues) => void;
  messages: Partial<Record<StoryField, string>>;
  layout?: 'stack' | 'row';
  onBlur?: () => void;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const exhibits = useExhibitChoices();
  const venues = useVenues(CHOICES_BY_NAME);
  const venueLanguages = venues.data?.items.flatMap((venue) => [venue.sourceLocale, ...venue.targetLocales]);
  const fields = (
    <>
      <Field label={t('storyForm.title')} required validationMessage={messages.title}>
        <Input name="title" value={values.title} onChange={(_event, data) => onChange({ ...values, title: data.value })} onBlur={onBlur} />
      </Field>
      <Field label={t('storyForm.exhibit')} validationMessage={messages.exhibitId} hint={exhibits.isError ? t('storyForm.exhibitsUnavailable') : undefined}>
        <Select name="exhibitId" value={values.exhibitId} onChange={(_event, data) => onChange({ ...values, exhibitId: data.value })} onBlur={onBlur}>
          <option value="">{t('storyForm.noExhibit')}</option>
          {exhibits.data?.items.map((exhibit) => <option key={exhibit.id} value={String(exhibit.id)}>{exhibit.name}</option>)}
        </Select>
      </Field>
      <Field label={t('storyForm.audience')} validationMessage={messages.audience}>
        <Select name="audience" value={values.audience} onChange={(_event, data) => onChange({ ...values, audience: data.value as Audience })} onBlur={onBlur}>
          {AUDIENCES.map((audience) => <option key={audience} value={audience}>{t(`audiences.${audience}`)}</option>)}
        </Select>
      </Field>
      <Field label={t('storyForm.sourceLocale')} hint={t('storyForm.sourceLocaleHint')} validationMessage={messages.sourceLocale}>
        <LanguagePicker value={values.sourceLocale} offered={venueLanguages} onChange={(sourceLocale) => onChange({ ...values, sourceLocale })} />
      </Field>
    </>
  );
  return layout === 'row' ? <div className={styles.grid}>{fields}</div> : fields;
}
