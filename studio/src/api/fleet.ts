import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { FleetKioskDetail, FleetKioskView, FleetPage, KioskAccess } from '@mantlepiece/shared';
import { api } from './client';

/** Kiosks report every 30 s; looking twice as often keeps a state change on screen within a heartbeat. */
export const FLEET_REFRESH_MS = 15_000;

export interface FleetParams {
  page: number;
  pageSize: number;
  galleryId?: number;
  /** Left out: active and revoked kiosks both. */
  access?: KioskAccess;
}

const fleetKey = ['fleet'] as const;

export function useFleet(params: FleetParams) {
  return useQuery({
    queryKey: [...fleetKey, 'list', params],
    queryFn: () => api<FleetPage>('/kiosks', { query: { ...params } }),
    placeholderData: keepPreviousData,
    refetchInterval: FLEET_REFRESH_MS,
  });
}

export function useFleetKiosk(id: number, params: { page: number; pageSize: number }) {
  return useQuery({
    queryKey: [...fleetKey, 'kiosk', id, params],
    queryFn: () => api<FleetKioskDetail>(`/kiosks/${id}`, { query: { ...params } }),
    placeholderData: keepPreviousData,
    refetchInterval: FLEET_REFRESH_MS,
  });
}

/** Ends the kiosk's access; the server refuses its next request. */
export function useRevokeKiosk() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<FleetKioskView>(`/kiosks/${id}/revoke`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fleetKey }),
  });
}
