import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { BeakerRegular, HistoryRegular, HomeRegular, MailRegular, TvRegular } from '@fluentui/react-icons';
import type { FluentIcon } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { NavLink } from 'react-router-dom';
import { useCapturedMail } from '../api/dev-mail';
import { usePersonHere } from '../app/current-venue';
import { areasFor, canOpen } from '../app/areas';
import { workbenchStrings } from '../routes/widgets/workbench-strings';
import { magma } from '../app/theme';
import { AREA_ICONS } from './area-icons';

const useStyles = makeStyles({
  nav: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS, padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalS}` },
  list: { listStyle: 'none', margin: 0, padding: 0, display: 'flex', flexDirection: 'column', gap: '2px' },
  section: {
    margin: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalM} ${tokens.spacingVerticalXS}`,
    fontSize: tokens.fontSizeBase200,
    fontWeight: tokens.fontWeightSemibold,
    color: tokens.colorNeutralForeground3,
    textTransform: 'uppercase',
    letterSpacing: '0.06em',
  },
  link: {
    position: 'relative',
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    minHeight: '40px',
    padding: `0 ${tokens.spacingHorizontalM}`,
    borderRadius: tokens.borderRadiusMedium,
    color: tokens.colorNeutralForeground2,
    textDecoration: 'none',
    fontSize: tokens.fontSizeBase300,
    ':hover': { backgroundColor: tokens.colorSubtleBackgroundHover, color: tokens.colorNeutralForeground1 },
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '1px' },
  },
  active: {
    backgroundColor: tokens.colorBrandBackground2,
    color: tokens.colorBrandForeground2,
    fontWeight: tokens.fontWeightSemibold,
    '::before': {
      content: '""',
      position: 'absolute',
      left: 0,
      top: '8px',
      bottom: '8px',
      width: '3px',
      borderRadius: '2px',
      backgroundColor: magma.background,
    },
    ':hover': { backgroundColor: tokens.colorBrandBackground2Hover, color: tokens.colorBrandForeground2 },
  },
  icon: { fontSize: '20px', display: 'flex' },
});

function NavItem({ to, icon: Icon, label, end }: { to: string; icon: FluentIcon; label: string; end?: boolean }) {
  const styles = useStyles();
  return (
    <li>
      <NavLink to={to} end={end} className={({ isActive }) => mergeClasses(styles.link, isActive && styles.active)}>
        <Icon className={styles.icon} aria-hidden="true" />
        {label}
      </NavLink>
    </li>
  );
}

/** The areas of the signed-in person's roles, from the one role → area table. */
export function AreaNav() {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const user = usePersonHere();
  const isAdmin = user.roles.includes('admin');
  const capturedMail = useCapturedMail(1, isAdmin);

  return (
    <nav aria-label={t('nav.label')} className={styles.nav}>
      <ul className={styles.list}>
        <NavItem to="/" end icon={HomeRegular} label={t('nav.home')} />
        {areasFor(user.roles).map((area) => (
          <NavItem key={area} to={`/${area}`} icon={AREA_ICONS[area]} label={t(`areas.${area}.name`)} />
        ))}
        {canOpen(user.roles, 'releases') ? <NavItem to="/stations" icon={TvRegular} label={t('stations.nav')} /> : null}
        {isAdmin ? <NavItem to="/audit" icon={HistoryRegular} label={t('audit.nav')} /> : null}
        {canOpen(user.roles, 'stories') ? <NavItem to="/widgets" icon={BeakerRegular} label={workbenchStrings(i18n.resolvedLanguage).nav} /> : null}
      </ul>
      {capturedMail.isSuccess ? (
        <>
          <div className={styles.section} aria-hidden="true">{t('nav.development')}</div>
          <ul className={styles.list} aria-label={t('nav.development')}>
            <NavItem to="/dev/mail" icon={MailRegular} label={t('nav.devMail')} />
          </ul>
        </>
      ) : null}
    </nav>
  );
}
