import { useState } from 'react';
import {
  Button, Link, makeStyles, Spinner, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, tokens,
} from '@fluentui/react-components';
import { MailInboxRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { ApiError } from '../../api/client';
import { useCapturedMail, useCapturedMessage } from '../../api/dev-mail';
import { EmptyState } from '../../components/EmptyState';
import { describeError } from '../../components/forms/describe-error';
import { useDateFormat } from '../../components/formatting';
import { Pager } from '../../components/lists/Pager';
import { PageHeader } from '../../components/PageHeader';
import { NotFoundPage } from '../not-found';

const useStyles = makeStyles({
  layout: { display: 'grid', gridTemplateColumns: 'minmax(0, 3fr) minmax(0, 2fr)', gap: tokens.spacingHorizontalXL, alignItems: 'start', '@media (max-width: 1100px)': { gridTemplateColumns: '1fr' } },
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  selected: { backgroundColor: tokens.colorBrandBackground2 },
  // The subject reads as the row's text, lined up under its heading, not as an inset button.
  subjectButton: { textAlign: 'start', justifyContent: 'flex-start', minWidth: 0, paddingInline: 0 },
  toColumn: { width: '11.5rem' },
  dateColumn: { width: '9.5rem' },
  message: {
    padding: tokens.spacingHorizontalXL,
    backgroundColor: tokens.colorNeutralBackground1,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusLarge,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
  },
  headers: { display: 'grid', gridTemplateColumns: 'max-content 1fr', columnGap: tokens.spacingHorizontalL, rowGap: tokens.spacingVerticalXS, margin: 0 },
  label: { color: tokens.colorNeutralForeground3 },
  body: { whiteSpace: 'pre-wrap', overflowWrap: 'anywhere', fontFamily: tokens.fontFamilyBase, margin: 0, lineHeight: tokens.lineHeightBase400 },
});

const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

/** Plain-text mail with its links clickable, since the invitation and reset links are the point. */
function TextWithLinks({ text }: { text: string }) {
  return (
    <>
      {text.split(URL_PATTERN).map((part, index) =>
        index % 2 === 1 ? <Link key={index} href={part}>{part}</Link> : part,
      )}
    </>
  );
}

/** A message's date as staff read it; a message that came without a Date header says so. */
function useMailDate(): (date: string | null) => string {
  const { t } = useTranslation();
  const formatDate = useDateFormat();
  return (date) => (date === null ? t('devMail.undated') : formatDate(date));
}

function CapturedMessage({ id }: { id: string }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useMailDate();
  const message = useCapturedMessage(id);
  if (message.isPending) return <Spinner label={t('common.loading')} />;
  if (message.isError) return <Text role="alert">{describeError(t, message.error)}</Text>;
  const mail = message.data;
  return (
    <article className={styles.message} aria-labelledby="mail-subject">
      <Text as="h2" size={500} weight="semibold" id="mail-subject">{mail.subject}</Text>
      <dl className={styles.headers}>
        <dt className={styles.label}>{t('devMail.from')}</dt><dd>{mail.from}</dd>
        <dt className={styles.label}>{t('devMail.to')}</dt><dd>{mail.to}</dd>
        <dt className={styles.label}>{t('devMail.date')}</dt><dd>{formatDate(mail.date)}</dd>
      </dl>
      <pre className={styles.body}><TextWithLinks text={mail.text} /></pre>
    </article>
  );
}

/** Mail caught by the local SMTP stand-in; the route only exists while the server uses one. */
export function CapturedMailPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useMailDate();
  const [selected, setSelected] = useState<string | undefined>();
  const [page, setPage] = useState(1);
  const mail = useCapturedMail(page);

  if (mail.isError && mail.error instanceof ApiError && mail.error.status === 404) return <NotFoundPage />;

  return (
    <>
      <PageHeader title={t('devMail.title')} intro={t('devMail.intro')} actions={<Button onClick={() => void mail.refetch()}>{t('common.refresh')}</Button>} />
      {mail.isPending ? <Spinner label={t('common.loading')} /> : null}
      {mail.isError ? <EmptyState title={t('devMail.loadError')}>{describeError(t, mail.error)}</EmptyState> : null}
      {mail.isSuccess && mail.data.items.length === 0 ? <EmptyState icon={<MailInboxRegular />} title={t('devMail.title')}>{t('devMail.empty')}</EmptyState> : null}
      {mail.isSuccess && mail.data.items.length > 0 ? (
        <div className={styles.layout}>
          <div>
            <Table aria-label={t('devMail.title')} className={styles.table} size="small">
              <TableHeader>
                <TableRow>
                  <TableHeaderCell>{t('devMail.subject')}</TableHeaderCell>
                  <TableHeaderCell className={styles.toColumn}>{t('devMail.to')}</TableHeaderCell>
                  <TableHeaderCell className={styles.dateColumn}>{t('devMail.date')}</TableHeaderCell>
                </TableRow>
              </TableHeader>
              <TableBody>
                {mail.data.items.map((item) => (
                  <TableRow key={item.id} className={item.id === selected ? styles.selected : undefined} aria-selected={item.id === selected}>
                    <TableCell>
                      <Button appearance="transparent" className={styles.subjectButton} onClick={() => setSelected(item.id)}>{item.subject}</Button>
                    </TableCell>
                    <TableCell>{item.to}</TableCell>
                    <TableCell>{formatDate(item.date)}</TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
            <Pager page={mail.data} label={t('devMail.title')} onPage={setPage} />
          </div>
          {selected ? <CapturedMessage id={selected} /> : <EmptyState headingLevel={2} title={t('devMail.message')}>{t('devMail.choose')}</EmptyState>}
        </div>
      ) : null}
    </>
  );
}
