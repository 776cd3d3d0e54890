import { Badge, makeStyles, type BadgeProps } from '@fluentui/react-components';
import type { StoryState, StoryView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';

const COLOURS: Record<StoryState, BadgeProps['color']> = {
  draft: 'informative',
  in_review: 'warning',
  changes_requested: 'danger',
  approved: 'success',
  retired: 'subtle',
};

// A state is one label: in a narrow table column it widens the column rather than breaking out of its badge.
const useStyles = makeStyles({ badge: { whiteSpace: 'nowrap' } });

/** The states of a newer draft that leave an approved revision in the releases. */
const ALONGSIDE_APPROVED = ['draft', 'in_review', 'changes_requested'] as const;
const alongsideApproved = (state: StoryState): state is (typeof ALONGSIDE_APPROVED)[number] => (ALONGSIDE_APPROVED as readonly StoryState[]).includes(state);

/** The story's state; with an approved revision still in the releases, both ("Approved · draft in progress"). */
export function StoryStateBadge({ state, approvedRevision = null }: { state: StoryState; approvedRevision?: StoryView['approvedRevision'] }) {
  const { t } = useTranslation();
  const styles = useStyles();
  if (approvedRevision && alongsideApproved(state)) {
    return <Badge appearance="tint" color={COLOURS.approved} className={styles.badge} data-story-state={state}>{t(`storyReview.approvedAnd.${state}`)}</Badge>;
  }
  return <Badge appearance="tint" color={COLOURS[state]} className={styles.badge} data-story-state={state}>{t(`storyStates.${state}`)}</Badge>;
}
