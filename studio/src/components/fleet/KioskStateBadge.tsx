import type { ReactElement } from 'react';
import { Badge, type BadgeProps } from '@fluentui/react-components';
import { CheckmarkCircleFilled, ClockAlarmFilled, DismissCircleFilled, ProhibitedFilled } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import type { Schema } from '../../api/client';

type FleetKioskView = Schema<'FleetKioskView'>;

type ShownState = FleetKioskView['state'] | 'revoked';

/** Each state has its own word and icon, so it reads without telling colours apart. */
const LOOKS: Record<ShownState, { color: BadgeProps['color']; icon: ReactElement }> = {
  online: { color: 'success', icon: <CheckmarkCircleFilled /> },
  stale: { color: 'warning', icon: <ClockAlarmFilled /> },
  offline: { color: 'danger', icon: <DismissCircleFilled /> },
  revoked: { color: 'subtle', icon: <ProhibitedFilled /> },
};

export function KioskStateBadge({ kiosk }: { kiosk: Pick<FleetKioskView, 'state' | 'revokedAt'> }) {
  const { t } = useTranslation();
  const shown: ShownState = kiosk.revokedAt ? 'revoked' : kiosk.state;
  const { color, icon } = LOOKS[shown];
  return <Badge appearance="tint" color={color} icon={icon} data-state={shown}>{t(`kioskStates.${shown}`)}</Badge>;
}
