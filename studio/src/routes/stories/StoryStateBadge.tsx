import { Badge, type BadgeProps } from '@fluentui/react-components';
import type { StoryState } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';

const COLOURS: Record<StoryState, BadgeProps['color']> = {
  draft: 'informative',
  in_review: 'warning',
  changes_requested: 'danger',
  approved: 'success',
  retired: 'subtle',
};

export function StoryStateBadge({ state }: { state: StoryState }) {
  const { t } = useTranslation();
  return <Badge appearance="tint" color={COLOURS[state]}>{t(`storyStates.${state}`)}</Badge>;
}
