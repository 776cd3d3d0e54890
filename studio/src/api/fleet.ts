import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { KioskAccess } from '@mantlepiece/shared';
import { answerOf, client } from './client';

/** Kiosks report every 30 s; looking twice as often keeps a state change on screen within a heartbeat. */
export const FLEET_REFRESH_MS = 15_000;

export interface FleetParams {
  page: number;
  pageSize: number;
  galleryId?: number;
  /** Left out: active and revoked kiosks both. */
  access?: KioskAccess;
}

/** Every kiosk query, the Fleet's and a station's, so a revoke or a pairing refreshes them all. */
export const fleetKey = ['fleet'] as const;

export function useFleet(params: FleetParams) {
  return useQuery({
    queryKey: [...fleetKey, 'list', params],
    queryFn: () => answerOf(client.GET('/api/kiosks', { params: { query: params } })),
    placeholderData: keepPreviousData,
    refetchInterval: FLEET_REFRESH_MS,
  });
}

export function useFleetKiosk(id: number, params: { page: number; pageSize: number }) {
  return useQuery({
    queryKey: [...fleetKey, 'kiosk', id, params],
    queryFn: () => answerOf(client.GET('/api/kiosks/{id}', { params: { path: { id }, query: params } })),
    placeholderData: keepPreviousData,
    refetchInterval: FLEET_REFRESH_MS,
  });
}

/** Ends the kiosk's access; the server refuses its next request. */
export function useRevokeKiosk() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => answerOf(client.POST('/api/kiosks/{id}/revoke', { params: { path: { id } } })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fleetKey }),
  });
}
