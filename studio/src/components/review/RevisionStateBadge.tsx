import { Badge, type BadgeProps } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import type { RevisionState } from '@mantlepiece/shared';

const COLOURS: Record<RevisionState, BadgeProps['color']> = {
  open: 'warning',
  approved: 'success',
  changes_requested: 'danger',
  superseded: 'subtle',
  withdrawn: 'subtle',
};

export function RevisionStateBadge({ state }: { state: RevisionState }) {
  const { t } = useTranslation();
  return <Badge appearance="tint" color={COLOURS[state]}>{t(`revisionStates.${state}`)}</Badge>;
}
