import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Audience, PanelDocJSON, StoryState } from '@mantlepiece/shared';
import { useVenueFilter } from '../app/current-venue';
import { answerOf, client, type Schema } from './client';
import type { StorySort } from '@mantlepiece/shared';

export interface StoryListParams {
  page: number;
  pageSize: number;
  q?: string;
  state?: StoryState;
  exhibitId?: number;
  audience?: Audience;
  sort?: StorySort;
}

const storiesKey = ['stories'] as const;
export const storyKey = (id: number) => ['story', id] as const;
const draftPreflightKey = (id: number) => ['story', id, 'preflight'] as const;

export function useStories(params: StoryListParams) {
  const venue = useVenueFilter();
  return useQuery({
    queryKey: [...storiesKey, params, venue],
    queryFn: () => answerOf(client.GET('/api/stories', { params: { query: { ...params, ...venue } } })),
    placeholderData: keepPreviousData,
  });
}

export function useStory(id: number) {
  return useQuery({
    queryKey: storyKey(id),
    queryFn: () => answerOf(client.GET('/api/stories/{id}', { params: { path: { id } } })),
    // The editor owns the panels once open; a background refetch must not pull text out from under it.
    staleTime: Infinity,
  });
}

/** Preflight of the draft as saved; every save of the story's panels asks for it again. */
export function useDraftPreflight(id: number, enabled: boolean) {
  return useQuery({
    queryKey: draftPreflightKey(id),
    queryFn: () => answerOf(client.GET('/api/stories/{id}/preflight', { params: { path: { id } } })),
    enabled,
  });
}

export interface StoryFields {
  title: string;
  exhibitId?: number | null;
  audience?: Audience;
  sourceLocale?: string;
}

/** A new story belongs to the studio's current venue. */
export function useCreateStory() {
  const queryClient = useQueryClient();
  const venue = useVenueFilter();
  return useMutation({
    mutationFn: (story: StoryFields) => answerOf(client.POST('/api/stories', { body: { ...story, ...venue } })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: storiesKey }),
  });
}

/** Writes the story header and folds the answer into the open story without touching its panels. */
export function useUpdateStory(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: Partial<StoryFields>) => answerOf(client.PATCH('/api/stories/{id}', { params: { path: { id } }, body: changes })),
    onSuccess: (story) => {
      queryClient.setQueryData<Schema<'StoryDetailView'>>(storyKey(id), (current) => (current ? { ...current, ...story, panels: current.panels } : current));
      void queryClient.invalidateQueries({ queryKey: storiesKey });
    },
  });
}

function setPanels(queryClient: ReturnType<typeof useQueryClient>, storyId: number, update: (panels: Schema<'PanelView'>[]) => Schema<'PanelView'>[]) {
  queryClient.setQueryData<Schema<'StoryDetailView'>>(storyKey(storyId), (current) => {
    if (!current) return current;
    const panels = update(current.panels).sort((a, b) => a.position - b.position);
    return { ...current, panels, panelCount: panels.length };
  });
  void queryClient.invalidateQueries({ queryKey: storiesKey });
  void queryClient.invalidateQueries({ queryKey: draftPreflightKey(storyId) });
}

export function useCreatePanel(storyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (panel: Schema<'CreatePanelDto'>) => answerOf(client.POST('/api/stories/{storyId}/panels', { params: { path: { storyId } }, body: panel })),
    // The server may have moved later panels along; their positions come back with the next reorder or load.
    onSuccess: (panel) => setPanels(queryClient, storyId, (panels) => [...panels.filter((p) => p.id !== panel.id), panel]),
  });
}

export function useReorderPanels(storyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (panelIds: number[]) => answerOf(client.POST('/api/stories/{storyId}/panels/reorder', { params: { path: { storyId } }, body: { panelIds } })),
    onMutate: (panelIds) => {
      const before = queryClient.getQueryData<Schema<'StoryDetailView'>>(storyKey(storyId));
      setPanels(queryClient, storyId, (panels) => panelIds.map((id, position) => ({ ...panels.find((p) => p.id === id)!, position })));
      return { before };
    },
    onError: (_error, _ids, context) => {
      if (context?.before) queryClient.setQueryData(storyKey(storyId), context.before);
    },
    // Only positions change on the server's side; versions and docs stay with the editor's copy.
    onSuccess: (ordered) => setPanels(queryClient, storyId, (panels) => panels.map((p) => ({ ...p, position: ordered.find((o) => o.id === p.id)?.position ?? p.position }))),
  });
}

export function useDeletePanel(storyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (panelId: number) => answerOf(client.DELETE('/api/panels/{id}', { params: { path: { id: panelId } } })),
    onSuccess: (_nothing, panelId) => setPanels(queryClient, storyId, (panels) => panels.filter((p) => p.id !== panelId)),
  });
}

/** Undo of a panel's delete: the server puts it back in its place, so the story is read again for everyone's positions. */
export function useRestorePanel(storyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (panelId: number) => answerOf(client.POST('/api/panels/{id}/restore', { params: { path: { id: panelId } } })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: storyKey(storyId) }),
  });
}

export function useUpdatePanelBudget(storyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ panelId, wordBudget }: { panelId: number; wordBudget: number }) =>
      answerOf(client.PATCH('/api/panels/{id}', { params: { path: { id: panelId } }, body: { wordBudget } })),
    onSuccess: (_panel, { panelId, wordBudget }) => setPanels(queryClient, storyId, (panels) => panels.map((p) => (p.id === panelId ? { ...p, wordBudget } : p))),
  });
}

/** One save of a panel's document; the autosave decides when, and what a 409 or 422 means. */
export const savePanelDoc = (panelId: number, doc: PanelDocJSON, version: number) =>
  answerOf(client.PUT('/api/panels/{id}', { params: { path: { id: panelId } }, body: { doc, version } }));

/** Keeps the cached story in step with what the autosave wrote, so switching panels shows the saved text. */
export function useRememberSavedPanel(storyId: number) {
  const queryClient = useQueryClient();
  return (panelId: number, doc: PanelDocJSON, version: number) => {
    queryClient.setQueryData<Schema<'StoryDetailView'>>(storyKey(storyId), (current) =>
      current ? { ...current, panels: current.panels.map((p) => (p.id === panelId ? { ...p, doc, version } : p)) } : current,
    );
    void queryClient.invalidateQueries({ queryKey: draftPreflightKey(storyId) });
  };
}
