import { useState } from 'react';
import type { StoryView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useCreateStory } from '../../api/stories';
import { FormDialog } from '../../components/FormDialog';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError, serverFieldMessage, shownAtField } from '../../components/forms/describe-error';
import { hasProblems, type FieldProblems } from '../../components/forms/validation';
import { STORY_FIELDS, storyProblems, storyToSend, type StoryField, type StoryValues } from './story-fields';
import { StoryFieldsForm } from './StoryFieldsForm';

export function CreateStoryDialog({ onClose, onCreated }: { onClose: () => void; onCreated: (story: StoryView) => void }) {
  const { t } = useTranslation();
  const create = useCreateStory();
  const [values, setValues] = useState<StoryValues>({ title: '', exhibitId: '', audience: 'family', sourceLocale: 'en' });
  const [problems, setProblems] = useState<FieldProblems<StoryField>>({});

  const submit = () => {
    const found = storyProblems(t, values);
    setProblems(found);
    if (!hasProblems(found)) create.mutate(storyToSend(values), { onSuccess: onCreated });
  };

  const messages = Object.fromEntries(STORY_FIELDS.map((field) => [field, problems[field] ?? serverFieldMessage(create.error, field)]));
  const alert = create.error && !shownAtField(create.error, STORY_FIELDS) ? describeError(t, create.error) : null;

  return (
    <FormDialog
      title={t('stories.createTitle')}
      intro={t('stories.createIntro')}
      submitLabel={create.isPending ? t('stories.creating') : t('stories.create')}
      pending={create.isPending}
      onSubmit={submit}
      onClose={onClose}
    >
      {alert ? <FormAlert intent="error">{alert}</FormAlert> : null}
      <StoryFieldsForm values={values} onChange={setValues} messages={messages} />
    </FormDialog>
  );
}
