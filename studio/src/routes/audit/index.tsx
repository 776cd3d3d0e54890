import { Button, Field, Input, makeStyles, Select, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, tokens } from '@fluentui/react-components';
import { ArrowDownloadRegular, HistoryRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import type { AuditEventView } from '@mantlepiece/shared';
import { useAuditLog, useDownloadAuditCsv } from '../../api/audit';
import { useUsers } from '../../api/users';
import { EmptyState } from '../../components/EmptyState';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { useDateFormat } from '../../components/formatting';
import { TextLink } from '../../components/links';
import { ListStates } from '../../components/lists/ListStates';
import { Pager } from '../../components/lists/Pager';
import { useListSearch } from '../../components/lists/use-list-search';
import { PageHeader } from '../../components/PageHeader';
import { saveFile } from '../../components/save-file';
import { auditFileName, readAuditFilter, readAuditParams } from './list-params';
import { CHOICES_BY_NAME } from '../../components/lists/list-search';

const useStyles = makeStyles({
  // Labels line up even though one field carries a hint underneath.
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-start', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  code: { fontFamily: tokens.fontFamilyMonospace, fontSize: tokens.fontSizeBase200 },
  details: { margin: 0, padding: 0, listStyle: 'none', display: 'flex', flexWrap: 'wrap', columnGap: tokens.spacingHorizontalM, fontSize: tokens.fontSizeBase200, color: tokens.colorNeutralForeground2 },
  detailKey: { color: tokens.colorNeutralForeground3 },
  at: { width: '11rem' },
  actor: { width: '11rem' },
  action: { width: '15rem' },
  target: { width: '9rem' },
  muted: { color: tokens.colorNeutralForeground3 },
});

/** Past this a value (a content hash, a long note) is cut, whole on hover and in the CSV. */
const DETAIL_LENGTH = 40;

function Details({ details }: { details: AuditEventView['details'] }) {
  const styles = useStyles();
  if (!details) return null;
  return (
    <ul className={styles.details}>
      {Object.entries(details).map(([key, value]) => {
        const text = typeof value === 'string' ? value : JSON.stringify(value);
        const cut = text.length > DETAIL_LENGTH;
        return (
          <li key={key} title={cut ? text : undefined}>
            <span className={styles.detailKey}>{key}</span> {cut ? `${text.slice(0, DETAIL_LENGTH - 1)}…` : text}
          </li>
        );
      })}
    </ul>
  );
}

/** What an entry acted on: people and kiosks by name, revisions as a link to their review page; anything else as its type and id. */
function AuditTarget({ target, personName }: { target: NonNullable<AuditEventView['target']>; personName: (id: string) => string | undefined }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const raw = <span className={styles.code}>{`${target.type} ${target.id}`}</span>;
  if (target.type === 'user') return <>{personName(target.id) ?? raw}</>;
  if (target.type === 'kiosk') return <>{t('stations.kiosks.name', { id: target.id })}</>;
  if (target.type === 'revision') return <TextLink to={`/reviews/${target.id}`}>{raw}</TextLink>;
  return raw;
}

function AuditTable({ entries, busy, personName }: { entries: AuditEventView[]; busy: boolean; personName: (id: string) => string | undefined }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  return (
    <Table aria-label={t('audit.title')} aria-busy={busy} className={styles.table} size="small">
      <TableHeader>
        <TableRow>
          <TableHeaderCell className={styles.at}>{t('audit.columns.at')}</TableHeaderCell>
          <TableHeaderCell className={styles.actor}>{t('audit.columns.actor')}</TableHeaderCell>
          <TableHeaderCell className={styles.action}>{t('audit.columns.action')}</TableHeaderCell>
          <TableHeaderCell className={styles.target}>{t('audit.columns.target')}</TableHeaderCell>
          <TableHeaderCell>{t('audit.columns.details')}</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {entries.map((entry) => (
          <TableRow key={entry.id}>
            <TableCell>{formatDate(entry.at)}</TableCell>
            <TableCell>{entry.actor?.name ?? <span className={styles.muted}>{t('audit.system')}</span>}</TableCell>
            <TableCell><span className={styles.code}>{entry.action}</span></TableCell>
            <TableCell>{entry.target ? <AuditTarget target={entry.target} personName={personName} /> : null}</TableCell>
            <TableCell><Details details={entry.details} /></TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}

export function AuditPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const { search, query: action, setQuery: setAction, change, clear } = useListSearch('action');
  const filter = readAuditFilter(search);
  const log = useAuditLog(readAuditParams(search));
  const people = useUsers(CHOICES_BY_NAME);
  const download = useDownloadAuditCsv();
  const personName = (id: string) => people.data?.items.find((person) => String(person.id) === id)?.name;

  const filtered = Boolean(filter.actorId || filter.action || filter.from || filter.to);
  const today = new Date().toISOString().slice(0, 10);
  const downloadButton = (
    <Button
      icon={<ArrowDownloadRegular />}
      disabled={download.isPending}
      onClick={() => download.mutate(filter, { onSuccess: (blob) => saveFile(blob, auditFileName(filter, today)) })}
    >
      {download.isPending ? t('audit.downloading') : t('audit.download')}
    </Button>
  );

  return (
    <>
      <PageHeader title={t('audit.title')} intro={t('audit.intro')} actions={downloadButton} />
      {download.isError ? <FormAlert intent="error">{describeError(t, download.error)}</FormAlert> : null}
      <div className={styles.toolbar} role="search">
        <Field label={t('audit.columns.actor')}>
          <Select value={filter.actorId ? String(filter.actorId) : ''} onChange={(_event, data) => change({ actorId: data.value || undefined })}>
            <option value="">{t('audit.anyone')}</option>
            {people.data?.items.map((person) => <option key={person.id} value={String(person.id)}>{person.name}</option>)}
          </Select>
        </Field>
        <Field label={t('audit.columns.action')} hint={t('audit.actionHint')}>
          <Input value={action} onChange={(_event, data) => setAction(data.value)} />
        </Field>
        <Field label={t('audit.from')}>
          <Input type="date" value={filter.from ?? ''} max={filter.to} onChange={(_event, data) => change({ from: data.value || undefined })} />
        </Field>
        <Field label={t('audit.to')}>
          <Input type="date" value={filter.to ?? ''} min={filter.from} onChange={(_event, data) => change({ to: data.value || undefined })} />
        </Field>
      </div>
      <ListStates
        query={log}
        loadError={t('audit.loadError')}
        empty={(
          <EmptyState
            icon={<HistoryRegular />}
            title={filtered ? t('audit.noMatchTitle') : t('audit.emptyTitle')}
            actions={filtered ? <Button onClick={clear}>{t('lists.clearFilters')}</Button> : null}
          >
            {filtered ? t('audit.noMatchBody') : t('audit.emptyBody')}
          </EmptyState>
        )}
      >
        {(page) => (
          <>
            <AuditTable entries={page.items} busy={log.isFetching} personName={personName} />
            <Pager page={page} label={t('audit.pagination')} onPage={(next) => change({ page: String(next) })} />
          </>
        )}
      </ListStates>
    </>
  );
}
