import { useTranslation } from 'react-i18next';
import type { Schema } from '../../api/client';
import { useUpdateUser } from '../../api/users';
import { ConfirmDialog } from '../../components/ConfirmDialog';
import { describeError } from '../../components/forms/describe-error';

type UserView = Schema<'UserView'>;

/** Asks before an account is deactivated or reactivated; the change is one PATCH of `active`. */
export function ActivationDialog({ person, onClose }: { person: UserView; onClose: () => void }) {
  const { t } = useTranslation();
  const update = useUpdateUser();
  const deactivating = person.active;
  const name = person.name;

  return (
    <ConfirmDialog
      title={deactivating ? t('activation.deactivateTitle', { name }) : t('activation.reactivateTitle', { name })}
      confirmLabel={deactivating ? t('activation.confirmDeactivate') : t('activation.confirmReactivate')}
      pending={update.isPending}
      problem={update.isError ? describeError(t, update.error) : null}
      onConfirm={() => update.mutate({ id: person.id, changes: { active: !deactivating } }, { onSuccess: onClose })}
      onCancel={onClose}
    >
      <p>{deactivating ? t('activation.deactivateBody', { name }) : t('activation.reactivateBody', { name })}</p>
    </ConfirmDialog>
  );
}
