import { Suspense, useEffect, useRef } from 'react';
import { makeStyles, Spinner, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { Link, Outlet, useLocation } from 'react-router-dom';
import { CurrentVenueProvider } from '../app/current-venue';
import { header, sediment } from '../app/theme';
import { AccountMenu } from './AccountMenu';
import { AreaNav } from './AreaNav';
import { GlobalSearch } from './GlobalSearch';
import { LanguageMenu } from './LanguageMenu';
import { KeyboardShortcuts } from './KeyboardShortcuts';
import { NotificationBell } from './review/NotificationBell';
import { UndoToaster } from './UndoToaster';
import { VenueSwitcher } from './VenueSwitcher';
import { Wordmark } from './Wordmark';

const useStyles = makeStyles({
  root: {
    minHeight: '100vh',
    display: 'grid',
    gridTemplateColumns: '15rem minmax(0, 1fr)',
    gridTemplateRows: '56px 1fr',
    gridTemplateAreas: '"header header" "nav main"',
    backgroundColor: sediment.canvas,
    '@media (max-width: 720px)': { gridTemplateColumns: '1fr', gridTemplateRows: 'auto auto 1fr', gridTemplateAreas: '"header" "nav" "main"' },
  },
  skip: {
    position: 'absolute',
    left: tokens.spacingHorizontalM,
    top: '-100px',
    zIndex: 10,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalL}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground1,
    color: tokens.colorBrandForeground1,
    fontWeight: tokens.fontWeightSemibold,
    boxShadow: tokens.shadow16,
    ':focus': { top: tokens.spacingVerticalS, outline: `2px solid ${tokens.colorStrokeFocus2}` },
  },
  header: {
    gridArea: 'header',
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    padding: `0 ${tokens.spacingHorizontalL}`,
    backgroundColor: header.background,
    color: header.foreground,
    borderBottom: `3px solid ${header.highlight}`,
  },
  home: {
    color: 'inherit',
    textDecoration: 'none',
    borderRadius: tokens.borderRadiusMedium,
    ':focus-visible': { outline: `2px solid ${header.highlight}`, outlineOffset: '3px' },
  },
  spacer: { flexGrow: 1 },
  headerButton: {
    color: header.foreground,
    ':hover': { color: header.foreground, backgroundColor: 'rgba(255, 255, 255, 0.12)' },
    ':hover:active': { color: header.foreground, backgroundColor: 'rgba(255, 255, 255, 0.2)' },
    ':focus-visible': { outline: `2px solid ${header.highlight}` },
  },
  nav: {
    gridArea: 'nav',
    borderRight: `1px solid ${tokens.colorNeutralStroke2}`,
    backgroundColor: sediment.raised,
  },
  main: {
    gridArea: 'main',
    padding: `${tokens.spacingVerticalXXL} clamp(${tokens.spacingHorizontalL}, 3vw, 48px)`,
    outline: 'none',
    minWidth: 0,
  },
});

/** The signed-in frame: skip link, header band, role-aware navigation, and the page. */
export function AppShell() {
  const { t } = useTranslation();
  const styles = useStyles();
  const main = useRef<HTMLElement>(null);
  const { pathname } = useLocation();
  const firstPath = useRef(pathname);

  // After an in-app navigation, keyboard and screen-reader users start at the new page's content.
  useEffect(() => {
    if (pathname !== firstPath.current) main.current?.focus();
  }, [pathname]);

  return (
    <CurrentVenueProvider>
      <div className={styles.root}>
        <a href="#main" className={styles.skip}>{t('common.skipToContent')}</a>
        <header className={styles.header}>
          <Link to="/" className={styles.home}>
            <Wordmark product="Studio" />
          </Link>
          <span className={styles.spacer} />
          <GlobalSearch />
          <VenueSwitcher className={styles.headerButton} />
          <KeyboardShortcuts className={styles.headerButton} />
          <NotificationBell className={styles.headerButton} />
          <LanguageMenu className={styles.headerButton} />
          <AccountMenu className={styles.headerButton} />
        </header>
        <div className={styles.nav}>
          <AreaNav />
        </div>
        <main id="main" ref={main} tabIndex={-1} className={styles.main}>
          <Suspense fallback={<Spinner label={t('common.loading')} />}>
            <Outlet />
          </Suspense>
        </main>
      </div>
      <UndoToaster />
    </CurrentVenueProvider>
  );
}
