import { useState } from 'react';
import { Button, Field, makeStyles, SearchBox, Select, tokens } from '@fluentui/react-components';
import { PersonAddRegular, PeopleSearchRegular } from '@fluentui/react-icons';
import { ROLES, USER_SORT } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import type { Schema } from '../../api/client';
import { useCurrentUser } from '../../api/session';
import { useUsers, type SentInvitation } from '../../api/users';
import { EmptyState } from '../../components/EmptyState';
import { FormAlert } from '../../components/forms/FormAlert';
import { useDateFormat } from '../../components/formatting';
import { ListStates } from '../../components/lists/ListStates';
import { Pager } from '../../components/lists/Pager';
import { useListSearch } from '../../components/lists/use-list-search';
import { PageHeader } from '../../components/PageHeader';
import { ActivationDialog } from './ActivationDialog';
import { EditPersonDialog } from './EditPersonDialog';
import { InviteDialog } from './InviteDialog';
import { readListParams } from './list-params';
import { useManagedVenues } from './managed-venues';
import { PeopleTable } from './PeopleTable';

type UserView = Schema<'UserView'>;

const useStyles = makeStyles({
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  search: { minWidth: '18rem' },
  stack: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

type Dialog = { kind: 'invite' } | { kind: 'edit'; person: UserView } | { kind: 'activation'; person: UserView } | null;

export function PeoplePage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const me = useCurrentUser();
  const { venueName } = useManagedVenues();
  const { search, query, setQuery, change, clear } = useListSearch();
  const params = readListParams(search);
  const users = useUsers(params);
  const [dialog, setDialog] = useState<Dialog>(search.get('invite') ? { kind: 'invite' } : null);
  const [sent, setSent] = useState<SentInvitation | null>(null);

  const openInvite = () => {
    setSent(null);
    setDialog({ kind: 'invite' });
  };
  const closeDialog = () => {
    setDialog(null);
    if (search.has('invite')) change({ invite: undefined });
  };
  const filtered = Boolean(params.q || params.role || params.active !== undefined);

  return (
    <>
      <PageHeader
        title={t('people.title')}
        intro={t('people.intro')}
        actions={<Button appearance="primary" icon={<PersonAddRegular />} onClick={openInvite}>{t('people.invite')}</Button>}
      />
      <div className={styles.stack}>
        {sent ? <FormAlert intent="success">{t('invite.sent', { email: sent.email, date: formatDate(sent.expiresAt) })}</FormAlert> : null}
        <div className={styles.toolbar} role="search">
          <Field label={t('people.search')} className={styles.search}>
            <SearchBox value={query} onChange={(_event, data) => setQuery(data.value)} />
          </Field>
          <Field label={t('people.role')}>
            <Select value={params.role ?? ''} onChange={(_event, data) => change({ role: data.value || undefined })}>
              <option value="">{t('people.anyRole')}</option>
              {ROLES.map((role) => <option key={role} value={role}>{t(`roles.${role}`)}</option>)}
            </Select>
          </Field>
          <Field label={t('people.status')}>
            <Select value={params.active === undefined ? '' : String(params.active)} onChange={(_event, data) => change({ active: data.value || undefined })}>
              <option value="">{t('people.anyStatus')}</option>
              <option value="true">{t('people.active')}</option>
              <option value="false">{t('people.inactive')}</option>
            </Select>
          </Field>
        </div>
      </div>

      <ListStates
        query={users}
        loadError={t('people.loadError')}
        empty={(
          <EmptyState
            icon={<PeopleSearchRegular />}
            title={t('people.noMatchTitle')}
            actions={filtered ? <Button onClick={clear}>{t('people.clearFilters')}</Button> : null}
          >
            {t('people.noMatchBody')}
          </EmptyState>
        )}
      >
        {(page) => (
          <>
            <PeopleTable
              people={page.items}
              sort={params.sort ?? USER_SORT.fallback}
              onSort={(sort) => change({ sort })}
              currentUserId={me.id}
              venueName={venueName}
              busy={users.isFetching}
              onEdit={(person) => setDialog({ kind: 'edit', person })}
              onToggleActive={(person) => setDialog({ kind: 'activation', person })}
            />
            <Pager page={page} label={t('people.pagination')} onPage={(next) => change({ page: String(next) })} />
          </>
        )}
      </ListStates>

      {dialog?.kind === 'invite' ? <InviteDialog onClose={closeDialog} onInvited={(invitation) => { setSent(invitation); closeDialog(); }} /> : null}
      {dialog?.kind === 'edit' ? <EditPersonDialog person={dialog.person} onClose={closeDialog} /> : null}
      {dialog?.kind === 'activation' ? <ActivationDialog person={dialog.person} onClose={closeDialog} /> : null}
    </>
  );
}
