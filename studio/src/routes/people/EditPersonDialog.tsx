import type { UserView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useUpdateUser } from '../../api/users';
import { localesToSend } from './PersonFields';
import { PersonDialog } from './PersonDialog';

export function EditPersonDialog({ person, onClose }: { person: UserView; onClose: () => void }) {
  const { t } = useTranslation();
  const update = useUpdateUser();
  return (
    <PersonDialog
      title={t('editPerson.title', { name: person.name })}
      submitLabel={t('editPerson.submit')}
      pendingLabel={t('common.saving')}
      initial={{ email: person.email, name: person.name, roles: person.roles, locales: person.locales.join(', ') }}
      emailEditable={false}
      pending={update.isPending}
      error={update.error}
      onClose={onClose}
      onSubmit={(values) =>
        update.mutate(
          { id: person.id, changes: { name: values.name.trim(), roles: values.roles, locales: localesToSend(values) } },
          { onSuccess: onClose },
        )
      }
    />
  );
}
