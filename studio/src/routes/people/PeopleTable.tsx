import {
  Badge, Button, makeStyles, Table, TableBody, TableCell, TableCellLayout, TableHeader, TableHeaderCell, TableRow, Text, tokens,
} from '@fluentui/react-components';
import type { UserSort } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useDateFormat } from '../../components/formatting';
import { useLanguageName } from '../../components/translation/language-name';
import type { Schema } from '../../api/client';

type UserView = Schema<'UserView'>;

type SortColumn = 'name' | 'email' | 'lastSignInAt';

/** Every locale the person translates into, at any venue shown. */
const localesOf = (person: UserView) => [...new Set([...person.locales, ...person.memberships.flatMap((grant) => grant.locales)])];

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  name: { fontWeight: tokens.fontWeightSemibold },
  muted: { color: tokens.colorNeutralForeground3 },
  badges: { display: 'flex', gap: tokens.spacingHorizontalXS, flexWrap: 'wrap', alignItems: 'center' },
  grants: { display: 'grid', gap: tokens.spacingVerticalXS },
  venue: { color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase200 },
  actions: { display: 'flex', gap: tokens.spacingHorizontalXS },
  inactiveRow: { color: tokens.colorNeutralForeground3 },
  // Room for a whole address and for both action buttons; the status badge needs little.
  emailColumn: { width: '18%' },
  statusColumn: { width: '7rem' },
  actionsColumn: { width: '11rem' },
});

export function PeopleTable({ people, sort, onSort, currentUserId, onEdit, onToggleActive, busy, venueName }: {
  people: UserView[];
  /** Names the venue of each membership shown. */
  venueName: (venueId: number) => string;
  sort: UserSort;
  onSort: (sort: UserSort) => void;
  currentUserId: number;
  onEdit: (person: UserView) => void;
  onToggleActive: (person: UserView) => void;
  busy: boolean;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const languageName = useLanguageName({ standalone: true });
  const sortColumn = sort.replace(/^-/, '');
  const descending = sort.startsWith('-');

  const sortable = (column: SortColumn) => ({
    sortDirection: sortColumn === column ? (descending ? 'descending' : 'ascending') : undefined,
    onClick: () => onSort((sortColumn === column && !descending ? `-${column}` : column) as UserSort),
  } as const);

  return (
    <Table sortable aria-label={t('people.title')} aria-busy={busy} className={styles.table}>
      <TableHeader>
        <TableRow>
          <TableHeaderCell {...sortable('name')}>{t('people.columns.name')}</TableHeaderCell>
          <TableHeaderCell className={styles.emailColumn} {...sortable('email')}>{t('people.columns.email')}</TableHeaderCell>
          <TableHeaderCell>{t('people.columns.roles')}</TableHeaderCell>
          <TableHeaderCell>{t('people.columns.locales')}</TableHeaderCell>
          <TableHeaderCell className={styles.statusColumn}>{t('people.columns.status')}</TableHeaderCell>
          <TableHeaderCell {...sortable('lastSignInAt')}>{t('people.columns.lastSignIn')}</TableHeaderCell>
          <TableHeaderCell className={styles.actionsColumn}><span className={styles.muted}>{t('people.columns.actions')}</span></TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {people.map((person) => (
          <TableRow key={person.id} className={person.active ? undefined : styles.inactiveRow}>
            <TableCell>
              <TableCellLayout>
                <span className={styles.name}>{person.name}</span>
                {person.id === currentUserId ? <Text className={styles.muted}> ({t('people.you')})</Text> : null}
              </TableCellLayout>
            </TableCell>
            <TableCell>{person.email}</TableCell>
            <TableCell>
              <span className={styles.grants}>
                {person.roles.length ? (
                  <span className={styles.badges}>
                    {person.memberships.length ? <span className={styles.venue}>{t('memberships.everyVenue')}</span> : null}
                    {person.roles.map((role) => <Badge key={role} appearance="tint" color="brand">{t(`roles.${role}`)}</Badge>)}
                  </span>
                ) : null}
                {person.memberships.map((grant) => (
                  <span key={grant.venueId} className={styles.badges} data-membership={grant.venueId}>
                    <span className={styles.venue}>{venueName(grant.venueId)}</span>
                    {grant.roles.map((role) => <Badge key={role} appearance="tint" color="brand">{t(`roles.${role}`)}</Badge>)}
                  </span>
                ))}
              </span>
            </TableCell>
            <TableCell>{localesOf(person).length ? localesOf(person).map(languageName).join(', ') : <span className={styles.muted}>—</span>}</TableCell>
            <TableCell>
              <Badge appearance={person.active ? 'tint' : 'outline'} color={person.active ? 'success' : 'subtle'}>
                {person.active ? t('people.active') : t('people.inactive')}
              </Badge>
            </TableCell>
            <TableCell>{person.lastSignInAt ? formatDate(person.lastSignInAt) : <span className={styles.muted}>{t('people.never')}</span>}</TableCell>
            <TableCell>
              <span className={styles.actions}>
                <Button size="small" onClick={() => onEdit(person)} aria-label={t('people.editLabel', { name: person.name })}>{t('people.edit')}</Button>
                {person.id === currentUserId ? null : (
                  <Button size="small" appearance="subtle" onClick={() => onToggleActive(person)}>
                    {person.active ? t('people.deactivate') : t('people.reactivate')}
                  </Button>
                )}
              </span>
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
