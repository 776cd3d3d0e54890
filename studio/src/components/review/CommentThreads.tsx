import { useState } from 'react';
import { Badge, Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import type { CommentRange, CommentView } from '@mantlepiece/shared';
import { useResolveComment } from '../../api/comments';
import { useDateFormat } from '../formatting';
import { FormAlert } from '../forms/FormAlert';
import { describeError } from '../forms/describe-error';
import { CommentComposer } from './CommentComposer';
import { useReviewStyles } from './review-styles';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  threads: { listStyle: 'none', margin: 0, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  thread: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, padding: tokens.spacingHorizontalM, borderRadius: tokens.borderRadiusMedium, backgroundColor: tokens.colorNeutralBackground2 },
  resolved: { opacity: 0.8 },
  replies: { listStyle: 'none', margin: 0, paddingLeft: tokens.spacingHorizontalL, borderLeft: `2px solid ${tokens.colorNeutralStroke2}`, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  byline: { display: 'flex', gap: tokens.spacingHorizontalS, alignItems: 'center', flexWrap: 'wrap' },
  body: { margin: 0, whiteSpace: 'pre-wrap' },
  quote: { margin: 0, paddingLeft: tokens.spacingHorizontalS, borderLeft: `3px solid ${tokens.colorBrandStroke1}`, fontStyle: 'italic', color: tokens.colorNeutralForeground2 },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
});

function CommentBody({ comment }: { comment: CommentView }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const formatDate = useDateFormat();
  return (
    <>
      <div className={styles.byline}>
        <Text weight="semibold">{comment.author?.name ?? t('revision.formerColleague')}</Text>
        <Text className={shared.muted}>{formatDate(comment.createdAt)}</Text>
        {comment.carriedFromRevisionId !== null ? <Badge appearance="outline" color="informative">{t('comments.carried')}</Badge> : null}
        {comment.anchorChanged === true ? <Badge appearance="tint" color="warning" data-anchor-changed>{t('comments.anchorChanged')}</Badge> : null}
        {comment.anchorChanged === false ? <Badge appearance="tint" color="success">{t('comments.anchorSame')}</Badge> : null}
      </div>
      {comment.range ? <blockquote className={styles.quote}>{comment.range.quote}</blockquote> : null}
      <p className={styles.body} dir="auto">{comment.body}</p>
    </>
  );
}

function Thread({ comment, replies, revisionId }: { comment: CommentView; replies: CommentView[]; revisionId: number }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const resolve = useResolveComment(revisionId);
  const [replying, setReplying] = useState(false);
  const resolved = comment.resolvedAt !== null;
  return (
    <li className={resolved ? `${styles.thread} ${styles.resolved}` : styles.thread} data-comment-id={comment.id} data-resolved={resolved || undefined}>
      <CommentBody comment={comment} />
      {replies.length > 0 ? (
        <ul className={styles.replies} aria-label={t('comments.replies')}>
          {replies.map((reply) => <li key={reply.id}><CommentBody comment={reply} /></li>)}
        </ul>
      ) : null}
      {resolved ? <Text className={shared.muted}>{t('comments.resolvedBy', { name: comment.resolvedBy?.name ?? '' })}</Text> : null}
      {replying ? (
        <CommentComposer revisionId={revisionId} anchor={{ parentId: comment.id }} label={t('comments.reply')} submitLabel={t('comments.sendReply')} onDone={() => setReplying(false)} />
      ) : comment.can.reply || comment.can.resolve ? (
        // The comment's own `can`: its author or a reviewer of the revision resolves it.
        <div className={styles.actions}>
          {resolved || !comment.can.reply ? null : <Button size="small" onClick={() => setReplying(true)}>{t('comments.reply')}</Button>}
          {comment.can.resolve ? (
            <Button size="small" disabled={resolve.isPending} onClick={() => resolve.mutate({ id: comment.id, resolved: !resolved })}>
              {resolved ? t('comments.reopen') : t('comments.resolve')}
            </Button>
          ) : null}
        </div>
      ) : null}
      {resolve.isError ? <FormAlert intent="error">{describeError(t, resolve.error)}</FormAlert> : null}
    </li>
  );
}

export interface CommentThreadsProps {
  revisionId: number;
  comments: CommentView[];
  /** The panel these threads hang on; null for comments on the revision as a whole. */
  panelId: number | null;
  canComment: boolean;
  range?: CommentRange | null;
  onClearRange?: () => void;
  /** False where only existing threads are answered (the story editor); new comments are written on the revision page. */
  allowNew?: boolean;
}

/** The threads on one panel (or on the whole revision), oldest first, with a box for a new one. */
export function CommentThreads({ revisionId, comments, panelId, canComment, range, onClearRange, allowNew = true }: CommentThreadsProps) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const byTime = [...comments].sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id - b.id);
  const threads = byTime.filter((comment) => comment.parentId === null && comment.panelId === panelId);
  return (
    <section className={styles.root} aria-label={panelId === null ? t('comments.onRevision') : t('comments.onPanel')}>
      {threads.length > 0 ? (
        <ul className={styles.threads}>
          {threads.map((comment) => (
            <Thread key={comment.id} comment={comment} replies={byTime.filter((reply) => reply.parentId === comment.id)} revisionId={revisionId} />
          ))}
        </ul>
      ) : (
        <Text className={shared.muted}>{t('comments.none')}</Text>
      )}
      {canComment && allowNew ? (
        <CommentComposer
          revisionId={revisionId}
          anchor={panelId === null ? {} : { panelId }}
          label={panelId === null ? t('comments.newOnRevision') : range ? t('comments.newOnWords') : t('comments.newOnPanel')}
          submitLabel={t('comments.add')}
          range={range}
          onClearRange={onClearRange}
        />
      ) : null}
    </section>
  );
}
