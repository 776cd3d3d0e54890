import { useState, type ReactNode } from 'react';
import {
  Button, Field, makeStyles, Select, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, tokens,
} from '@fluentui/react-components';
import { AddRegular } from '@fluentui/react-icons';
import { PAGE_SIZE, type SettingsSort } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { ApiError } from '../../api/client';
import { useDeleteSetting, useGalleries, useSettingsList, useVenues, type SettingsCollection, type SettingsListParams, type SettingsView } from '../../api/settings';
import { ConfirmDialog } from '../../components/ConfirmDialog';
import { EmptyState } from '../../components/EmptyState';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { ListStates } from '../../components/lists/ListStates';
import { CHOICES_BY_NAME, sortableColumn } from '../../components/lists/list-search';
import { Pager } from '../../components/lists/Pager';
import { useLanguageName } from '../../components/translation/language-name';
import { SettingsDialog } from './SettingsDialog';

type VenueView = SettingsView<'venues'>;
type GalleryView = SettingsView<'galleries'>;
type StationView = SettingsView<'stations'>;
type ExhibitView = SettingsView<'exhibits'>;

const useStyles = makeStyles({
  toolbar: { display: 'flex', alignItems: 'flex-end', justifyContent: 'space-between', gap: tokens.spacingHorizontalL, flexWrap: 'wrap', marginBottom: tokens.spacingVerticalM },
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  actions: { display: 'flex', gap: tokens.spacingHorizontalXS, justifyContent: 'flex-end' },
  muted: { color: tokens.colorNeutralForeground3 },
  note: { marginBottom: tokens.spacingVerticalM },
});

interface Column<V> {
  key: string;
  sortable?: boolean;
  cell: (view: V) => ReactNode;
}

function useNames(kind: 'venues' | 'galleries') {
  const venues = useVenues(CHOICES_BY_NAME);
  const galleries = useGalleries(CHOICES_BY_NAME);
  const items: { id: number; name: string }[] = (kind === 'venues' ? venues.data?.items : galleries.data?.items) ?? [];
  return { items, name: (id: number) => items.find((item) => item.id === id)?.name ?? `#${id}` };
}

