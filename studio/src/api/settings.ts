import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ExhibitView, GalleryView, Page, StationView, VenueView } from '@mantlepiece/shared';
import { api, type Query } from './client';

/** The four settings collections share one shape of API: paged list, create, change, delete. */
export type SettingsCollection = 'venues' | 'galleries' | 'stations' | 'exhibits';

export interface SettingsListParams {
  page: number;
  pageSize: number;
  q?: string;
  sort?: string;
  venueId?: number;
  galleryId?: number;
}

/** What a settings form sends: the view without what the server assigns. */
export type VenueFields = Pick<VenueView, 'name' | 'slug' | 'sourceLocale' | 'targetLocales' | 'timeZone'>;
export type GalleryFields = Omit<GalleryView, 'id'>;
export type StationFields = Omit<StationView, 'id' | 'can'>;
export type ExhibitFields = Omit<ExhibitView, 'id'>;

interface Collections {
  venues: { view: VenueView; fields: VenueFields };
  galleries: { view: GalleryView; fields: GalleryFields };
  stations: { view: StationView; fields: StationFields };
  exhibits: { view: ExhibitView; fields: ExhibitFields };
}

export type SettingsView<C extends SettingsCollection> = Collections[C]['view'];
export type SettingsFields<C extends SettingsCollection> = Collections[C]['fields'];

const settingsKey = (collection: SettingsCollection) => ['settings', collection] as const;

/** One page of any settings collection; the Settings tables use this, other pages the named hooks below. */
export function useSettingsList<C extends SettingsCollection>(collection: C, params: SettingsListParams, enabled = true) {
  return useQuery({
    queryKey: [...settingsKey(collection), params],
    queryFn: () => api<Page<SettingsView<C>>>(`/${collection}`, { query: { ...params } as Query }),
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
      id === undefined
        ? api<SettingsView<C>>(`/${collection}`, { method: 'POST', body: fields })
        : api<SettingsView<C>>(`/${collection}/${id}`, { method: 'PATCH', body: fields }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['settings'] }),
  });
}

export function useDeleteSetting(collection: SettingsCollection) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/${collection}/${id}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['settings'] }),
  });
}
