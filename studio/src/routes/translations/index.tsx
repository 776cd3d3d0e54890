import { Button, Dropdown, Field, makeStyles, Option, SearchBox, tokens } from '@fluentui/react-components';
import { TranslateRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { useTranslationWorklist } from '../../api/translations';
import { EmptyState } from '../../components/EmptyState';
import { ListStates } from '../../components/lists/ListStates';
import { Pager } from '../../components/lists/Pager';
import { useListSearch } from '../../components/lists/use-list-search';
import { PageHeader } from '../../components/PageHeader';
import { useLanguageName } from '../../components/translation/language-name';
import { readWorklistParams } from './list-params';
import { WorklistTable } from './WorklistTable';

const useStyles = makeStyles({
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  search: { minWidth: '18rem' },
  locale: { minWidth: '12rem' },
});

/** The translator's worklist: each story in each of their locales, with its progress. */
export function TranslationsPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const languageName = useLanguageName({ standalone: true });
  const { search, query, setQuery, change, clear } = useListSearch();
  const params = readWorklistParams(search);
  const worklist = useTranslationWorklist(params);
  // The locales of the person's own worklist, as the server reads it; kept while a new page loads.
  const locales = worklist.data?.locales ?? (params.locale ? [params.locale] : []);
  const filtered = Boolean(params.q || params.locale);

  const anyLocale = t('translations.anyLocale');
  return (
    <>
      <PageHeader title={t('translations.title')} intro={worklist.data ? t(worklist.data.can.translate ? 'translations.intro' : 'translations.introAll') : undefined} />
      <div className={styles.toolbar} role="search">
        <Field label={t('translations.search')} className={styles.search}>
          <SearchBox value={query} onChange={(_event, data) => setQuery(data.value)} />
        </Field>
        <Field label={t('translations.locale')} className={styles.locale}>
          <Dropdown
            value={params.locale ? languageName(params.locale) : anyLocale}
            selectedOptions={[params.locale ?? '']}
            onOptionSelect={(_event, data) => change({ locale: data.optionValue || undefined })}
          >
            <Option value="">{anyLocale}</Option>
            {locales.map((locale) => (
              <Option key={locale} value={locale} text={languageName(locale)}>{`${languageName(locale)} (${locale})`}</Option>
            ))}
          </Dropdown>
        </Field>
      </div>
      <ListStates
        query={worklist}
        loadError={t('translations.loadError')}
        empty={
          filtered ? (
            <EmptyState
              icon={<TranslateRegular />}
              title={t('translations.noMatchTitle')}
              actions={<Button onClick={clear}>{t('lists.clearFilters')}</Button>}
            >
              {t('translations.noMatchBody')}
            </EmptyState>
          ) : (
            <EmptyState icon={<TranslateRegular />} title={t('translations.emptyTitle')}>{t('translations.emptyBody')}</EmptyState>
          )
        }
      >
        {(page) => (
          <>
            <WorklistTable items={page.items} busy={worklist.isFetching} />
            <Pager page={page} label={t('translations.pagination')} onPage={(next) => change({ page: String(next) })} />
          </>
        )}
      </ListStates>
    </>
  );
}
