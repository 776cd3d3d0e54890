import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle } from '@fluentui/react-components';
import type { FleetKioskView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useRevokeKiosk } from '../../api/fleet';
import { FormAlert } from '../forms/FormAlert';
import { describeError } from '../forms/describe-error';

/** Asks before a kiosk loses its access; revoking cannot be undone, only replaced by a new pairing. */
export function RevokeKioskDialog({ kiosk, onClose }: { kiosk: FleetKioskView; onClose: () => void }) {
  const { t } = useTranslation();
  const revoke = useRevokeKiosk();
  return (
    <Dialog open modalType="alert" onOpenChange={(_event, data) => { if (!data.open) onClose(); }}>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>{t('fleetKiosk.revokeTitle')}</DialogTitle>
          <DialogContent>
            <p>{t('fleetKiosk.revokeBody', { station: kiosk.station.name })}</p>
            {revoke.isError ? <FormAlert intent="error">{describeError(t, revoke.error)}</FormAlert> : null}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose}>{t('common.cancel')}</Button>
            <Button appearance="primary" disabled={revoke.isPending} onClick={() => revoke.mutate(kiosk.id, { onSuccess: onClose })}>
              {revoke.isPending ? t('fleetKiosk.revoking') : t('fleetKiosk.revokeConfirm')}
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
