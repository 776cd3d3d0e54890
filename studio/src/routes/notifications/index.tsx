import { Button, makeStyles, Switch, Text, tokens } from '@fluentui/react-components';
import { AlertRegular, CheckmarkRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import { PAGE_SIZE, type NotificationView } from '@mantlepiece/shared';
import { useMarkNotificationsRead, useNotifications } from '../../api/notifications';
import { EmptyState } from '../../components/EmptyState';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { useDateFormat } from '../../components/formatting';
import { TextLink } from '../../components/links';
import { ListStates } from '../../components/lists/ListStates';
import { pageFrom, withSearchChanges } from '../../components/lists/list-search';
import { Pager } from '../../components/lists/Pager';
import { PageHeader } from '../../components/PageHeader';
import { useReviewStyles } from '../../components/review/review-styles';
import { NotificationPreferencesForm } from './NotificationPreferencesForm';

const useStyles = makeStyles({
  layout: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr) 20rem', gap: tokens.spacingHorizontalXL, alignItems: 'start', '@media (max-width: 1000px)': { gridTemplateColumns: 'minmax(0, 1fr)' } },
  toolbar: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalL, marginBottom: tokens.spacingVerticalM, flexWrap: 'wrap' },
  markAll: { marginLeft: 'auto' },
  list: { listStyle: 'none', margin: 0, padding: 0, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge, backgroundColor: tokens.colorNeutralBackground1 },
  item: {
    display: 'grid',
    gridTemplateColumns: '12px minmax(0, 1fr) auto',
    gap: tokens.spacingHorizontalM,
    alignItems: 'start',
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalL}`,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
    ':last-child': { borderBottom: 0 },
  },
  dot: { width: '10px', height: '10px', borderRadius: '50%', marginTop: '6px', backgroundColor: tokens.colorBrandBackground },
  read: { visibility: 'hidden' },
  text: { display: 'flex', flexDirection: 'column', gap: '2px' },
  body: { margin: 0, color: tokens.colorNeutralForeground2 },
});

function NotificationItem({ notification, onRead, marking }: { notification: NotificationView; onRead: () => void; marking: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const formatDate = useDateFormat();
  const unread = notification.readAt === null;
  return (
    <li className={styles.item} data-notification-id={notification.id} data-unread={unread || undefined}>
      <span className={unread ? styles.dot : `${styles.dot} ${styles.read}`} aria-hidden="true" />
      <div className={styles.text}>
        <Text weight={unread ? 'semibold' : 'regular'}>
          {unread ? <span className={shared.visuallyHidden}>{t('notifications.unreadMark')}</span> : null}
          {/* Following a notification is reading it. */}
          <span onClickCapture={unread ? onRead : undefined}>
            <TextLink to={notification.link}>{notification.title}</TextLink>
          </span>
        </Text>
        {notification.body ? <p className={styles.body}>{notification.body}</p> : null}
        <Text size={200} className={shared.muted}>{t(`notifications.kinds.${notification.kind}`)} · {formatDate(notification.createdAt)}</Text>
      </div>
      {unread ? <Button size="small" icon={<CheckmarkRegular />} disabled={marking} onClick={onRead}>{t('notifications.markRead')}</Button> : null}
    </li>
  );
}

export function NotificationsPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const [search, setSearch] = useSearchParams();
  const unreadOnly = search.get('unread') === 'true';
  const notifications = useNotifications({ page: pageFrom(search), pageSize: PAGE_SIZE.fallback, unread: unreadOnly });
  const mark = useMarkNotificationsRead();
  const change = (changes: Record<string, string | undefined>) => setSearch((current) => withSearchChanges(current, changes), { replace: true });
  const unread = notifications.data?.unread ?? 0;

  return (
    <>
      <PageHeader title={t('notifications.title')} intro={t('notifications.intro')} />
      <div className={styles.layout}>
        <div>
          <div className={styles.toolbar}>
            <Switch label={t('notifications.unreadOnly')} checked={unreadOnly} onChange={(_event, data) => change({ unread: data.checked ? 'true' : undefined })} />
            <Text aria-live="polite">{t('notifications.unreadCount', { count: unread })}</Text>
            <Button className={styles.markAll} icon={<CheckmarkRegular />} disabled={unread === 0 || mark.isPending} onClick={() => mark.mutate({ all: true })}>{t('notifications.markAllRead')}</Button>
          </div>
          {mark.isError ? <FormAlert intent="error">{describeError(t, mark.error)}</FormAlert> : null}
          <ListStates
            query={notifications}
            loadError={t('notifications.loadError')}
            empty={<EmptyState icon={<AlertRegular />} title={unreadOnly ? t('notifications.noneUnread') : t('notifications.none')}>{t('notifications.noneBody')}</EmptyState>}
          >
            {(page) => (
              <>
                <ul className={styles.list} aria-label={t('notifications.title')}>
                  {page.items.map((notification) => (
                    <NotificationItem key={notification.id} notification={notification} marking={mark.isPending} onRead={() => mark.mutate({ ids: [notification.id] })} />
                  ))}
                </ul>
                <Pager page={page} label={t('notifications.pagination')} onPage={(next) => change({ page: String(next) })} />
              </>
            )}
          </ListStates>
        </div>
        <section className={shared.card} aria-labelledby="mail-preferences-heading">
          <Text as="h2" id="mail-preferences-heading" size={400} weight="semibold" className={shared.heading}>{t('notifications.preferences')}</Text>
          <NotificationPreferencesForm />
        </section>
      </div>
    </>
  );
}
