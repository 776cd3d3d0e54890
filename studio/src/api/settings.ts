import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Page, SettingsSort } from '@mantlepiece/shared';
import { answerOf, client, type Schema } from './client';

/** The four settings collections share one shape of API: paged list, create, change, delete. */
export type SettingsCollection = 'venues' | 'galleries' | 'stations' | 'exhibits';

export interface SettingsListParams {
  page: number;
  pageSize: number;
  q?: string;
  sort?: SettingsSort;
  venueId?: number;
  galleryId?: number;
}

interface Collections {
  venues: { view: Schema<'VenueView'>; fields: Schema<'CreateVenueDto'> };
  galleries: { view: Schema<'GalleryView'>; fields: Schema<'CreateGalleryDto'> };
  stations: { view: Schema<'StationView'>; fields: Schema<'CreateStationDto'> };
  exhibits: { view: Schema<'ExhibitView'>; fields: Schema<'CreateExhibitDto'> };
}

export type SettingsView<C extends SettingsCollection> = Collections[C]['view'];
/** What a settings form sends to create a row; a change sends the same without the parent, which stays. */
export type SettingsFields<C extends SettingsCollection> = Collections[C]['fields'];

interface CollectionRequests<C extends SettingsCollection> {
  list: (query: SettingsListParams) => Promise<Page<SettingsView<C>>>;
  create: (fields: SettingsFields<C>) => Promise<SettingsView<C>>;
  update: (id: number, fields: SettingsFields<C>) => Promise<SettingsView<C>>;
  remove: (id: number) => Promise<unknown>;
}

const at = (id: number) => ({ path: { id } });

// A gallery stays in its venue, and a station or an exhibit in its gallery: a change leaves the parent out.
const REQUESTS: { [C in SettingsCollection]: CollectionRequests<C> } = {
  venues: {
    list: ({ page, pageSize, q, sort }) => answerOf(client.GET('/api/venues', { params: { query: { page, pageSize, q, sort } } })),
    create: (body) => answerOf(client.POST('/api/venues', { body })),
    update: (id, body) => answerOf(client.PATCH('/api/venues/{id}', { params: at(id), body })),
    remove: (id) => answerOf(client.DELETE('/api/venues/{id}', { params: at(id) })),
  },
  galleries: {
    list: ({ galleryId: _none, ...query }) => answerOf(client.GET('/api/galleries', { params: { query } })),
    create: (body) => answerOf(client.POST('/api/galleries', { body })),
    update: (id, { venueId: _stays, ...body }) => answerOf(client.PATCH('/api/galleries/{id}', { params: at(id), body })),
    remove: (id) => answerOf(client.DELETE('/api/galleries/{id}', { params: at(id) })),
  },
  stations: {
    list: (query) => answerOf(client.GET('/api/stations', { params: { query } })),
    create: (body) => answerOf(client.POST('/api/stations', { body })),
    update: (id, { galleryId: _stays, ...body }) => answerOf(client.PATCH('/api/stations/{id}', { params: at(id), body })),
    remove: (id) => answerOf(client.DELETE('/api/stations/{id}', { params: at(id) })),
  },
  exhibits: {
    list: (query) => answerOf(client.GET('/api/exhibits', { params: { query } })),
    create: (body) => answerOf(client.POST('/api/exhibits', { body })),
    update: (id, { galleryId: _stays, ...body }) => answerOf(client.PATCH('/api/exhibits/{id}', { params: at(id), body })),
    remove: (id) => answerOf(client.DELETE('/api/exhibits/{id}', { params: at(id) })),
  },
};

const settingsKey = (collection: SettingsCollection) => ['settings', collection] as const;

/** One page of any settings collection; the Settings tables use this, other pages the named hooks below. */
export function useSettingsList<C extends SettingsCollection>(collection: C, params: SettingsListParams, enabled = true) {
  return useQuery({
    queryKey: [...settingsKey(collection), params],
    queryFn: () => REQUESTS[collection].list(params),
    placeholderData: keepPreviousData,
    enabled,
  });
}

export const useVenues = (params: SettingsListParams) => useSettingsList('venues', params);
export const useGalleries = (params: SettingsListParams) => useSettingsList('galleries', params);
export const useStations = (params: SettingsListParams) => useSettingsList('stations', params);
export const useExhibits = (params: SettingsListParams, enabled = true) => useSettingsList('exhibits', params, enabled);

/** Create when there is no id, change when there is: one mutation per settings dialog. */
export function useSaveSetting<C extends SettingsCollection>(collection: C) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, fields }: { id?: number; fields: SettingsFields<C> }) =>
      id === undefined ? REQUESTS[collection].create(fields) : REQUESTS[collection].update(id, fields),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['settings'] }),
  });
}

export function useDeleteSetting(collection: SettingsCollection) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => REQUESTS[collection].remove(id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['settings'] }),
  });
}
