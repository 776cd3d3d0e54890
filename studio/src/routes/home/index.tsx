import type { ReactNode } from 'react';
import { Badge, makeStyles, Spinner, Text, tokens } from '@fluentui/react-components';
import { ROLES, type Role, type UserView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useUsers } from '../../api/users';
import { usePersonHere } from '../../app/current-venue';
import { AREAS_BY_ROLE, BUILT_AREAS, type Area } from '../../app/areas';
import { magma } from '../../app/theme';
import { AREA_ICONS } from '../../components/area-icons';
import { CallToAction } from '../../components/CallToAction';
import { useRoleList } from '../../components/formatting';
import { PageHeader } from '../../components/PageHeader';
import { TextLink } from '../../components/links';
import { MyWorkLists } from './MyWorkLists';

const useStyles = makeStyles({
  grid: { display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(24rem, 1fr))', gap: tokens.spacingHorizontalXL, alignItems: 'start', maxWidth: '72rem' },
  card: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    padding: tokens.spacingHorizontalXL,
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderTop: `4px solid ${tokens.colorBrandBackground}`,
  },
  heading: { margin: 0 },
  role: { color: magma.foreground, fontWeight: tokens.fontWeightSemibold, textTransform: 'uppercase', letterSpacing: '0.06em' },
  body: { color: tokens.colorNeutralForeground2, margin: 0 },
  areas: {
    listStyle: 'none',
    margin: 0,
    padding: `${tokens.spacingVerticalM} 0 0`,
    borderTop: `1px solid ${tokens.colorNeutralStroke2}`,
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(20rem, 1fr))',
    gap: tokens.spacingVerticalS,
  },
  area: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
  areaIcon: { fontSize: '20px', color: tokens.colorBrandForeground1, display: 'flex' },
  figures: { display: 'flex', gap: tokens.spacingHorizontalXXL, margin: 0 },
  figure: { display: 'flex', flexDirection: 'column-reverse', margin: 0 },
  figureValue: { fontSize: tokens.fontSizeHero800, fontWeight: tokens.fontWeightSemibold, lineHeight: tokens.lineHeightHero800, margin: 0 },
});

function AreaLinks({ areas }: { areas: readonly Area[] }) {
  const { t } = useTranslation();
  const styles = useStyles();
  return (
    <ul className={styles.areas}>
      {areas.map((area) => {
        const Icon = AREA_ICONS[area];
        return (
          <li key={area} className={styles.area}>
            <Icon className={styles.areaIcon} aria-hidden="true" />
            <TextLink to={`/${area}`}>{t(`areas.${area}.name`)}</TextLink>
            {BUILT_AREAS.has(area) ? null : <Badge appearance="tint" color="subtle">{t('home.later')}</Badge>}
          </li>
        );
      })}
    </ul>
  );
}

function RoleCard({ role, title, body, children }: { role: Role; title: string; body: string; children?: ReactNode }) {
  const { t } = useTranslation();
  const styles = useStyles();
  return (
    <section className={styles.card} aria-labelledby={`role-${role}`}>
      <Text size={200} className={styles.role}>{t(`roles.${role}`)}</Text>
      <Text as="h2" size={500} weight="semibold" id={`role-${role}`} className={styles.heading}>{title}</Text>
      <Text as="p" className={styles.body}>{body}</Text>
      {children}
      <MyWorkLists role={role} />
      <AreaLinks areas={AREAS_BY_ROLE[role]} />
    </section>
  );
}

/** Real figures only: the count comes from the same paged endpoint the People table uses. */
function AdminFigures() {
  const { t } = useTranslation();
  const styles = useStyles();
  const active = useUsers({ page: 1, pageSize: 1, active: true });
  if (active.isPending) return <Spinner size="tiny" label={t('common.loading')} />;
  if (active.isError) return null;
  return (
    <dl className={styles.figures}>
      <div className={styles.figure}>
        <dt>{t('home.admin.activePeople')}</dt>
        <dd className={styles.figureValue}>{active.data.total}</dd>
      </div>
    </dl>
  );
}

function RoleCards({ user }: { user: UserView }) {
  const { t, i18n } = useTranslation();
  const locales = new Intl.ListFormat(i18n.resolvedLanguage ?? 'en').format(
    user.locales.map((tag) => `${new Intl.DisplayNames(i18n.resolvedLanguage ?? 'en', { type: 'language' }).of(tag) ?? tag} (${tag})`),
  );
  const cards: Record<Role, ReactNode> = {
    admin: (
      <RoleCard key="admin" role="admin" title={t('home.admin.title')} body={t('home.admin.body')}>
        <AdminFigures />
        <div><CallToAction to="/people?invite=1">{t('home.admin.invite')}</CallToAction></div>
      </RoleCard>
    ),
    curator: <RoleCard key="curator" role="curator" title={t('home.curator.title')} body={t('home.curator.body')} />,
    educator: <RoleCard key="educator" role="educator" title={t('home.educator.title')} body={t('home.educator.body')} />,
    translator: (
      <RoleCard
        key="translator"
        role="translator"
        title={t('home.translator.title')}
        body={user.locales.length ? t('home.translator.body', { locales }) : t('home.translator.noLocales')}
      />
    ),
    technician: <RoleCard key="technician" role="technician" title={t('home.technician.title')} body={t('home.technician.body')} />,
  };
  return <>{ROLES.filter((role) => user.roles.includes(role)).map((role) => cards[role])}</>;
}

export function HomePage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const user = usePersonHere();
  const roleList = useRoleList();
  return (
    <>
      <PageHeader title={t('home.greeting', { name: user.name })} intro={t('home.intro', { roles: roleList(user.roles) })} />
      <div className={styles.grid}>
        <RoleCards user={user} />
      </div>
    </>
  );
}
