import { useState } from 'react';
import { Button, makeStyles, MessageBar, MessageBarBody, MessageBarTitle, Text, tokens } from '@fluentui/react-components';
import { ArchiveRegular, SendRegular } from '@fluentui/react-icons';
import { STORY_WORKFLOW, type RevisionSummary, type StoryDetailView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useCurrentUser } from '../../api/session';
import { useRetireStory, useRevision, useStoryRevisions, useSubmitStory } from '../../api/revisions';
import { ConfirmDialog } from '../ConfirmDialog';
import { useDateFormat } from '../formatting';
import { FormAlert } from '../forms/FormAlert';
import { describeError } from '../forms/describe-error';
import { LinkButton, TextLink } from '../links';
import { groupPreflight } from './preflight-groups';
import { PreflightList } from './PreflightList';
import { useReviewStyles } from './review-styles';
import { RevisionStateBadge } from './RevisionStateBadge';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, marginBottom: tokens.spacingVerticalM },
  actions: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  summary: { cursor: 'pointer', fontWeight: tokens.fontWeightSemibold, padding: `${tokens.spacingVerticalXS} 0` },
  revisions: { listStyle: 'none', margin: `${tokens.spacingVerticalXS} 0 0`, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  revision: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  result: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
});

const canTake = (action: 'submit' | 'retire', roles: readonly string[], state: StoryDetailView['state']) =>
  STORY_WORKFLOW[action].roles.some((role) => roles.includes(role)) && STORY_WORKFLOW[action].from.includes(state);

/**
 * The workflow lets an open or approved story be submitted again, but the editor is read-only in
 * those states, so a new revision would only repeat the last one; the button waits for an edit.
 */
const SUBMIT_OFFERED: readonly StoryDetailView['state'][] = ['draft', 'changes_requested', 'retired'];

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
        {request.note}{' '}
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

/** The story's way through review: submit (and what preflight found), retire, and its revisions. */
export function StoryReview({ story }: { story: StoryDetailView }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const me = useCurrentUser();
  const submit = useSubmitStory(story.id);
  const retire = useRetireStory(story.id);
  const [confirmRetire, setConfirmRetire] = useState(false);
  const submitted = submit.data;
  const revisions = useStoryRevisions(story.id);
  const latest = revisions.data?.reduce<RevisionSummary | undefined>((last, revision) => (!last || revision.number > last.number ? revision : last), undefined);
  const blockers = submitted ? groupPreflight(submitted.preflight).blockers : [];

  return (
    <section className={styles.root} aria-label={t('storyReview.label')}>
      <div className={styles.actions}>
        {canTake('submit', me.roles, story.state) && SUBMIT_OFFERED.includes(story.state) ? (
          <Button appearance="primary" icon={<SendRegular />} disabled={submit.isPending || story.panels.length === 0} onClick={() => submit.mutate()}>
            {submit.isPending ? t('storyReview.submitting') : t('storyReview.submit')}
          </Button>
        ) : null}
        {canTake('retire', me.roles, story.state) ? (
          <Button icon={<ArchiveRegular />} onClick={() => setConfirmRetire(true)}>{t('storyReview.retire')}</Button>
        ) : null}
        {story.state === 'in_review' ? <Text className={shared.muted}>{t('storyReview.inReviewHint')}</Text> : null}
      </div>
      {story.state === 'changes_requested' && latest ? <ChangesRequested revisionId={latest.id} /> : null}
      {submit.isError ? <FormAlert intent="error">{describeError(t, submit.error)}</FormAlert> : null}
      {retire.isSuccess ? <FormAlert intent="success">{t('storyReview.retired')}</FormAlert> : null}

      {submitted ? (
        <div className={`${shared.card} ${styles.result}`} data-submitted-revision={submitted.revisionId}>
          <FormAlert intent={blockers.length > 0 ? 'warning' : 'success'}>
            {blockers.length > 0 ? t('storyReview.submittedWithBlockers', { number: submitted.number, count: blockers.length }) : t('storyReview.submitted', { number: submitted.number })}
          </FormAlert>
          <PreflightList
            entries={submitted.preflight}
            panelLink={(panelId) => {
              const index = story.panels.findIndex((panel) => panel.id === panelId);
              return index < 0 ? null : <TextLink to={{ search: `?panel=${panelId}` }}>{t('story.panelNumber', { number: index + 1 })}</TextLink>;
            }}
          />
          <div>
            <LinkButton to={`/reviews/${submitted.revisionId}`}>{t('storyReview.openRevision', { number: submitted.number })}</LinkButton>
          </div>
        </div>
      ) : null}

      <RevisionList storyId={story.id} />

      {confirmRetire ? (
        <ConfirmDialog
          title={t('storyReview.retireTitle', { title: story.title })}
          confirmLabel={t('storyReview.retireConfirm')}
          pending={retire.isPending}
          problem={retire.isError ? describeError(t, retire.error) : null}
          onConfirm={() => retire.mutate(undefined, { onSuccess: () => setConfirmRetire(false) })}
          onCancel={() => setConfirmRetire(false)}
        >
          {t('storyReview.retireBody')}
        </ConfirmDialog>
      ) : null}
    </section>
  );
}
