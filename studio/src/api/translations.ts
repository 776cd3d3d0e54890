import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  Page,
  SavedTranslationUnit,
  SaveTranslationUnitBody,
  StoryTranslationsView,
  TranslationPreviewView,
  TranslationUnitPage,
  TranslationUnitView,
  TranslationWorklistPage,
  UnitStatus,
  XliffImportResult,
} from '@mantlepiece/shared';
import { useVenueFilter } from '../app/current-venue';
import { api, apiFile } from './client';

export interface WorklistParams {
  page: number;
  pageSize: number;
  q?: string;
  locale?: string;
}

export interface UnitListParams {
  page: number;
  pageSize: number;
  status?: UnitStatus;
}

/** One story in one target locale: the translator's workspace. */
export interface TranslationTarget {
  storyId: number;
  locale: string;
}

const XLIFF_TYPE = 'application/xliff+xml';

const translationsKey = ['translations'] as const;
const targetKey = ({ storyId, locale }: TranslationTarget) => [...translationsKey, storyId, locale] as const;
const unitsKey = (target: TranslationTarget) => [...targetKey(target), 'units'] as const;
const previewKey = (target: TranslationTarget) => [...targetKey(target), 'preview'] as const;
const storyProgressKey = (storyId: number) => [...translationsKey, storyId, 'progress'] as const;

const targetPath = ({ storyId, locale }: TranslationTarget) => `/stories/${storyId}/translations/${encodeURIComponent(locale)}`;

export function useTranslationWorklist(params: WorklistParams) {
  const venue = useVenueFilter();
  return useQuery({
    queryKey: [...translationsKey, 'worklist', params, venue],
    queryFn: () => api<TranslationWorklistPage>('/translations/stories', { query: { ...params, ...venue } }),
    placeholderData: keepPreviousData,
  });
}

export function useStoryTranslations(storyId: number) {
  return useQuery({
    queryKey: storyProgressKey(storyId),
    queryFn: () => api<StoryTranslationsView>(`/stories/${storyId}/translations`),
  });
}

export function useTranslationUnits(target: TranslationTarget, params: UnitListParams) {
  return useQuery({
    queryKey: [...unitsKey(target), params],
    queryFn: () => api<TranslationUnitPage>(`${targetPath(target)}/units`, { query: { ...params } }),
    placeholderData: keepPreviousData,
  });
}

export function useTranslationPreview(target: TranslationTarget) {
  return useQuery({
    queryKey: previewKey(target),
    queryFn: () => api<TranslationPreviewView>(`${targetPath(target)}/preview`),
    placeholderData: keepPreviousData,
  });
}

/** After a write, progress, the preview and the worklist all move; the unit table is refreshed by the caller's choice. */
function useRefreshAfterWrite(target: TranslationTarget) {
  const queryClient = useQueryClient();
  return (units: boolean) => {
    void queryClient.invalidateQueries({ queryKey: previewKey(target) });
    void queryClient.invalidateQueries({ queryKey: storyProgressKey(target.storyId) });
    void queryClient.invalidateQueries({ queryKey: [...translationsKey, 'worklist'] });
    if (units) void queryClient.invalidateQueries({ queryKey: unitsKey(target) });
  };
}

/**
 * Saves one unit. The answer is folded into the cached unit pages at once, so the table's status
 * and the version for the next save are right without waiting for a refetch.
 */
export function useSaveTranslationUnit(target: TranslationTarget) {
  const queryClient = useQueryClient();
  const refresh = useRefreshAfterWrite(target);
  return useMutation({
    mutationFn: ({ unitId, ...body }: SaveTranslationUnitBody & { unitId: string }) =>
      api<SavedTranslationUnit>(`${targetPath(target)}/units/${encodeURIComponent(unitId)}`, { method: 'PUT', body }),
    onSuccess: (saved, { unitId, text }) => {
      queryClient.setQueriesData<Page<TranslationUnitView>>({ queryKey: unitsKey(target) }, (page) =>
        page
          ? { ...page, items: page.items.map((unit) => (unit.unitId === unitId ? { ...unit, ...saved, target: text || null, previousSource: null } : unit)) }
          : page,
      );
      refresh(false);
    },
  });
}

/** Reads the unit pages again, for a translator who chose the other person's version after a conflict. */
export function useReloadUnits(target: TranslationTarget) {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: unitsKey(target) });
}

export function useDownloadXliff(target: TranslationTarget) {
  return useMutation({ mutationFn: () => apiFile(`${targetPath(target)}/xliff`, { accept: XLIFF_TYPE }) });
}

export function useUploadXliff(target: TranslationTarget) {
  const refresh = useRefreshAfterWrite(target);
  return useMutation({
    mutationFn: (file: Blob) => api<XliffImportResult>(`${targetPath(target)}/xliff`, { method: 'PUT', file: { type: XLIFF_TYPE, content: file } }),
    onSuccess: () => refresh(true),
  });
}
