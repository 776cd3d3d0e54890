import { CounterBadge, makeStyles } from '@fluentui/react-components';
import { AlertRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { useUnreadCount } from '../../api/notifications';
import { LinkButton } from '../links';

const useStyles = makeStyles({
  wrap: { position: 'relative', display: 'inline-flex' },
  count: { position: 'absolute', top: '2px', right: '2px', pointerEvents: 'none' },
});

/** The header's way to the notifications, with how many are unread; the count is polled. */
export function NotificationBell({ className }: { className?: string }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const unread = useUnreadCount();
  const count = unread.data ?? 0;
  return (
    <span className={styles.wrap}>
      <LinkButton
        to="/notifications"
        appearance="subtle"
        icon={<AlertRegular />}
        className={className}
        aria-label={t('notifications.bell', { count })}
        data-unread={count}
      />
      {count > 0 ? <CounterBadge className={styles.count} count={count} overflowCount={99} size="small" color="danger" aria-hidden="true" /> : null}
    </span>
  );
}