/** One settings collection as a server-paged table, with create, edit and delete. */
export function SettingsSection({ collection }: { collection: SettingsCollection }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const [page, setPage] = useState(1);
  const [sort, setSort] = useState<SettingsSort>('name');
  const [parentId, setParentId] = useState<number | undefined>();
  const parentKind = collection === 'galleries' ? 'venues' : collection === 'venues' ? null : 'galleries';
  const parents = useNames(parentKind ?? 'venues');
  const params: SettingsListParams = {
    page,
    pageSize: PAGE_SIZE.fallback,
    sort,
    venueId: parentKind === 'venues' ? parentId : undefined,
    galleryId: parentKind === 'galleries' ? parentId : undefined,
  };
  const list = useSettingsList<SettingsCollection>(collection, params);
  const remove = useDeleteSetting(collection);
  const [dialog, setDialog] = useState<{ kind: 'edit'; view: SettingsView<SettingsCollection> | null } | { kind: 'delete'; view: SettingsView<SettingsCollection> } | null>(null);
  const date = (iso: string | null) => (iso ? new Intl.DateTimeFormat(i18n.resolvedLanguage, { dateStyle: 'medium', timeZone: 'UTC' }).format(new Date(`${iso}T00:00:00Z`)) : '—');
  const number = new Intl.NumberFormat(i18n.resolvedLanguage);
  const languageName = useLanguageName({ standalone: true });

  const columns: Column<never>[] = (
    {
      venues: [
        { key: 'name', sortable: true, cell: (venue: VenueView) => venue.name },
        { key: 'slug', cell: (venue: VenueView) => venue.slug },
        { key: 'sourceLocale', cell: (venue: VenueView) => languageName(venue.sourceLocale) },
        { key: 'targetLocales', cell: (venue: VenueView) => venue.targetLocales.map(languageName).join(', ') || '—' },
        { key: 'timeZone', cell: (venue: VenueView) => venue.timeZone },
      ],
      galleries: [
        { key: 'name', sortable: true, cell: (gallery: GalleryView) => gallery.name },
        { key: 'venueId', cell: (gallery: GalleryView) => parents.name(gallery.venueId) },
      ],
      stations: [
        { key: 'name', sortable: true, cell: (station: StationView) => station.name },
        { key: 'galleryId', cell: (station: StationView) => parents.name(station.galleryId) },
        { key: 'screen', cell: (station: StationView) => `${station.screenWidthPx} × ${station.screenHeightPx} px` },
        { key: 'orientation', cell: (station: StationView) => t(`settings.orientations.${station.orientation}`) },
        { key: 'mountingHeightMm', cell: (station: StationView) => `${number.format(station.mountingHeightMm)} mm` },
      ],
      exhibits: [
        { key: 'name', sortable: true, cell: (exhibit: ExhibitView) => exhibit.name },
        { key: 'galleryId', cell: (exhibit: ExhibitView) => parents.name(exhibit.galleryId) },
        { key: 'plannedStart', cell: (exhibit: ExhibitView) => date(exhibit.plannedStart) },
        { key: 'plannedEnd', cell: (exhibit: ExhibitView) => date(exhibit.plannedEnd) },
      ],
    } as Record<SettingsCollection, Column<never>[]>
  )[collection];

  const deleteProblem = remove.error instanceof ApiError && remove.error.status === 409 ? t(`settings.${collection}.inUse`) : remove.error ? describeError(t, remove.error) : null;

  return (
    <section aria-label={t(`settings.${collection}.title`)}>
      <div className={styles.toolbar}>
        {parentKind ? (
          <Field label={t(parentKind === 'venues' ? 'settings.fields.venueId' : 'settings.fields.galleryId')}>
            <Select value={parentId ? String(parentId) : ''} onChange={(_event, data) => { setParentId(data.value ? Number(data.value) : undefined); setPage(1); }}>
              <option value="">{t('settings.all')}</option>
              {parents.items.map((parent) => <option key={parent.id} value={String(parent.id)}>{parent.name}</option>)}
            </Select>
          </Field>
        ) : <Text className={styles.muted}>{t('settings.venues.intro')}</Text>}
        <Button appearance="primary" icon={<AddRegular />} onClick={() => setDialog({ kind: 'edit', view: null })}>{t(`settings.${collection}.create`)}</Button>
      </div>
      {collection === 'stations' ? <div className={styles.note}><FormAlert intent="info">{t('settings.mountingNote')}</FormAlert></div> : null}
      <ListStates
        query={list}
        loadError={t('settings.loadError')}
        empty={<EmptyState title={t(`settings.${collection}.empty`)} headingLevel={3} />}
      >
        {(data) => (
          <>
            <Table sortable aria-label={t(`settings.${collection}.title`)} aria-busy={list.isFetching} className={styles.table}>
              <TableHeader>
                <TableRow>
                  {columns.map((column) => (
                    <TableHeaderCell key={column.key} {...(column.sortable ? sortableColumn(sort, column.key, (next) => { setSort(next); setPage(1); }) : {})}>
                      {t(`settings.columns.${column.key as 'name'}`)}
                    </TableHeaderCell>
                  ))}
                  <TableHeaderCell><span className={styles.muted}>{t('settings.columns.actions')}</span></TableHeaderCell>
                </TableRow>
              </TableHeader>
              <TableBody>
                {data.items.map((view) => (
                  <TableRow key={view.id}>
                    {columns.map((column) => <TableCell key={column.key}>{column.cell(view as never)}</TableCell>)}
                    <TableCell>
                      <span className={styles.actions}>
                        <Button size="small" onClick={() => setDialog({ kind: 'edit', view })} aria-label={t('settings.editLabel', { name: view.name })}>{t('settings.edit')}</Button>
                        <Button size="small" appearance="subtle" onClick={() => { remove.reset(); setDialog({ kind: 'delete', view }); }} aria-label={t('settings.deleteLabel', { name: view.name })}>
                          {t('settings.delete')}
                        </Button>
                      </span>
                    </TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
            <Pager page={data} label={t(`settings.${collection}.title`)} onPage={setPage} />
          </>
        )}
      </ListStates>

      {dialog?.kind === 'edit' ? <SettingsDialog collection={collection} editing={dialog.view} onClose={() => setDialog(null)} /> : null}
      {dialog?.kind === 'delete' ? (
        <ConfirmDialog
          title={t('settings.deleteTitle', { name: dialog.view.name })}
          confirmLabel={t('settings.deleteConfirm')}
          pending={remove.isPending}
          problem={deleteProblem}
          onConfirm={() => remove.mutate(dialog.view.id, { onSuccess: () => setDialog(null) })}
          onCancel={() => setDialog(null)}
        >
          <Text as="p">{t('settings.deleteBody')}</Text>
        </ConfirmDialog>
      ) : null}
    </section>
  );
}
