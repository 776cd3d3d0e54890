import { Suspense } from 'react';
import { makeStyles, Spinner, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { Outlet } from 'react-router-dom';
import { basalt, magma, sediment, seaFloor } from '../app/theme';
import { LanguageMenu } from './LanguageMenu';
import { Wordmark } from './Wordmark';

const useStyles = makeStyles({
  root: {
    minHeight: '100vh',
    display: 'flex',
    flexDirection: 'column',
    // Sediment layers settling on the sea floor: the studio's signature, in the theme's own colours.
    backgroundColor: sediment.canvas,
    backgroundImage: `linear-gradient(to bottom, transparent 72%, ${sediment.sunken} 72%, ${sediment.sunken} 80%, #e6dbc6 80%, #e6dbc6 87%, ${seaFloor[150]} 87%, ${seaFloor[150]} 93%, ${seaFloor[130]} 93%)`,
    backgroundAttachment: 'fixed',
  },
  top: {
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'space-between',
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalXL}`,
    color: basalt.text,
  },
  main: { flexGrow: 1, display: 'flex', alignItems: 'flex-start', justifyContent: 'center', padding: `6vh ${tokens.spacingHorizontalL}` },
  card: {
    width: 'min(100%, 28rem)',
    padding: `${tokens.spacingVerticalXXL} ${tokens.spacingHorizontalXXL}`,
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusXLarge,
    boxShadow: tokens.shadow16,
    borderTop: `4px solid ${magma.background}`,
  },
});

/** The frame of the signed-out pages: sign in, invitation, password reset. */
export function AuthLayout() {
  const { t } = useTranslation();
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <div className={styles.top}>
        <Wordmark product="Studio" />
        <LanguageMenu />
      </div>
      <main id="main" className={styles.main}>
        <div className={styles.card}>
          <Suspense fallback={<Spinner label={t('common.loading')} />}>
            <Outlet />
          </Suspense>
        </div>
      </main>
    </div>
  );
}
