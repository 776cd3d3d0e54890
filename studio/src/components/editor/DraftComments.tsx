import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { commentsOnDraft, openThreadCount, type CommentView, type PanelDocJSON, type RevisionView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { CommentThreads } from '../review/CommentThreads';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  muted: { color: tokens.colorNeutralForeground3 },
});

/**
 * The open review threads of one panel beside its editor, each with its words marked in the text
 * (comment-highlights), and replies and resolving as on the revision page. A thread whose words
 * the curator has since rewritten says so.
 */
export function DraftComments({ revision, panelId, doc, locale }: { revision: RevisionView; panelId: number; doc: PanelDocJSON; locale: string }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const onDraft = commentsOnDraft(revision.comments, panelId, doc, locale);
  const threadIds = new Set(onDraft.map(({ comment }) => comment.id));
  const shown: CommentView[] = revision.comments.flatMap((comment) => {
    if (comment.parentId !== null) return threadIds.has(comment.parentId) ? [comment] : [];
    const drafted = onDraft.find((candidate) => candidate.comment.id === comment.id);
    return drafted ? [{ ...comment, anchorChanged: drafted.changed ? true : null }] : [];
  });
  return (
    <div className={styles.root} data-testid="draft-comments">
      <Text weight="semibold">{t('draftComments.title')}</Text>
      <Text className={styles.muted}>{t('draftComments.summary', { panel: onDraft.length, story: openThreadCount(revision.comments), number: revision.number })}</Text>
      {onDraft.length === 0 ? (
        <Text className={styles.muted}>{t('draftComments.none')}</Text>
      ) : (
        <CommentThreads revisionId={revision.id} comments={shown} panelId={panelId} canComment={revision.can.comment} allowNew={false} />
      )}
    </div>
  );
}
