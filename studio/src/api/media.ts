import { keepPreviousData, useMutation, useQueries, useQuery, useQueryClient } from '@tanstack/react-query';
import type { LicenceIdsView, MediaLicence, MediaMissingFilter, MediaPage, MediaView, RenditionStatus } from '@mantlepiece/shared';
import { useVenueFilter } from '../app/current-venue';
import { api, ApiError, authorizationHeader, NETWORK_FAILURE, refreshSession } from './client';
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
const preparing = (asset: MediaView | undefined) => asset?.renditionStatus.state === 'pending';

export function useMediaList(params: MediaListParams, enabled = true) {
  const queryClient = useQueryClient();
  const venue = useVenueFilter();
  return useQuery({
    queryKey: [...mediaListKey, params, venue],
    queryFn: async () => {
      const page = await api<MediaPage>('/media', { query: { ...params, ...venue } });
      // Each asset is also cached on its own, so the editor can draw a picked image at once.
      for (const asset of page.items) queryClient.setQueryData(mediaKey(asset.id), asset);
      return page;
    },
    placeholderData: keepPreviousData,
    refetchInterval: (query) => (query.state.data?.items.some(preparing) ? PREPARING_POLL_MS : false),
    enabled,
  });
}

export const mediaAssetQuery = (id: number) => ({ queryKey: mediaKey(id), queryFn: () => api<MediaView>(`/media/${id}`) });

export function useMediaAsset(id: number) {
  return useQuery({ ...mediaAssetQuery(id), refetchInterval: (query) => (preparing(query.state.data) ? PREPARING_POLL_MS : false) });
}

/** Several assets at once: the images a panel shows, loaded before its editor opens. */
export function useMediaAssets(ids: readonly number[]) {
  return useQueries({ queries: ids.map((id) => ({ ...mediaAssetQuery(id), retry: false })) });
}

export interface MediaChanges {
  credit?: string | null;
  licence?: MediaLicence | null;
  licenceExpiresOn?: string | null;
  alt?: Record<string, string>;
}

export function useUpdateMedia(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: MediaChanges) => api<MediaView>(`/media/${id}`, { method: 'PATCH', body: changes }),
    onSuccess: (asset) => {
      queryClient.setQueryData(mediaKey(id), asset);
      void queryClient.invalidateQueries({ queryKey: mediaListKey });
    },
  });
}

export function useDeleteMedia() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/media/${id}`, { method: 'DELETE' }),
    onSuccess: (_nothing, id) => {
      queryClient.removeQueries({ queryKey: mediaKey(id) });
      void queryClient.invalidateQueries({ queryKey: mediaListKey });
    },
  });
}

/** The SPDX identifiers the server accepts as a licence, in the order it suggests them; the list changes only with a server update. */
export function useLicenceIds() {
  return useQuery({ queryKey: ['media-licences'], queryFn: () => api<LicenceIdsView>('/media/licences'), staleTime: Infinity });
}

/** Undo of an image's delete: the server brings it back as it was. */
export function useRestoreMedia() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<MediaView>(`/media/${id}/restore`, { method: 'POST' }),
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
    mutationFn: () => api<RenditionStatus>(`/media/${id}/renditions/retry`, { method: 'POST' }),
    onSuccess: (renditionStatus) => {
      queryClient.setQueryData<MediaView>(mediaKey(id), (asset) => (asset ? { ...asset, renditionStatus } : asset));
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

/** One multipart POST through XMLHttpRequest, the one browser API that reports upload progress. */
function postFile(file: File, onProgress: (fraction: number) => void, venueId?: number): Promise<{ status: number; body: unknown }> {
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', '/api/media');
    for (const [name, value] of Object.entries({ Accept: 'application/json', ...authorizationHeader() })) request.setRequestHeader(name, value);
    request.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    request.onload = () => resolve({ status: request.status, body: parseBody(request.responseText) });
    request.onerror = () => reject(new ApiError(NETWORK_FAILURE, { message: 'network' }));
    const form = new FormData();
    if (venueId !== undefined) form.append('venueId', String(venueId));
    form.append('file', file, file.name);
    request.send(form);
  });
}

/** Uploads one file to a venue (the uploader's only one when not named); a 401 gets one retry after a refresh, as every other API call does. */
export async function uploadMediaFile(file: File, onProgress: (fraction: number) => void, venueId?: number): Promise<MediaView> {
  let answer = await postFile(file, onProgress, venueId);
  if (answer.status === 401 && (await refreshSession())) answer = await postFile(file, onProgress, venueId);
  const { status, body } = answer;
  if (status >= 200 && status < 300) {
    const created = Array.isArray(body) ? (body as MediaView[]) : [body as MediaView];
    return created[0]!;
  }
  const error = body && typeof body === 'object' && 'message' in body ? (body as { message: string }) : { message: String(status) };
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
