import { useMemo, useState } from 'react';
import { Link, makeStyles, Spinner, Text, tokens } from '@fluentui/react-components';
import { mediaIdsIn, type RevisionView, type StoryState } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useParams } from 'react-router-dom';
import { ApiError } from '../../api/client';
import { useMediaAssets } from '../../api/media';
import { useRevision, useRevisionComparison } from '../../api/revisions';
import { useStory } from '../../api/stories';
import { EmptyState } from '../../components/EmptyState';
import { useResolveMedia } from '../../components/editor/media-resolver';
import { describeError } from '../../components/forms/describe-error';
import { FormAlert } from '../../components/forms/FormAlert';
import { useDateFormat } from '../../components/formatting';
import { LinkButton, TextLink } from '../../components/links';
import { PageHeader } from '../../components/PageHeader';
import { CommentThreads } from '../../components/review/CommentThreads';
import { PanelComparison } from '../../components/review/PanelComparison';
import { groupPreflight } from '../../components/review/preflight-groups';
import { PreflightList } from '../../components/review/PreflightList';
import { useReviewStyles } from '../../components/review/review-styles';
import { RevisionModelCards } from '../../components/review/RevisionModelCards';
import { RevisionStateBadge } from '../../components/review/RevisionStateBadge';
import { VerdictForm } from '../../components/review/VerdictForm';
import { VerdictHistory } from '../../components/review/VerdictHistory';
import { StoryStateBadge } from '../stories/StoryStateBadge';

const useStyles = makeStyles({
  facts: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  top: { display: 'grid', gridTemplateColumns: 'minmax(0, 3fr) minmax(20rem, 2fr)', gap: tokens.spacingHorizontalL, alignItems: 'start', marginBottom: tokens.spacingVerticalL, '@media (max-width: 1100px)': { gridTemplateColumns: 'minmax(0, 1fr)' } },
  column: { display: 'flex', flexDirection: 'column', gap: tokens.spacingHorizontalL },
  panels: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL, marginBottom: tokens.spacingVerticalL },
  note: { marginBottom: tokens.spacingVerticalL },
  noteText: { margin: 0, whiteSpace: 'pre-wrap' },
});

/** Shows a content hash by its first 12 hex digits, as people read commit hashes; the whole one on hover and to screen readers. */
const SHORT_HASH = 12;

/** Every asset either side shows, loaded into the cache before the drawings ask for them. */
function useRevisionMedia(revisions: (RevisionView | null | undefined)[]): boolean {
  const ids = useMemo(
    () => [...new Set(revisions.flatMap((revision) => revision?.snapshot.flatMap((panel) => Object.values(panel.docs).flatMap(mediaIdsIn)) ?? []))].map(Number).filter(Number.isInteger),
    [revisions],
  );
  return useMediaAssets(ids).every((result) => !result.isPending);
}

export function RevisionPage() {
  const { t } = useTranslation();
  const { revisionId } = useParams();
  const id = Number(revisionId);
  const revision = useRevision(id);
  const comparison = useRevisionComparison(id);

  if (revision.isPending) return <Spinner label={t('common.loading')} />;
  if (revision.isError) {
    const missing = revision.error instanceof ApiError && revision.error.status === 404;
    return (
      <EmptyState title={missing ? t('revision.notFound') : t('revision.loadError')} actions={<LinkButton to="/reviews">{t('revision.backToReviews')}</LinkButton>}>
        {missing ? t('revision.notFoundBody') : describeError(t, revision.error)}
      </EmptyState>
    );
  }
  return <RevisionReview revision={revision.data} comparison={comparison} />;
}

