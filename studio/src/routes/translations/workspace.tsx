import { useEffect, useRef, useState } from 'react';
import { Dropdown, Field, makeStyles, Option, Spinner, Text, tokens } from '@fluentui/react-components';
import { LockClosedRegular } from '@fluentui/react-icons';
import { UNIT_STATUSES, type TranslationUnitView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useParams, useSearchParams } from 'react-router-dom';
import { ApiError } from '../../api/client';
import { usePersonHere } from '../../app/current-venue';
import { useStory } from '../../api/stories';
import { useStoryTranslations, useTranslationPreview, useTranslationUnits, type TranslationTarget } from '../../api/translations';
import { EmptyState } from '../../components/EmptyState';
import { LinkButton } from '../../components/links';
import { ListStates } from '../../components/lists/ListStates';
import { withSearchChanges } from '../../components/lists/list-search';
import { Pager } from '../../components/lists/Pager';
import { PageHeader } from '../../components/PageHeader';
import { BackArrow } from '../../components/ReadingArrows';
import { useLanguageName } from '../../components/translation/language-name';
import { ProgressMeter } from '../../components/translation/ProgressMeter';
import { TranslationPreview } from '../../components/translation/TranslationPreview';
import { UnitEditor } from '../../components/translation/UnitEditor';
import { XliffExchange } from '../../components/translation/XliffExchange';
import { NotFoundPage } from '../not-found';
import { readUnitParams } from './list-params';
import { UnitTable } from './UnitTable';

const useStyles = makeStyles({
  top: { display: 'flex', gap: tokens.spacingHorizontalXL, alignItems: 'flex-end', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  locales: { display: 'flex', gap: tokens.spacingHorizontalL, flexWrap: 'wrap', alignItems: 'flex-end', margin: 0, padding: 0, listStyle: 'none' },
  current: { paddingBottom: tokens.spacingVerticalXS, borderBottom: `3px solid ${tokens.colorBrandStroke1}` },
  grid: { display: 'grid', gridTemplateColumns: 'minmax(24rem, 5fr) minmax(28rem, 6fr)', gap: tokens.spacingHorizontalXL, alignItems: 'start', '@media (max-width: 1100px)': { gridTemplateColumns: '1fr' } },
  column: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL, minWidth: 0 },
  status: { minWidth: '12rem' },
  muted: { color: tokens.colorNeutralForeground3 },
});

/** The translator's workspace for one story in one locale: unit table, editor, preview and XLIFF exchange. */
export function TranslationWorkspacePage() {
  const params = useParams();
  const storyId = Number(params.storyId);
  const locale = params.locale ?? '';
  if (!Number.isInteger(storyId) || storyId <= 0 || !locale) return <NotFoundPage />;
  return <Workspace key={`${storyId}/${locale}`} target={{ storyId, locale }} />;
}

