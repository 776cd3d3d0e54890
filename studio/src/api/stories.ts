import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Audience, Page, PanelDocJSON, PanelView, PreflightEntry, StoryDetailView, StoryPage, StoryState, StoryView } from '@mantlepiece/shared';
import { useVenueFilter } from '../app/current-venue';
import { api } from './client';
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
    queryFn: () => api<StoryPage>('/stories', { query: { ...params, ...venue } }),
    placeholderData: keepPreviousData,
  });
}

export function useStory(id: number) {
  return useQuery({
    queryKey: storyKey(id),
    queryFn: () => api<StoryDetailView>(`/stories/${id}`),
    // The editor owns the panels once open; a background refetch must not pull text out from under it.
    staleTime: Infinity,
  });
}

/** Preflight of the draft as saved; every save of the story's panels asks for it again. */
export function useDraftPreflight(id: number, enabled: boolean) {
  return useQuery({
    queryKey: draftPreflightKey(id),
    queryFn: () => api<PreflightEntry[]>(`/stories/${id}/preflight`),
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
    mutationFn: (story: StoryFields) => api<StoryView>('/stories', { method: 'POST', body: { ...story, ...venue } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: storiesKey }),
  });
}

/** Writes the story header and folds the answer into the open story without touching its panels. */
export function useUpdateStory(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: Partial<StoryFields>) => api<StoryView>(`/stories/${id}`, { method: 'PATCH', body: changes }),
    onSuccess: (story) => {
      queryClient.setQueryData<StoryDetailView>(storyKey(id), (current) => (current ? { ...current, ...story, panels: current.panels } : current));
      void queryClient.invalidateQueries({ queryKey: storiesKey });
    },
  });
}

function setPanels(queryClient: ReturnType<typeof useQueryClient>, storyId: number, update: (panels: PanelView[]) => PanelView[]) {
  queryClient.setQueryData<StoryDetailView>(storyKey(storyId), (current) => {
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
    mutationFn: (panel: { doc?: PanelDocJSON; position?: number; wordBudget?: number }) =>
      api<PanelView>(`/stories/${storyId}/panels`, { method: 'POST', body: panel }),
    // The server may have moved later panels along; their positions come back with the next reorder or load.
    onSuccess: (panel) => setPanels(queryClient, storyId, (panels) => [...panels.filter((p) => p.id !== panel.id), panel]),
  });
}

export function useReorderPanels(storyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (panelIds: number[]) => api<PanelView[]>(`/stories/${storyId}/panels/reorder`, { method: 'POST', body: { panelIds } }),
    onMutate: (panelIds) => {
      const before = queryClient.getQueryData<StoryDetailView>(storyKey(storyId));
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
    mutationFn: (panelId: number) => api<void>(`/panels/${panelId}`, { method: 'DELETE' }),
    onSuccess: (_nothing, panelId) => setPanels(queryClient, storyId, (panels) => panels.filter((p) => p.id !== panelId)),
  });
}

/** Undo of a panel's delete: the server puts it back in its place, so the story is read again for everyone's positions. */
export function useRestorePanel(storyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (panelId: number) => api<PanelView>(`/panels/${panelId}/restore`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: storyKey(storyId) }),
  });
}

export function useUpdatePanelBudget(storyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ panelId, wordBudget }: { panelId: number; wordBudget: number }) =>
      api<PanelView>(`/panels/${panelId}`, { method: 'PATCH', body: { wordBudget } }),
    onSuccess: (_panel, { panelId, wordBudget }) => setPanels(queryClient, storyId, (panels) => panels.map((p) => (p.id === panelId ? { ...p, wordBudget } : p))),
  });
}

/** One save of a panel's document; the autosave decides when, and what a 409 or 422 means. */
export const savePanelDoc = (panelId: number, doc: PanelDocJSON, version: number) =>
  api<{ version: number }>(`/panels/${panelId}`, { method: 'PUT', body: { doc, version } });

/** Keeps the cached story in step with what the autosave wrote, so switching panels shows the saved text. */
export function useRememberSavedPanel(storyId: number) {
  const queryClient = useQueryClient();
  return (panelId: number, doc: PanelDocJSON, version: number) => {
    queryClient.setQueryData<StoryDetailView>(storyKey(storyId), (current) =>
      current ? { ...current, panels: current.panels.map((p) => (p.id === panelId ? { ...p, doc, version } : p)) } : current,
    );
    void queryClient.invalidateQueries({ queryKey: draftPreflightKey(storyId) });
  };
}