function RevisionReview({ revision, comparison }: { revision: RevisionView; comparison: ReturnType<typeof useRevisionComparison> }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const formatDate = useDateFormat();
  const story = useStory(revision.storyId);
  const locale = story.data?.sourceLocale ?? 'en';
  const resolveMedia = useResolveMedia(locale);
  const mediaReady = useRevisionMedia([revision, comparison.data?.base]);
  const { blockers } = groupPreflight(revision.preflight);
  const canComment = revision.can.comment;
  const numberOf = (panelId: number) => revision.snapshot.findIndex((panel) => panel.panelId === panelId) + 1;

  const refreshStory = () => void story.refetch();
  // Kept here rather than in the verdict form: the form leaves the page once the revision is no longer open.
  const [recorded, setRecorded] = useState<StoryState | null>(null);
  const outcome = recorded === 'approved' ? 'approved' : recorded === 'changes_requested' ? 'changes' : 'waiting';

  return (
    <>
      <PageHeader
        title={t('revision.title', { story: revision.storyTitle, number: revision.number })}
        intro={(
          <span className={styles.facts}>
            <RevisionStateBadge state={revision.state} />
            {story.data ? <span>{t('revision.storyIs')} <StoryStateBadge state={story.data.state} approvedRevision={story.data.approvedRevision} /></span> : null}
            <span>
              {t('revision.hash')}{' '}
              <code className={shared.hash} title={revision.hash} aria-label={revision.hash}>{revision.hash.slice(0, SHORT_HASH)}</code>
            </span>
            <span>{t('revision.submitted', { name: revision.submittedBy?.name ?? t('revision.formerColleague'), date: formatDate(revision.submittedAt) })}</span>
          </span>
        )}
        actions={<LinkButton to={`/stories/${revision.storyId}`}>{t('revision.openStory')}</LinkButton>}
      />

      {revision.note ? (
        <section className={`${shared.card} ${styles.note}`} aria-labelledby="note-heading" data-submission-note>
          <Text as="h2" id="note-heading" size={500} weight="semibold" className={shared.heading}>
            {t('revision.noteFrom', { name: revision.submittedBy?.name ?? t('revision.formerColleague') })}
          </Text>
          <Text as="p" className={styles.noteText} dir="auto">{revision.note}</Text>
        </section>
      ) : null}

      <div className={styles.top}>
        <section className={shared.card} aria-labelledby="preflight-heading">
          <Text as="h2" id="preflight-heading" size={500} weight="semibold" className={shared.heading}>{t('preflight.title')}</Text>
          <PreflightList
            entries={revision.preflight}
            panelLink={(panelId) => (numberOf(panelId) > 0 ? <Link href={`#panel-${panelId}`}>{t('story.panelNumber', { number: numberOf(panelId) })}</Link> : null)}
          />
        </section>
        <div className={styles.column}>
          {revision.can.approve || revision.can.requestChanges ? (
            <section className={shared.card}>
              <VerdictForm can={revision.can} revisionId={revision.id} storyId={revision.storyId} blockers={blockers} onSettled={refreshStory} onRecorded={setRecorded} />
            </section>
          ) : null}
          {recorded ? <div data-verdict-outcome={recorded}><FormAlert intent="success">{t(`verdict.recorded.${outcome}`)}</FormAlert></div> : null}
          <section className={shared.card} aria-labelledby="verdicts-heading">
            <Text as="h2" id="verdicts-heading" size={500} weight="semibold" className={shared.heading}>{t('verdict.history')}</Text>
            <VerdictHistory reviews={revision.reviews} />
          </section>
        </div>
      </div>

      {comparison.isPending || !mediaReady || story.isPending ? (
        <Spinner label={t('common.loading')} />
      ) : comparison.isError ? (
        <EmptyState title={t('revision.compareError')} headingLevel={2}>{describeError(t, comparison.error)}</EmptyState>
      ) : (
        <div className={styles.panels}>
          {comparison.data.base ? (
            <Text data-comparison-basis={comparison.data.basis}>
              {t(comparison.data.basis === 'approved' ? 'revision.comparedWith' : 'revision.comparedWithChangesRequested')}{' '}
              <TextLink to={`/reviews/${comparison.data.base.id}`}>{t('revision.number', { number: comparison.data.base.number })}</TextLink>
            </Text>
          ) : (
            <div data-comparison-basis="first_review"><FormAlert intent="info">{t('revision.firstReview')}</FormAlert></div>
          )}
          {comparison.data.diff.map((diff) => (
            <PanelComparison
              key={diff.panelId}
              diff={diff}
              panel={revision.snapshot.find((panel) => panel.panelId === diff.panelId)}
              basePanel={comparison.data.base?.snapshot.find((panel) => panel.panelId === diff.panelId)}
              basis={comparison.data.basis}
              locale={locale}
              resolveMedia={resolveMedia}
              revisionId={revision.id}
              comments={revision.comments}
              canComment={canComment}
            />
          ))}
        </div>
      )}

      <RevisionModelCards snapshot={revision.snapshot} />

      <section className={shared.card} aria-labelledby="general-comments-heading">
        <Text as="h2" id="general-comments-heading" size={500} weight="semibold" className={shared.heading}>{t('comments.onRevision')}</Text>
        <CommentThreads revisionId={revision.id} comments={revision.comments} panelId={null} canComment={canComment} />
      </section>
    </>
  );
}
