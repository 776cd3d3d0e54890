import { useTranslation } from 'react-i18next';
import { useInviteUser, type SentInvitation } from '../../api/users';
import { useManagedVenues } from './managed-venues';
import { localesToSend } from './PersonFields';
import { PersonDialog } from './PersonDialog';

export function InviteDialog({ onClose, onInvited }: { onClose: () => void; onInvited: (invitation: SentInvitation) => void }) {
  const { t } = useTranslation();
  const invite = useInviteUser();
  const managed = useManagedVenues();
  return (
    <PersonDialog
      title={t('invite.title')}
      intro={t('invite.intro')}
      submitLabel={t('invite.submit')}
      pendingLabel={t('invite.submitting')}
      initial={{ email: '', name: '', venueId: managed.initialVenueId, roles: [], locales: '' }}
      emailEditable
      choices={managed}
      pending={invite.isPending}
      error={invite.error}
      onClose={onClose}
      onSubmit={(values) =>
        invite.mutate(
          { email: values.email.trim(), name: values.name.trim(), venueId: values.venueId, roles: values.roles, locales: localesToSend(values) },
          { onSuccess: onInvited },
        )}
    />
  );
}
