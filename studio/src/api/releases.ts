import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { PAGE_SIZE, type ReleaseState } from '@mantlepiece/shared';
import { answerOf, client, type Schema } from './client';

export interface ReleaseListParams {
  page: number;
  pageSize: number;
}

/** How often a page asks after a build in progress; builds take seconds, not minutes. */
const BUILD_POLL_MS = 1000;

const releasesKey = ['releases'] as const;
const galleryReleasesKey = (galleryId: number) => [...releasesKey, 'gallery', galleryId] as const;
const releaseKey = (id: number) => [...releasesKey, 'one', id] as const;

export const isFinished = (state: ReleaseState) => state !== 'building';

/** A gallery's releases, newest first; the list keeps asking while one of them is building. */
export function useGalleryReleases(galleryId: number | undefined, { page, pageSize }: ReleaseListParams) {
  return useQuery({
    queryKey: [...galleryReleasesKey(galleryId ?? 0), { page, pageSize }],
    queryFn: () => answerOf(client.GET('/api/galleries/{id}/releases', { params: { path: { id: galleryId! }, query: { page, pageSize } } })),
    enabled: galleryId !== undefined,
    placeholderData: keepPreviousData,
    refetchInterval: (query) => (query.state.data?.items.some((release) => !isFinished(release.state)) ? BUILD_POLL_MS : false),
  });
}

/** One release; followed every second while it builds, so its progress bar and phase move. */
export function useRelease(id: number | undefined) {
  const queryClient = useQueryClient();
  return useQuery({
    queryKey: releaseKey(id ?? 0),
    enabled: id !== undefined,
    queryFn: async () => {
      const release = await answerOf(client.GET('/api/releases/{id}', { params: { path: { id: id! } } }));
      if (isFinished(release.state)) void queryClient.invalidateQueries({ queryKey: galleryReleasesKey(release.galleryId) });
      return release;
    },
    refetchInterval: (query) => (query.state.status === 'error' || (query.state.data && isFinished(query.state.data.state)) ? false : BUILD_POLL_MS),
  });
}

/** Both sides are immutable once built, so a comparison never goes stale. */
export function useReleaseComparison(a: number | undefined, b: number | undefined) {
  return useQuery({
    queryKey: [...releasesKey, 'compare', a, b],
    queryFn: () => answerOf(client.GET('/api/releases/compare', { params: { query: { a: a!, b: b! } } })),
    enabled: a !== undefined && b !== undefined && a !== b,
    staleTime: Number.POSITIVE_INFINITY,
  });
}

/**
 * What a build asks for: no revisions named, the server takes the latest approved revision of
 * each story of the gallery; stories with missing translations left out or shown in the source language.
 */
export type ReleaseRequest = Schema<'RequestReleaseDto'>;

/** What a build with these choices would carry and miss, and whether it equals the Live release. */
export function useReleasePreview(galleryId: number, request: ReleaseRequest, enabled: boolean) {
  return useQuery({
    queryKey: [...galleryReleasesKey(galleryId), 'preview', request],
    // A list in the query goes as one comma-separated parameter, as the client writes any array.
    queryFn: () => answerOf(client.GET('/api/galleries/{id}/releases/preview', { params: { path: { id: galleryId }, query: request } })),
    enabled,
    placeholderData: keepPreviousData,
  });
}

export function useBuildRelease(galleryId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: ReleaseRequest) => answerOf(client.POST('/api/galleries/{id}/releases', { params: { path: { id: galleryId } }, body: request })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: galleryReleasesKey(galleryId) }),
  });
}

/** Publishing an earlier Ready or Superseded release is the rollback. */
export function usePublishRelease() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => answerOf(client.POST('/api/releases/{id}/publish', { params: { path: { id } } })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: releasesKey }),
  });
}

/** A story the gallery could release, with its approved revisions, newest first. */
export interface ReleaseCandidate {
  story: Schema<'StoryView'>;
  approved: Schema<'RevisionSummary'>[];
}

/** A gallery holds a handful of exhibits and tens of stories: the largest page of each is all of them. */
const WHOLE_GALLERY = { page: 1, pageSize: PAGE_SIZE.max };

async function releaseCandidates(galleryId: number): Promise<ReleaseCandidate[]> {
  const exhibits = await answerOf(client.GET('/api/exhibits', { params: { query: { ...WHOLE_GALLERY, galleryId, sort: 'name' } } }));
  const stories = (
    await Promise.all(exhibits.items.map((exhibit) => answerOf(client.GET('/api/stories', { params: { query: { ...WHOLE_GALLERY, exhibitId: exhibit.id, sort: 'title' } } }))))
  ).flatMap((page) => page.items).filter((story) => story.state !== 'retired');
  return Promise.all(stories.map(async (story) => {
    const revisions = await answerOf(client.GET('/api/stories/{id}/revisions', { params: { path: { id: story.id } } }));
    return { story, approved: revisions.filter((revision) => revision.state === 'approved').sort((a, b) => b.number - a.number) };
  }));
}

/** What the build dialog offers when a technician chooses revisions by hand. */
export function useReleaseCandidates(galleryId: number, enabled: boolean) {
  return useQuery({ queryKey: [...releasesKey, 'candidates', galleryId], queryFn: () => releaseCandidates(galleryId), enabled });
}

/**
 * The gallery's Live release. The list has no state filter, so this reads the largest page of the
 * newest releases: the Live one is among them unless someone rolled back further than a page.
 */
export function useLiveRelease(galleryId: number | undefined) {
  const recent = useGalleryReleases(galleryId, WHOLE_GALLERY);
  return { ...recent, data: recent.data?.items.find((release) => release.state === 'live') };
}
