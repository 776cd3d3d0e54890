import { Badge, type BadgeProps } from '@fluentui/react-components';
import type { ReleaseState } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';

const COLOURS: Record<ReleaseState, BadgeProps['color']> = {
  building: 'informative',
  ready: 'brand',
  live: 'success',
  superseded: 'subtle',
  failed: 'danger',
};

export function ReleaseStateBadge({ state }: { state: ReleaseState }) {
  const { t } = useTranslation();
  return <Badge appearance={state === 'live' ? 'filled' : 'tint'} color={COLOURS[state]}>{t(`releaseStates.${state}`)}</Badge>;
}
