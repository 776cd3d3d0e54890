import { makeStyles, Tab, TabList, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import type { SettingsCollection } from '../../api/settings';
import { oneOf } from '../../components/lists/list-search';
import { PageHeader } from '../../components/PageHeader';
import { SettingsSection } from './SettingsSection';

const COLLECTIONS: readonly SettingsCollection[] = ['venues', 'galleries', 'stations', 'exhibits'];

const useStyles = makeStyles({ tabs: { marginBottom: tokens.spacingVerticalL } });

/** Venues, galleries, stations and exhibits: one tab each, the open one kept in the URL. */
export function SettingsPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const [search, setSearch] = useSearchParams();
  const collection = oneOf(search.get('tab'), COLLECTIONS) ?? 'venues';
  return (
    <>
      <PageHeader title={t('settings.title')} intro={t('settings.intro')} />
      <TabList className={styles.tabs} selectedValue={collection} onTabSelect={(_event, data) => setSearch({ tab: String(data.value) }, { replace: true })}>
        {COLLECTIONS.map((name) => <Tab key={name} value={name}>{t(`settings.${name}.title`)}</Tab>)}
      </TabList>
      <SettingsSection key={collection} collection={collection} />
    </>
  );
}