function Workspace({ target }: { target: TranslationTarget }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const me = usePersonHere();
  const languageName = useLanguageName();
  const languageLabel = useLanguageName({ standalone: true });
  const [search, setSearch] = useSearchParams();
  const unitParams = readUnitParams(search);
  const story = useStory(target.storyId);
  const progress = useStoryTranslations(target.storyId);
  const units = useTranslationUnits(target, unitParams);
  const preview = useTranslationPreview(target);
  const [drafts, setDrafts] = useState<Record<string, string>>({});
  const [focusEditor, setFocusEditor] = useState(false);
  // Moving back past the first unit of a page lands on the last unit of the page before.
  const landOnLast = useRef(false);

  const change = (changes: Record<string, string | undefined>) => setSearch((current) => withSearchChanges(current, changes), { replace: true });
  const items = units.data?.items ?? [];
  const requested = search.get('unit') ?? undefined;
  // eslint-disable-next-line react-hooks/refs -- read while rendering on purpose; replacing the flag with state changes which unit a re-render selects
  const selected = items.find((unit) => unit.unitId === requested) ?? (landOnLast.current ? items.at(-1) : items[0]);

  // Once the page before has come, its last unit goes into the address, so later renders keep it.
  useEffect(() => {
    if (units.isPlaceholderData || !units.data || !landOnLast.current) return;
    landOnLast.current = false;
    const last = units.data.items.at(-1);
    if (last) setSearch((current) => withSearchChanges(current, { unit: last.unitId }), { replace: true });
  }, [units.isPlaceholderData, units.data, setSearch]);

  const select = (unit: TranslationUnitView | undefined, focus: boolean) => {
    if (!unit) return;
    setFocusEditor(focus);
    change({ unit: unit.unitId, page: String(unitParams.page) });
  };
  const move = (step: -1 | 1) => {
    const index = selected ? items.indexOf(selected) : -1;
    const next = items[index + step];
    if (next) return select(next, true);
    const page = units.data;
    if (!page) return;
    if (step === 1 && page.page * page.pageSize < page.total) change({ page: String(page.page + 1), unit: undefined });
    if (step === -1 && page.page > 1) {
      landOnLast.current = true;
      change({ page: String(page.page - 1), unit: undefined });
    }
    setFocusEditor(true);
  };

  const sourceLocale = story.data?.sourceLocale ?? 'en';
  const language = languageName(target.locale);
  const title = t('workspace.title', { story: story.data?.title ?? '…', language: languageLabel(target.locale) });
  // What the person may do here is the server's answer for this target; nothing is offered until it has come.
  const can = units.data?.can ?? { translate: false, import: false, export: false };
  const page = units.data;

  if (units.error instanceof ApiError && units.error.status === 403) {
    return (
      <>
        <PageHeader title={title} />
        <EmptyState icon={<LockClosedRegular />} title={t('workspace.forbiddenTitle')} actions={<LinkButton to="/translations">{t('workspace.back')}</LinkButton>}>
          {t('workspace.forbiddenBody', { locales: me.locales.map(languageName).join(', ') })}
        </EmptyState>
      </>
    );
  }

  // Alt text has no panel of its own; it is previewed on the first panel that shows the image.
  const previewPanels = [...(preview.data?.panels ?? [])].sort((a, b) => a.position - b.position);
  const previewPanel = selected?.panelId != null ? previewPanels.find((panel) => panel.panelId === selected.panelId) : selected?.panelNumber != null ? previewPanels[selected.panelNumber - 1] : undefined;
  return (
    <>
      <PageHeader
        title={title}
        intro={t('workspace.intro', { source: languageName(sourceLocale) })}
        actions={<LinkButton to="/translations" appearance="subtle" icon={<BackArrow />}>{t('workspace.back')}</LinkButton>}
      />
      <div className={styles.top}>
        <ul className={styles.locales} aria-label={t('workspace.otherLocales')}>
          {(progress.data ?? []).map((entry) => (
            <li key={entry.locale} className={entry.locale === target.locale ? styles.current : undefined} data-locale-progress={entry.locale}>
              <LinkButton to={`/translations/${target.storyId}/${encodeURIComponent(entry.locale)}`} appearance="transparent" size="small" aria-current={entry.locale === target.locale ? 'page' : undefined}>
                {languageLabel(entry.locale)}
              </LinkButton>
              <ProgressMeter progress={entry} />
            </li>
          ))}
        </ul>
        <Field label={t('workspace.status')} className={styles.status}>
          <Dropdown
            value={unitParams.status ? t(`workspace.statuses.${unitParams.status}`) : t('workspace.anyStatus')}
            selectedOptions={[unitParams.status ?? '']}
            onOptionSelect={(_event, data) => change({ status: data.optionValue || undefined, unit: undefined })}
          >
            <Option value="">{t('workspace.anyStatus')}</Option>
            {UNIT_STATUSES.map((status) => <Option key={status} value={status}>{t(`workspace.statuses.${status}`)}</Option>)}
          </Dropdown>
        </Field>
        <XliffExchange target={target} can={can} />
      </div>
      <div className={styles.grid}>
        <div className={styles.column}>
          <ListStates
            query={units}
            loadError={t('workspace.unitsLoadError')}
            empty={<EmptyState title={t('workspace.noUnitsTitle')}>{t('workspace.noUnitsBody')}</EmptyState>}
          >
            {(unitPage) => (
              <>
                <UnitTable units={unitPage.items} selectedId={selected?.unitId} sourceLocale={sourceLocale} onSelect={(unitId) => select(items.find((unit) => unit.unitId === unitId), false)} busy={units.isFetching} />
                <Pager page={unitPage} label={t('workspace.unitsPagination')} onPage={(next) => change({ page: String(next), unit: undefined })} />
              </>
            )}
          </ListStates>
        </div>
        <div className={styles.column}>
          {selected && page ? (
            <UnitEditor
              key={selected.unitId}
              unit={selected}
              target={target}
              sourceLocale={sourceLocale}
              languageName={languageName}
              heading={t('unitEditor.heading', {
                where: selected.kind === 'storyTitle' ? t('workspace.storyMenu') : selected.panelNumber === null ? t('workspace.image') : t('workspace.panelNumber', { number: selected.panelNumber }),
                kind: t(`workspace.kinds.${selected.kind}`),
              })}
              draft={drafts[selected.unitId]}
              onDraft={(text) => setDrafts(({ [selected.unitId]: _old, ...rest }) => (text === undefined ? rest : { ...rest, [selected.unitId]: text }))}
              canWrite={can.translate}
              autoFocus={focusEditor}
              onMove={move}
              canMove={{ previous: items.indexOf(selected) > 0 || page.page > 1, next: items.indexOf(selected) < items.length - 1 || page.page * page.pageSize < page.total }}
            />
          ) : units.isSuccess && items.length > 0 ? (
            <Text className={styles.muted}>{t('workspace.chooseUnit')}</Text>
          ) : null}
          {preview.isPending && selected ? <Spinner size="small" label={t('common.loading')} /> : null}
          {preview.isError ? <Text className={styles.muted}>{t('translationPreview.loadError')}</Text> : null}
          {selected && selected.panelNumber !== null && previewPanel && preview.data ? (
            <TranslationPreview panel={previewPanel} panelNumber={selected.panelNumber} alt={preview.data.alt} locale={target.locale} languageName={language} />
          ) : selected && selected.panelNumber === null ? (
            <Text className={styles.muted}>{t(selected.kind === 'storyTitle' ? 'translationPreview.titleNoPanel' : 'translationPreview.noPanel')}</Text>
          ) : null}
        </div>
      </div>
    </>
  );
}
