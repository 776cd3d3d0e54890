import { Badge, type BadgeProps } from '@fluentui/react-components';
import type { StoryState, StoryView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';

const COLOURS: Record<StoryState, BadgeProps['color']> = {
  draft: 'informative',
  in_review: 'warning',
  changes_requested: 'danger',
  approved: 'success',
  retired: 'subtle',
};

/** The states of a newer draft that leave an approved revision in the releases. */
const ALONGSIDE_APPROVED = ['draft', 'in_review', 'changes_requested'] as const;
const alongsideApproved = (state: StoryState): state is (typeof ALONGSIDE_APPROVED)[number] => (ALONGSIDE_APPROVED as readonly StoryState[]).includes(state);

/** The story's state; with an approved revision still in the releases, both ("Approved · draft in progress"). */
export function StoryStateBadge({ state, approvedRevision = null }: { state: StoryState; approvedRevision?: StoryView['approvedRevision'] }) {
  const { t } = useTranslation();
  if (approvedRevision && alongsideApproved(state)) {
    return <Badge appearance="tint" color={COLOURS.approved} data-story-state={state}>{t(`storyReview.approvedAnd.${state}`)}</Badge>;
  }
  return <Badge appearance="tint" color={COLOURS[state]} data-story-state={state}>{t(`storyStates.${state}`)}</Badge>;
}
