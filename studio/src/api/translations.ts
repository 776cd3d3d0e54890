import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { UnitStatus } from '@mantlepiece/shared';
import { useVenueFilter } from '../app/current-venue';
import { answerOf, client, type Schema } from './client';

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

const targetParams = ({ storyId, locale }: TranslationTarget) => ({ id: storyId, locale });

export function useTranslationWorklist(params: WorklistParams) {
  const venue = useVenueFilter();
  return useQuery({
    queryKey: [...translationsKey, 'worklist', params, venue],
    queryFn: () => answerOf(client.GET('/api/translations/stories', { params: { query: { ...params, ...venue } } })),
    placeholderData: keepPreviousData,
  });
}

export function useStoryTranslations(storyId: number) {
  return useQuery({
    queryKey: storyProgressKey(storyId),
    queryFn: () => answerOf(client.GET('/api/stories/{id}/translations', { params: { path: { id: storyId } } })),
  });
}

export function useTranslationUnits(target: TranslationTarget, params: UnitListParams) {
  return useQuery({
    queryKey: [...unitsKey(target), params],
    queryFn: () => answerOf(client.GET('/api/stories/{id}/translations/{locale}/units', { params: { path: targetParams(target), query: params } })),
    placeholderData: keepPreviousData,
  });
}

export function useTranslationPreview(target: TranslationTarget) {
  return useQuery({
    queryKey: previewKey(target),
    queryFn: () => answerOf(client.GET('/api/stories/{id}/translations/{locale}/preview', { params: { path: targetParams(target) } })),
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
    mutationFn: ({ unitId, ...body }: Schema<'SaveTranslationUnitDto'> & { unitId: string }) =>
      answerOf(client.PUT('/api/stories/{id}/translations/{locale}/units/{unitId}', { params: { path: { ...targetParams(target), unitId } }, body })),
    onSuccess: (saved, { unitId, text }) => {
      queryClient.setQueriesData<Schema<'TranslationUnitPage'>>({ queryKey: unitsKey(target) }, (page) =>
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
  return useMutation({
    mutationFn: () =>
      answerOf(client.GET('/api/stories/{id}/translations/{locale}/xliff', { params: { path: targetParams(target) }, headers: { Accept: XLIFF_TYPE }, parseAs: 'blob' })),
  });
}

export function useUploadXliff(target: TranslationTarget) {
  const refresh = useRefreshAfterWrite(target);
  return useMutation({
    // The document goes as it is, under its own media type; the server reads it as UTF-8 text, as Blob.text() does.
    mutationFn: async (file: Blob) =>
      answerOf(
        client.PUT('/api/stories/{id}/translations/{locale}/xliff', {
          params: { path: targetParams(target) },
          body: await file.text(),
          bodySerializer: (document) => document,
          headers: { 'Content-Type': XLIFF_TYPE },
        }),
      ),
    onSuccess: () => refresh(true),
  });
}
