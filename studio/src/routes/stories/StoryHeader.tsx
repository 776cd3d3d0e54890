import { useState, type FormEvent } from 'react';
import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import type { StoryDetailView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useUpdateStory } from '../../api/stories';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError, serverFieldMessage, shownAtField } from '../../components/forms/describe-error';
import { hasProblems, type FieldProblems } from '../../components/forms/validation';
import { useDateFormat } from '../../components/formatting';
import { TextLink } from '../../components/links';
import { usePageTitle } from '../../app/page-title';
import { STORY_FIELDS, storyProblems, storyToSend, type StoryField, type StoryValues } from './story-fields';
import { StoryFieldsForm } from './StoryFieldsForm';
import { StoryStateBadge } from './StoryStateBadge';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, marginBottom: tokens.spacingVerticalM },
  top: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  meta: { color: tokens.colorNeutralForeground3 },
  form: { display: 'flex', gap: tokens.spacingHorizontalM, alignItems: 'flex-end', flexWrap: 'wrap' },
  fields: { flexGrow: 1 },
});

const valuesOf = (story: StoryDetailView): StoryValues => ({
  title: story.title,
  exhibitId: story.exhibitId === null ? '' : String(story.exhibitId),
  audience: story.audience,
  sourceLocale: story.sourceLocale,
});

/** The story's title, exhibit, audience and language, edited in place; its state shown beside them. */
export function StoryHeader({ story, readOnly }: { story: StoryDetailView; readOnly: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const update = useUpdateStory(story.id);
  const [values, setValues] = useState(() => valuesOf(story));
  const [problems, setProblems] = useState<FieldProblems<StoryField>>({});
  usePageTitle(story.title);
  const saved = valuesOf(story);
  const dirty = STORY_FIELDS.some((field) => values[field] !== saved[field]);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = storyProblems(t, values);
    setProblems(found);
    if (!hasProblems(found)) update.mutate(storyToSend(values), { onSuccess: (next) => setValues(valuesOf({ ...story, ...next })) });
  };
  const messages = Object.fromEntries(STORY_FIELDS.map((field) => [field, problems[field] ?? serverFieldMessage(update.error, field)]));
  const alert = update.error && !shownAtField(update.error, STORY_FIELDS) ? describeError(t, update.error) : null;

  return (
    <header className={styles.root}>
      <div>
        <TextLink to="/stories">{t('story.backToStories')}</TextLink>
      </div>
      <div className={styles.top}>
        <Text as="h1" size={700} weight="semibold">{story.title}</Text>
        <StoryStateBadge state={story.state} approvedRevision={story.approvedRevision} />
        <Text className={styles.meta}>
          {t('story.meta', { count: story.panels.length, date: formatDate(story.updatedAt) })}
          {story.createdBy ? ` · ${t('story.createdBy', { name: story.createdBy.name })}` : ''}
        </Text>
      </div>
      {readOnly ? null : (
        <form className={styles.form} onSubmit={submit} noValidate aria-label={t('story.details')}>
          <div className={styles.fields}>
            <StoryFieldsForm values={values} onChange={setValues} messages={messages} layout="row" />
          </div>
          <Button type="submit" appearance={dirty ? 'primary' : 'secondary'} disabled={!dirty || update.isPending}>
            {update.isPending ? t('common.saving') : t('story.saveDetails')}
          </Button>
        </form>
      )}
      {alert ? <FormAlert intent="error">{alert}</FormAlert> : null}
    </header>
  );
}
