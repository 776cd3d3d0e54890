import { useEffect, useRef, useState } from 'react';
import { Button, Field, makeStyles, SearchBox, Select, Spinner, Text, tokens } from '@fluentui/react-components';
import { ArrowLeftRegular, ArrowRightRegular, PersonAddRegular, PeopleSearchRegular } from '@fluentui/react-icons';
import { ROLES, type UserView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import { useCurrentUser } from '../../api/session';
import { useUsers, type SentInvitation } from '../../api/users';
import { EmptyState } from '../../components/EmptyState';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { useDateFormat } from '../../components/formatting';
import { PageHeader } from '../../components/PageHeader';
import { ActivationDialog } from './ActivationDialog';
import { EditPersonDialog } from './EditPersonDialog';
import { InviteDialog } from './InviteDialog';
import { readListParams, withListChanges, type ListChanges } from './list-params';
import { PeopleTable } from './PeopleTable';
import { useDebounced } from './use-debounced';

const useStyles = makeStyles({
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  search: { minWidth: '18rem' },
  stack: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  pager: { display: 'flex', alignItems: 'center', justifyContent: 'flex-end', gap: tokens.spacingHorizontalM, marginTop: tokens.spacingVerticalM },
});

type Dialog = { kind: 'invite' } | { kind: 'edit'; person: UserView } | { kind: 'activation'; person: UserView } | null;

export function PeoplePage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const me = useCurrentUser();
  const [search, setSearch] = useSearchParams();
  const params = readListParams(search);
  const users = useUsers(params);
  const [dialog, setDialog] = useState<Dialog>(search.get('invite') ? { kind: 'invite' } : null);
  const [sent, setSent] = useState<SentInvitation | null>(null);
  const [query, setQuery] = useState(params.q ?? '');
  const settledQuery = useDebounced(query.trim(), 300);

  const change = (changes: ListChanges) => setSearch((current) => withListChanges(current, changes), { replace: true });
  const urlQuery = useRef(params.q ?? '');
  urlQuery.current = params.q ?? '';

  // Only a settled search term reaches the URL (and the server), not every keystroke.
  useEffect(() => {
    if (settledQuery !== urlQuery.current) setSearch((current) => withListChanges(current, { q: settledQuery }), { replace: true });
  }, [settledQuery, setSearch]);

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

      {users.isPending ? <Spinner label={t('common.loading')} /> : null}
      {users.isError ? (
        <EmptyState title={t('people.loadError')} actions={<Button onClick={() => void users.refetch()}>{t('common.retry')}</Button>}>
          {describeError(t, users.error)}
        </EmptyState>
      ) : null}
      {users.isSuccess && users.data.items.length === 0 ? (
        <EmptyState
          icon={<PeopleSearchRegular />}
          title={t('people.noMatchTitle')}
          actions={filtered ? <Button onClick={() => { setQuery(''); setSearch(new URLSearchParams(), { replace: true }); }}>{t('people.clearFilters')}</Button> : null}
        >
          {t('people.noMatchBody')}
        </EmptyState>
      ) : null}
      {users.isSuccess && users.data.items.length > 0 ? (
        <>
          <PeopleTable
            people={users.data.items}
            sort={params.sort ?? 'name'}
            onSort={(sort) => change({ sort })}
            currentUserId={me.id}
            busy={users.isFetching}
            onEdit={(person) => setDialog({ kind: 'edit', person })}
            onToggleActive={(person) => setDialog({ kind: 'activation', person })}
          />
          <nav className={styles.pager} aria-label={t('people.pagination')}>
            <Text aria-live="polite">
              {t('people.range', {
                from: (users.data.page - 1) * users.data.pageSize + 1,
                to: (users.data.page - 1) * users.data.pageSize + users.data.items.length,
                total: users.data.total,
              })}
            </Text>
            <Button icon={<ArrowLeftRegular />} disabled={users.data.page <= 1} onClick={() => change({ page: String(users.data.page - 1) })}>
              {t('people.previousPage')}
            </Button>
            <Button
              icon={<ArrowRightRegular />}
              iconPosition="after"
              disabled={users.data.page * users.data.pageSize >= users.data.total}
              onClick={() => change({ page: String(users.data.page + 1) })}
            >
              {t('people.nextPage')}
            </Button>
          </nav>
        </>
      ) : null}

      {dialog?.kind === 'invite' ? <InviteDialog onClose={closeDialog} onInvited={(invitation) => { setSent(invitation); closeDialog(); }} /> : null}
      {dialog?.kind === 'edit' ? <EditPersonDialog person={dialog.person} onClose={closeDialog} /> : null}
      {dialog?.kind === 'activation' ? <ActivationDialog person={dialog.person} onClose={closeDialog} /> : null}
    </>
  );
}
