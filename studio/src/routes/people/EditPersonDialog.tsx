import { useTranslation } from 'react-i18next';
import type { Schema } from '../../api/client';
import { useSaveGrant } from '../../api/users';
import { grantOf, useManagedVenues } from './managed-venues';
import { localesToSend } from './PersonFields';
import { PersonDialog } from './PersonDialog';

type UserView = Schema<'UserView'>;

export function EditPersonDialog({ person, onClose }: { person: UserView; onClose: () => void }) {
  const { t } = useTranslation();
  const update = useSaveGrant();
  const managed = useManagedVenues();
  // Starts at the account's own roles when it has some and the reader may change them, else at a venue of the reader's where the person works.
  const firstShared = person.memberships.find((grant) => managed.venues.some((venue) => venue.id === grant.venueId))?.venueId;
  const venueId = managed.everyVenue && (person.roles.length > 0 || firstShared === undefined) ? null : (firstShared ?? managed.initialVenueId);
  const grant = grantOf(person, venueId);
  return (
    <PersonDialog
      title={t('editPerson.title', { name: person.name })}
      submitLabel={t('editPerson.submit')}
      pendingLabel={t('common.saving')}
      initial={{ email: person.email, name: person.name, venueId, roles: grant.roles, locales: grant.locales.join(', ') }}
      emailEditable={false}
      choices={{ ...managed, grantAt: (chosen) => grantOf(person, chosen) }}
      roleRequired={false}
      pending={update.isPending}
      error={update.error}
      onClose={onClose}
      onSubmit={(values) =>
        update.mutate(
          { person, name: values.name.trim(), venueId: values.venueId, roles: values.roles, locales: localesToSend(values) },
          { onSuccess: onClose },
        )}
    />
  );
}
