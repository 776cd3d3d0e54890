import { useState } from 'react';
import { Button, makeStyles, MessageBar, MessageBarBody, MessageBarTitle, Text, tokens } from '@fluentui/react-components';
import { ArchiveRegular, ArrowUndoRegular, EditRegular, SendRegular } from '@fluentui/react-icons';
import { type PreflightEntry, type RevisionSummary, type StoryDetailView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useRetireStory, useReviseStory, useRevision, useStoryRevisions, useSubmitStory, useWithdrawSubmission } from '../../api/revisions';
import { useDraftPreflight } from '../../api/stories';
import { ConfirmDialog } from '../ConfirmDialog';
import { useDateFormat } from '../formatting';
import { FormAlert } from '../forms/FormAlert';
import { describeError } from '../forms/describe-error';
import { LinkButton, TextLink } from '../links';
import { groupPreflight } from './preflight-groups';
import { PreflightList } from './PreflightList';
import { useReviewStyles } from './review-styles';
import { RevisionStateBadge } from './RevisionStateBadge';
import { SubmitDialog } from './SubmitDialog';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, marginBottom: tokens.spacingVerticalM },
  actions: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  summary: { cursor: 'pointer', fontWeight: tokens.fontWeightSemibold, padding: `${tokens.spacingVerticalXS} 0` },
  revisions: { listStyle: 'none', margin: `${tokens.spacingVerticalXS} 0 0`, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  revision: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  result: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
});

/**
 * The workflow also lets a newer submission supersede an open one, but the editor is closed while
 * it is in review, so it would only repeat it: the studio offers Withdraw instead. A retired story
 * comes back through review as it is.
 */

/** What the educator asked for, on the story the curator is about to fix. */
function ChangesRequested({ revisionId }: { revisionId: number }) {
  const { t } = useTranslation();
  const revision = useRevision(revisionId);
  const request = revision.data?.reviews.filter((review) => review.verdict === 'request_changes').at(-1);
  if (!request) return null;
  return (
    <MessageBar intent="warning" layout="multiline" data-changes-requested>
      <MessageBarBody>
        <MessageBarTitle>{t('verdict.changesBy', { name: request.reviewer?.name ?? t('revision.formerColleague') })}</MessageBarTitle>
        <bdi>{request.note}</bdi>{' '}
        <TextLink to={`/reviews/${revisionId}`}>{t('storyReview.openRevision', { number: revision.data!.number })}</TextLink>
      </MessageBarBody>
    </MessageBar>
  );
}

function RevisionList({ storyId }: { storyId: number }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const formatDate = useDateFormat();
  const revisions = useStoryRevisions(storyId);
  if (revisions.isError) return <Text className={shared.muted}>{describeError(t, revisions.error)}</Text>;
  const items = [...(revisions.data ?? [])].sort((a, b) => b.number - a.number);
  return (
    <details data-story-revisions>
      <summary className={styles.summary}>{t('storyReview.revisions', { count: items.length })}</summary>
      {items.length === 0 ? (
        <Text className={shared.muted}>{t('storyReview.noRevisions')}</Text>
      ) : (
        <ul className={styles.revisions}>
          {items.map((revision) => (
            <li key={revision.id} className={styles.revision} data-revision-id={revision.id}>
              <TextLink to={`/reviews/${revision.id}`}>{t('revision.number', { number: revision.number })}</TextLink>
              <RevisionStateBadge state={revision.state} />
              <Text className={shared.muted}>{t('revision.submitted', { name: revision.submittedBy?.name ?? t('revision.formerColleague'), date: formatDate(revision.submittedAt) })}</Text>
              {revision.blockers > 0 ? <Text>{t('reviews.blockers', { count: revision.blockers })}</Text> : null}
              <code className={shared.hash} title={revision.hash}>{revision.hash.slice(0, 12)}</code>
            </li>
          ))}
        </ul>
      )}
    </details>
  );
}

/** Preflight of the draft as the curator writes: what stops a submission, and what the educator will weigh. */
function DraftPreflight({ story, entries }: { story: StoryDetailView; entries: PreflightEntry[] }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const { blockers } = groupPreflight(entries);
  return (
    <details className={shared.card} open={blockers.length > 0} data-draft-preflight>
      <summary className={styles.summary}>
        {blockers.length > 0 ? t('storyReview.draftBlocked', { count: blockers.length }) : t('storyReview.draftClear')}
      </summary>
      <PreflightList
        entries={entries}
        panelLink={(panelId) => {
          const index = story.panels.findIndex((panel) => panel.id === panelId);
          return index < 0 ? null : <TextLink to={{ search: `?panel=${panelId}` }}>{t('story.panelNumber', { number: index + 1 })}</TextLink>;
        }}
      />
    </details>
  );
}

type Dialog = 'submit' | 'withdraw' | 'retire';

/**
 * The story's way through review: preflight of the draft, submit (with a note, once nothing
 * blocks), withdraw, revise, retire, and its revisions. The story's `can`, decided by the server,
 * says which moves are offered.
 */
