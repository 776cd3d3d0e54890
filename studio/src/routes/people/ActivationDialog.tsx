import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle } from '@fluentui/react-components';
import type { UserView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useUpdateUser } from '../../api/users';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';

/** Asks before an account is deactivated or reactivated; the change is one PATCH of `active`. */
export function ActivationDialog({ person, onClose }: { person: UserView; onClose: () => void }) {
  const { t } = useTranslation();
  const update = useUpdateUser();
  const deactivating = person.active;
  const name = person.name;

  return (
    <Dialog open modalType="alert" onOpenChange={(_event, data) => { if (!data.open) onClose(); }}>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>{deactivating ? t('activation.deactivateTitle', { name }) : t('activation.reactivateTitle', { name })}</DialogTitle>
          <DialogContent>
            <p>{deactivating ? t('activation.deactivateBody', { name }) : t('activation.reactivateBody', { name })}</p>
            {update.isError ? <FormAlert intent="error">{describeError(t, update.error)}</FormAlert> : null}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose}>{t('common.cancel')}</Button>
            <Button
              appearance="primary"
              disabled={update.isPending}
              onClick={() => update.mutate({ id: person.id, changes: { active: !deactivating } }, { onSuccess: onClose })}
            >
              {deactivating ? t('activation.confirmDeactivate') : t('activation.confirmReactivate')}
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
