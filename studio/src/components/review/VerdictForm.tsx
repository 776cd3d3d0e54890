import { useState, type FormEvent } from 'react';
import { Button, Field, makeStyles, Radio, RadioGroup, Text, Textarea, tokens } from '@fluentui/react-components';
import type { PreflightEntry, RevisionCan, StoryState, Verdict } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { ApiError } from '../../api/client';
import { useRecordVerdict } from '../../api/reviews';
import { FormAlert } from '../forms/FormAlert';
import { describeError } from '../forms/describe-error';
import { useReviewStyles } from './review-styles';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  blockers: { margin: 0, paddingLeft: tokens.spacingHorizontalL },
  actions: { display: 'flex', gap: tokens.spacingHorizontalM, alignItems: 'center' },
});

export interface VerdictFormProps {
  /** Which verdicts the server would take from this person. */
  can: RevisionCan;
  revisionId: number;
  storyId: number;
  blockers: PreflightEntry[];
  /** Told after the server took a verdict, or refused a move because the story had moved on. */
  onSettled: () => void;
  /** Told the story's state once the server took the verdict; the page shows the outcome, since this form goes away with the open revision. */
  onRecorded: (storyState: StoryState) => void;
}

/** Approve, or ask for changes with a note that says what to change. */
export function VerdictForm({ can, revisionId, storyId, blockers, onSettled, onRecorded }: VerdictFormProps) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const record = useRecordVerdict(revisionId, storyId);
  const [verdict, setVerdict] = useState<Verdict>(can.approve ? 'approve' : 'request_changes');
  const [note, setNote] = useState('');
  const [noteMissing, setNoteMissing] = useState(false);
  const blocked = verdict === 'approve' && blockers.length > 0;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (verdict === 'request_changes' && !note.trim()) {
      setNoteMissing(true);
      return;
    }
    if (blocked) return;
    record.mutate({ verdict, ...(note.trim() ? { note: note.trim() } : {}) }, { onSettled, onSuccess: ({ storyState }) => onRecorded(storyState) });
  };

  const error = record.error instanceof ApiError ? record.error : null;
  const noteMessage = noteMissing ? t('verdict.noteRequired') : error?.status === 400 ? (error.fieldMessage('note') ?? error.message) : undefined;
  const refusal = record.isError && !(error?.status === 400)
    ? describeError(t, record.error, { 403: t('verdict.forbidden', { message: error?.message ?? '' }), 409: t('verdict.illegalMove', { message: error?.message ?? '' }) })
    : null;

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-labelledby="verdict-heading">
      <Text as="h2" id="verdict-heading" size={500} weight="semibold" className={shared.heading}>{t('verdict.title')}</Text>
      <RadioGroup value={verdict} onChange={(_event, data) => setVerdict(data.value as Verdict)} aria-label={t('verdict.title')}>
        <Radio value="approve" label={t('verdict.approve')} disabled={!can.approve} />
        <Radio value="request_changes" label={t('verdict.requestChanges')} disabled={!can.requestChanges} />
      </RadioGroup>
      {blockers.length > 0 ? (
        <FormAlert intent="warning">{t('verdict.blocked', { count: blockers.length })}</FormAlert>
      ) : null}
      {blockers.length > 0 ? (
        <ul className={styles.blockers} data-verdict-blockers>
          {blockers.map((blocker, index) => <li key={index}>{blocker.message}</li>)}
        </ul>
      ) : null}
      <Field
        label={verdict === 'request_changes' ? t('verdict.noteForChanges') : t('verdict.noteOptional')}
        required={verdict === 'request_changes'}
        validationMessage={noteMessage}
        validationState={noteMessage ? 'error' : 'none'}
      >
        <Textarea value={note} rows={4} resize="vertical" onChange={(_event, data) => { setNote(data.value); setNoteMissing(false); }} />
      </Field>
      {error?.status === 422 ? (
        <>
          <FormAlert intent="error">{t('verdict.preflightRefused')}</FormAlert>
          <ul className={styles.blockers}>{error.errors.map((item, index) => <li key={index}>{item.message}</li>)}</ul>
        </>
      ) : refusal ? (
        <FormAlert intent="error">{refusal}</FormAlert>
      ) : null}
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabled={blocked || record.isPending}>
          {record.isPending ? t('common.saving') : verdict === 'approve' ? t('verdict.sendApprove') : t('verdict.sendChanges')}
        </Button>
      </div>
    </form>
  );
}