export function StoryReview({ story }: { story: StoryDetailView }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const submit = useSubmitStory(story.id);
  const withdraw = useWithdrawSubmission(story.id);
  const revise = useReviseStory(story.id);
  const retire = useRetireStory(story.id);
  const [dialog, setDialog] = useState<Dialog | null>(null);
  const [done, setDone] = useState<'withdrawn' | 'revised' | 'retired' | null>(null);
  const revisions = useStoryRevisions(story.id);
  const latest = revisions.data?.reduce<RevisionSummary | undefined>((last, revision) => (!last || revision.number > last.number ? revision : last), undefined);

  // The API still takes a new submission over an open one, but with the editor closed in review
  // it would carry the same text: the curator withdraws instead, so it is not offered there.
  const mayWrite = story.can.submit && story.state !== 'in_review';
  const preflight = useDraftPreflight(story.id, mayWrite);
  const { blockers, warnings } = groupPreflight(preflight.data ?? []);
  const offerSubmit = mayWrite && preflight.isSuccess && blockers.length === 0;
  const offerWithdraw = story.can.withdraw;
  const offerRevise = story.can.revise;
  const submitted = submit.data;
  const close = () => setDialog(null);
  const moved = (what: NonNullable<typeof done>) => () => { setDone(what); close(); };

  return (
    <section className={styles.root} aria-label={t('storyReview.label')}>
      <div className={styles.actions}>
        {offerSubmit ? (
          <Button appearance="primary" icon={<SendRegular />} onClick={() => { submit.reset(); setDialog('submit'); }}>{t('storyReview.submit')}</Button>
        ) : null}
        {offerRevise ? (
          <Button appearance="primary" icon={<EditRegular />} disabled={revise.isPending} onClick={() => revise.mutate(undefined, { onSuccess: moved('revised') })}>
            {t('storyReview.revise')}
          </Button>
        ) : null}
        {offerWithdraw ? <Button icon={<ArrowUndoRegular />} onClick={() => setDialog('withdraw')}>{t('storyReview.withdraw')}</Button> : null}
        {story.can.retire ? (
          <Button icon={<ArchiveRegular />} onClick={() => setDialog('retire')}>{t('storyReview.retire')}</Button>
        ) : null}
        {mayWrite && blockers.length > 0 ? <Text className={shared.muted}>{t('storyReview.fixBlockersFirst', { count: blockers.length })}</Text> : null}
        {story.state === 'in_review' ? <Text className={shared.muted}>{t(offerWithdraw ? 'storyReview.inReviewWithdrawHint' : 'storyReview.inReviewHint')}</Text> : null}
        {offerRevise ? <Text className={shared.muted}>{t('storyReview.approvedHint')}</Text> : null}
      </div>
      {story.state === 'changes_requested' && latest ? <ChangesRequested revisionId={latest.id} /> : null}
      {revise.isError ? <FormAlert intent="error">{describeError(t, revise.error)}</FormAlert> : null}
      {done === 'revised' && story.approvedRevision ? <FormAlert intent="success">{t('storyReview.revised', { number: story.approvedRevision.number })}</FormAlert> : null}
      {done === 'withdrawn' ? <FormAlert intent="success">{t('storyReview.withdrawn')}</FormAlert> : null}
      {done === 'retired' ? <FormAlert intent="success">{t('storyReview.retired')}</FormAlert> : null}
      {preflight.isError ? <FormAlert intent="error">{describeError(t, preflight.error)}</FormAlert> : null}
      {mayWrite && preflight.data ? <DraftPreflight story={story} entries={preflight.data} /> : null}

      {submitted && story.state === 'in_review' ? (
        <div className={`${shared.card} ${styles.result}`} data-submitted-revision={submitted.revisionId}>
          <FormAlert intent="success">{t('storyReview.submitted', { number: submitted.number })}</FormAlert>
          <div>
            <LinkButton to={`/reviews/${submitted.revisionId}`}>{t('storyReview.openRevision', { number: submitted.number })}</LinkButton>
          </div>
        </div>
      ) : null}

      <RevisionList storyId={story.id} />

      {dialog === 'submit' ? (
        <SubmitDialog
          title={story.title}
          warnings={warnings.length}
          pending={submit.isPending}
          problem={submit.isError ? describeError(t, submit.error) : null}
          onSubmit={(request) => submit.mutate(request, { onSuccess: close, onError: () => void preflight.refetch() })}
          onClose={close}
        />
      ) : null}
      {dialog === 'withdraw' ? (
        <ConfirmDialog
          title={t('storyReview.withdrawTitle', { title: story.title })}
          confirmLabel={t('storyReview.withdrawConfirm')}
          pending={withdraw.isPending}
          problem={withdraw.isError ? describeError(t, withdraw.error) : null}
          onConfirm={() => withdraw.mutate(undefined, { onSuccess: moved('withdrawn') })}
          onCancel={close}
        >
          {t('storyReview.withdrawBody')}
        </ConfirmDialog>
      ) : null}
      {dialog === 'retire' ? (
        <ConfirmDialog
          title={t('storyReview.retireTitle', { title: story.title })}
          confirmLabel={t('storyReview.retireConfirm')}
          pending={retire.isPending}
          problem={retire.isError ? describeError(t, retire.error) : null}
          onConfirm={() => retire.mutate(undefined, { onSuccess: moved('retired') })}
          onCancel={close}
        >
          {t('storyReview.retireBody')}
        </ConfirmDialog>
      ) : null}
    </section>
  );
}
