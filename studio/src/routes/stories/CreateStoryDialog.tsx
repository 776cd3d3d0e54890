import { useState, type FormEvent } from 'react';
import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, makeStyles, Text, tokens } from '@fluentui/react-components';
import type { StoryView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useCreateStory } from '../../api/stories';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError, serverFieldMessage, shownAtField } from '../../components/forms/describe-error';
import { hasProblems, type FieldProblems } from '../../components/forms/validation';
import { STORY_FIELDS, storyProblems, storyToSend, type StoryField, type StoryValues } from './story-fields';
import { StoryFieldsForm } from './StoryFieldsForm';

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  intro: { color: tokens.colorNeutralForeground2 },
});

export function CreateStoryDialog({ onClose, onCreated }: { onClose: () => void; onCreated: (story: StoryView) => void }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const create = useCreateStory();
  const [values, setValues] = useState<StoryValues>({ title: '', exhibitId: '', audience: 'family', sourceLocale: 'en' });
  const [problems, setProblems] = useState<FieldProblems<StoryField>>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = storyProblems(t, values);
    setProblems(found);
    if (!hasProblems(found)) create.mutate(storyToSend(values), { onSuccess: onCreated });
  };

  const messages = Object.fromEntries(STORY_FIELDS.map((field) => [field, problems[field] ?? serverFieldMessage(create.error, field)]));
  const alert = create.error && !shownAtField(create.error, STORY_FIELDS) ? describeError(t, create.error) : null;

  return (
    <Dialog open modalType="modal" onOpenChange={(_event, data) => { if (!data.open) onClose(); }}>
      <DialogSurface>
        <form onSubmit={submit} noValidate>
          <DialogBody>
            <DialogTitle>{t('stories.createTitle')}</DialogTitle>
            <DialogContent className={styles.content}>
              <Text as="p" className={styles.intro}>{t('stories.createIntro')}</Text>
              {alert ? <FormAlert intent="error">{alert}</FormAlert> : null}
              <StoryFieldsForm values={values} onChange={setValues} messages={messages} />
            </DialogContent>
            <DialogActions>
              <Button appearance="secondary" onClick={onClose}>{t('common.cancel')}</Button>
              <Button type="submit" appearance="primary" disabled={create.isPending}>
                {create.isPending ? t('stories.creating') : t('stories.create')}
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
