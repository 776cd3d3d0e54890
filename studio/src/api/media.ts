import { keepPreviousData, useMutation, useQueries, useQuery, useQueryClient } from '@tanstack/react-query';
import type { MediaMissingFilter } from '@mantlepiece/shared';
import type { paths } from '@mantlepiece/shared/api';
import { useVenueFilter } from '../app/current-venue';
import { answerOf, ApiError, authorizationHeader, client, NETWORK_FAILURE, refreshSession, type Schema } from './client';
import type { MediaSort } from '@mantlepiece/shared';

export interface MediaListParams {
  page: number;
  pageSize: number;
  q?: string;
  missing?: MediaMissingFilter;
  expiringWithinDays?: number;
  sort?: MediaSort;
}

const mediaListKey = ['media-list'] as const;
export const mediaKey = (id: number) => ['media', id] as const;

/** While an image's renditions are being made, its page and the lists showing it ask again this often. */
const PREPARING_POLL_MS = 2000;
const preparing = (asset: Schema<'MediaView'> | undefined) => asset?.renditionStatus.state === 'pending';

export function useMediaList(params: MediaListParams, enabled = true) {
  const queryClient = useQueryClient();
  const venue = useVenueFilter();
  return useQuery({
    queryKey: [...mediaListKey, params, venue],
    queryFn: async () => {
      const page = await answerOf(client.GET('/api/media', { params: { query: { ...params, ...venue } } }));
      // Each asset is also cached on its own, so the editor can draw a picked image at once.
      for (const asset of page.items) queryClient.setQueryData(mediaKey(asset.id), asset);
      return page;
    },
    placeholderData: keepPreviousData,
    refetchInterval: (query) => (query.state.data?.items.some(preparing) ? PREPARING_POLL_MS : false),
    enabled,
  });
}

export const mediaAssetQuery = (id: number) => ({ queryKey: mediaKey(id), queryFn: () => answerOf(client.GET('/api/media/{id}', { params: { path: { id } } })) });

export function useMediaAsset(id: number) {
  return useQuery({ ...mediaAssetQuery(id), refetchInterval: (query) => (preparing(query.state.data) ? PREPARING_POLL_MS : false) });
}

/** Several assets at once: the images a panel shows, loaded before its editor opens. */
export function useMediaAssets(ids: readonly number[]) {
  return useQueries({ queries: ids.map((id) => ({ ...mediaAssetQuery(id), retry: false })) });
}

export type MediaChanges = Schema<'UpdateMediaDto'>;

export function useUpdateMedia(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: MediaChanges) => answerOf(client.PATCH('/api/media/{id}', { params: { path: { id } }, body: changes })),
    onSuccess: (asset) => {
      queryClient.setQueryData(mediaKey(id), asset);
      void queryClient.invalidateQueries({ queryKey: mediaListKey });
    },
  });
}

export function useDeleteMedia() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => answerOf(client.DELETE('/api/media/{id}', { params: { path: { id } } })),
    onSuccess: (_nothing, id) => {
      queryClient.removeQueries({ queryKey: mediaKey(id) });
      void queryClient.invalidateQueries({ queryKey: mediaListKey });
    },
  });
}

/** The SPDX identifiers the server accepts as a licence, in the order it suggests them; the list changes only with a server update. */
export function useLicenceIds() {
  return useQuery({ queryKey: ['media-licences'], queryFn: () => answerOf(client.GET('/api/media/licences')), staleTime: Infinity });
}

/** Undo of an image's delete: the server brings it back as it was. */
export function useRestoreMedia() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => answerOf(client.POST('/api/media/{id}/restore', { params: { path: { id } } })),
    onSuccess: (asset) => {
      queryClient.setQueryData(mediaKey(asset.id), asset);
      void queryClient.invalidateQueries({ queryKey: mediaListKey });
    },
  });
}

/** Asks the server to make a failed image's renditions again. */
export function useRetryRenditions(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => answerOf(client.POST('/api/media/{id}/renditions/retry', { params: { path: { id } } })),
    onSuccess: (renditionStatus) => {
      queryClient.setQueryData<Schema<'MediaView'>>(mediaKey(id), (asset) => (asset ? { ...asset, renditionStatus } : asset));
      void queryClient.invalidateQueries({ queryKey: mediaListKey });
    },
  });
}

function parseBody(text: string): unknown {
  try {
    return text ? JSON.parse(text) : undefined;
  } catch {
    return undefined;
  }
}

/** The upload's address, checked against the API's document: XMLHttpRequest takes it as a plain string. */
const UPLOAD_PATH = '/api/media' satisfies keyof paths;
type Upload = paths[typeof UPLOAD_PATH]['post'];
type UploadField = keyof Upload['requestBody']['content']['multipart/form-data'];
type UploadAnswer = Upload['responses'][201]['content']['application/json'];

/** One multipart POST through XMLHttpRequest, the one browser API that reports upload progress. */
function postFile(file: File, onProgress: (fraction: number) => void, venueId?: number): Promise<{ status: number; body: unknown }> {
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', UPLOAD_PATH);
    for (const [name, value] of Object.entries({ Accept: 'application/json', ...authorizationHeader() })) request.setRequestHeader(name, value);
    request.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    request.onload = () => resolve({ status: request.status, body: parseBody(request.responseText) });
    request.onerror = () => reject(new ApiError(NETWORK_FAILURE, { message: 'network' }));
    const form = new FormData();
    if (venueId !== undefined) form.append('venueId' satisfies UploadField, String(venueId));
    form.append('file' satisfies UploadField, file, file.name);
    request.send(form);
  });
}

/** Uploads one file to a venue (the uploader's only one when not named); a 401 gets one retry after a refresh, as every other API call does. */
export async function uploadMediaFile(file: File, onProgress: (fraction: number) => void, venueId?: number): Promise<UploadAnswer[number]> {
  let answer = await postFile(file, onProgress, venueId);
  if (answer.status === 401 && (await refreshSession())) answer = await postFile(file, onProgress, venueId);
  const { status, body } = answer;
  // XMLHttpRequest parses nothing itself; the body is the operation's answer as the document declares it.
  if (status >= 200 && status < 300) return (body as UploadAnswer)[0]!;
  const error = body && typeof body === 'object' && 'message' in body ? (body as Schema<'ApiErrorBody'>) : { message: String(status) };
  throw new ApiError(status, error);
}

/** Uploads to the studio's current venue. */
export function useUploadMedia() {
  const queryClient = useQueryClient();
  const { venueId } = useVenueFilter();
  return useMutation({
    mutationFn: ({ file, onProgress }: { file: File; onProgress: (fraction: number) => void }) => uploadMediaFile(file, onProgress, venueId),
    onSuccess: (asset) => {
      queryClient.setQueryData(mediaKey(asset.id), asset);
      void queryClient.invalidateQueries({ queryKey: mediaListKey });
    },
  });
}
