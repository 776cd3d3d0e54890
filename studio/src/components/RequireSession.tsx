import type { ReactNode } from 'react';
import { makeStyles, Spinner } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { Navigate, useLocation } from 'react-router-dom';
import { useSession } from '../api/session';

const useStyles = makeStyles({ wait: { minHeight: '100vh', display: 'grid', placeItems: 'center' } });

export function SessionPending() {
  const { t } = useTranslation();
  const styles = useStyles();
  return (
    <div className={styles.wait}>
      <Spinner label={t('common.restoringSession')} />
    </div>
  );
}

/** Waits for the session restore on page load; without a session, sends the person to sign in. */
export function RequireSession({ children }: { children: ReactNode }) {
  const session = useSession();
  const location = useLocation();
  if (session.isPending) return <SessionPending />;
  if (!session.data) return <Navigate to="/sign-in" replace state={{ from: `${location.pathname}${location.search}` }} />;
  return children;
}
