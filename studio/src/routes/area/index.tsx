import { useTranslation } from 'react-i18next';
import { usePersonHere } from '../../app/current-venue';
import { canOpen, type Area } from '../../app/areas';
import { AREA_ICONS } from '../../components/area-icons';
import { EmptyState } from '../../components/EmptyState';
import { PageHeader } from '../../components/PageHeader';
import { LinkButton } from '../../components/links';

/** An area that is planned but not built: says so plainly instead of showing sample data. */
export function AreaLaterPage({ area }: { area: Area }) {
  const { t } = useTranslation();
  const Icon = AREA_ICONS[area];
  const name = t(`areas.${area}.name`);
  return (
    <>
      <PageHeader title={name} intro={t(`areas.${area}.summary`)} />
      <EmptyState icon={<Icon />} title={t('area.laterTitle', { area: name })} actions={<LinkButton to="/">{t('area.backHome')}</LinkButton>}>
        {t('area.laterBody')}
      </EmptyState>
    </>
  );
}

/** Shown instead of an area the person's roles do not include (the server refuses its data too). */
export function NotForRolePage({ area }: { area: Area }) {
  const { t } = useTranslation();
  const name = t(`areas.${area}.name`);
  return (
    <>
      <PageHeader title={name} />
      <EmptyState title={t('area.notForRoleTitle')} actions={<LinkButton to="/">{t('area.backHome')}</LinkButton>}>
        {t('area.notForRoleBody', { area: name })}
      </EmptyState>
    </>
  );
}

/** Lets a page through only for roles whose areas include it. */
export function RequireArea({ area, children }: { area: Area; children: React.ReactNode }) {
  const user = usePersonHere();
  return canOpen(user.roles, area) ? children : <NotForRolePage area={area} />;
}
