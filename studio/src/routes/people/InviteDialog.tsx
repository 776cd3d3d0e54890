import { useTranslation } from 'react-i18next';
import { useInviteUser, type SentInvitation } from '../../api/users';
import { localesToSend } from './PersonFields';
import { PersonDialog } from './PersonDialog';

export function InviteDialog({ onClose, onInvited }: { onClose: () => void; onInvited: (invitation: SentInvitation) => void }) {
  const { t } = useTranslation();
  const invite = useInviteUser();
  return (
    <PersonDialog
      title={t('invite.title')}
      intro={t('invite.intro')}
      submitLabel={t('invite.submit')}
      pendingLabel={t('invite.submitting')}
      initial={{ email: '', name: '', roles: [], locales: '' }}
      emailEditable
      pending={invite.isPending}
      error={invite.error}
      onClose={onClose}
      onSubmit={(values) =>
        invite.mutate(
          { email: values.email.trim(), name: values.name.trim(), roles: values.roles, locales: localesToSend(values) },
          { onSuccess: onInvited },
        )
      }
    />
  );
}
