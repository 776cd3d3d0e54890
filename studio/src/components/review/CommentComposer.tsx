import { useState, type FormEvent } from 'react';
import { Button, Field, makeStyles, Textarea, tokens } from '@fluentui/react-components';
import { DismissRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import type { CommentRange } from '@mantlepiece/shared';
import { useAddComment, type NewComment } from '../../api/comments';
import { describeError } from '../forms/describe-error';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  quote: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    margin: 0,
    paddingLeft: tokens.spacingHorizontalS,
    borderLeft: `3px solid ${tokens.colorBrandStroke1}`,
    color: tokens.colorNeutralForeground2,
    fontStyle: 'italic',
  },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
});

export interface CommentComposerProps {
  revisionId: number;
  /** What the comment hangs on: a panel, a reply's parent, or neither for the revision as a whole. */
  anchor: Pick<NewComment, 'panelId' | 'parentId'>;
  label: string;
  submitLabel: string;
  range?: CommentRange | null;
  onClearRange?: () => void;
  onDone?: () => void;
}

/** A comment or reply box; the selected words, when there are some, travel with the comment. */
export function CommentComposer({ revisionId, anchor, label, submitLabel, range, onClearRange, onDone }: CommentComposerProps) {
  const { t } = useTranslation();
  const styles = useStyles();
  const add = useAddComment(revisionId);
  const [body, setBody] = useState('');
  const [empty, setEmpty] = useState(false);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!body.trim()) {
      setEmpty(true);
      return;
    }
    add.mutate(
      { ...anchor, ...(range ? { range } : {}), body: body.trim() },
      {
        onSuccess: () => {
          setBody('');
          onClearRange?.();
          onDone?.();
        },
      },
    );
  };
  const message = empty ? t('validation.required') : add.error ? describeError(t, add.error) : undefined;

  return (
    <form className={styles.form} onSubmit={submit} noValidate>
      {range ? (
        <p className={styles.quote} data-comment-range={`${range.from}-${range.to}`}>
          {t('comments.onWords', { quote: range.quote })}
          <Button size="small" appearance="subtle" icon={<DismissRegular />} onClick={onClearRange} aria-label={t('comments.clearRange')} />
        </p>
      ) : null}
      <Field label={label} validationMessage={message} validationState={message ? 'error' : 'none'}>
        <Textarea value={body} resize="vertical" onChange={(_event, data) => { setBody(data.value); setEmpty(false); }} />
      </Field>
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabled={add.isPending}>{add.isPending ? t('common.saving') : submitLabel}</Button>
        {onDone ? <Button onClick={onDone}>{t('common.cancel')}</Button> : null}
      </div>
    </form>
  );
}
