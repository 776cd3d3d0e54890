import { useTranslation } from 'react-i18next';
import type { Schema } from '../../api/client';
import { useRevokeKiosk } from '../../api/fleet';
import { ConfirmDialog } from '../ConfirmDialog';
import { describeError } from '../forms/describe-error';

type FleetKioskView = Schema<'FleetKioskView'>;

/** Asks before a kiosk loses its access; revoking cannot be undone, only replaced by a new pairing. */
export function RevokeKioskDialog({ kiosk, onClose }: { kiosk: FleetKioskView; onClose: () => void }) {
  const { t } = useTranslation();
  const revoke = useRevokeKiosk();
  return (
    <ConfirmDialog
      title={t('fleetKiosk.revokeTitle')}
      confirmLabel={revoke.isPending ? t('fleetKiosk.revoking') : t('fleetKiosk.revokeConfirm')}
      pending={revoke.isPending}
      problem={revoke.isError ? describeError(t, revoke.error) : null}
      onConfirm={() => revoke.mutate(kiosk.id, { onSuccess: onClose })}
      onCancel={onClose}
    >
      <p>{t('fleetKiosk.revokeBody', { station: kiosk.station.name })}</p>
    </ConfirmDialog>
  );
}
