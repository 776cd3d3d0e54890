import { useState } from 'react';
import { Field, Text, Textarea } from '@fluentui/react-components';
import type { SubmitRequest } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { FormDialog } from '../FormDialog';
import { FormAlert } from '../forms/FormAlert';

/**
 * "Submit for review?": a note to the educators, kept with the revision, and the warnings that go
 * along with it, before the story's editor closes for the review.
 */
export function SubmitDialog({ title, warnings, pending, problem, onSubmit, onClose }: {
  title: string;
  /** Preflight warnings of the draft: they do not stop the submission, the educator weighs them. */
  warnings: number;
  pending: boolean;
  problem: string | null;
  onSubmit: (request: SubmitRequest) => void;
  onClose: () => void;
}) {
  const { t } = useTranslation();
  const [note, setNote] = useState('');
  return (
    <FormDialog
      title={t('storyReview.submitTitle', { title })}
      intro={t('storyReview.submitIntro')}
      submitLabel={pending ? t('storyReview.submitting') : t('storyReview.submitConfirm')}
      pending={pending}
      onSubmit={() => onSubmit(note.trim() ? { note: note.trim() } : {})}
      onClose={onClose}
    >
      <Field label={t('storyReview.noteLabel')} hint={t('storyReview.noteHint')}>
        <Textarea value={note} rows={4} resize="vertical" onChange={(_event, data) => setNote(data.value)} />
      </Field>
      {warnings > 0 ? <Text>{t('storyReview.warningsGoAlong', { count: warnings })}</Text> : null}
      {problem ? <FormAlert intent="error">{problem}</FormAlert> : null}
    </FormDialog>
  );
}
