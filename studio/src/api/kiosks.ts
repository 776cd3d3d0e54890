import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { KioskView, Page, StationView } from '@mantlepiece/shared';
import { api } from './client';

export interface KioskListParams {
  page: number;
  pageSize: number;
  galleryId?: number;
}

const kiosksKey = ['kiosks'] as const;

export function useStation(id: number) {
  return useQuery({ queryKey: ['settings', 'stations', 'one', id], queryFn: () => api<StationView>(`/stations/${id}`) });
}

export function useKiosks(params: KioskListParams, enabled = true) {
  return useQuery({
    queryKey: [...kiosksKey, params],
    enabled,
    queryFn: () => api<Page<KioskView>>('/kiosks', { query: { ...params } }),
    placeholderData: keepPreviousData,
  });
}

/**
 * The kiosks ever paired to a station, the active one first. The API filters by gallery; a
 * gallery has tens of kiosks at most, so one page of its kiosks holds every station's.
 */
export function useStationKiosks(station: StationView | undefined) {
  const kiosks = useKiosks({ page: 1, pageSize: 100, galleryId: station?.galleryId }, station !== undefined);
  return { ...kiosks, items: kiosks.data?.items.filter((kiosk) => kiosk.station.id === station?.id) ?? [] };
}

/** Binds the kiosk showing the code to the station; the code is what the technician read off the screen. */
export function usePairKiosk(stationId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (pairingCode: string) => api<{ kioskId: number }>(`/stations/${stationId}/pair`, { method: 'POST', body: { pairingCode } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: kiosksKey }),
  });
}

export function useRevokeKiosk() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (kioskId: number) => api<unknown>(`/kiosks/${kioskId}/revoke`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: kiosksKey }),
  });
}
