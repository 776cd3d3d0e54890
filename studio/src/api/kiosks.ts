import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { PAGE_SIZE } from '@mantlepiece/shared';
import { answerOf, client, type Schema } from './client';
import { fleetKey } from './fleet';

export interface KioskListParams {
  page: number;
  pageSize: number;
  galleryId?: number;
}

export function useStation(id: number) {
  return useQuery({
    queryKey: ['settings', 'stations', 'one', id],
    queryFn: () => answerOf(client.GET('/api/stations/{id}', { params: { path: { id } } })),
  });
}

export function useKiosks(params: KioskListParams, enabled = true) {
  return useQuery({
    queryKey: [...fleetKey, 'list', params],
    enabled,
    queryFn: () => answerOf(client.GET('/api/kiosks', { params: { query: params } })),
    placeholderData: keepPreviousData,
  });
}

/**
 * The kiosks ever paired to a station, the active one first. The API filters by gallery; a
 * gallery has tens of kiosks at most, so the largest page of its kiosks holds every station's.
 */
export function useStationKiosks(station: Schema<'StationView'> | undefined) {
  const kiosks = useKiosks({ page: 1, pageSize: PAGE_SIZE.max, galleryId: station?.galleryId }, station !== undefined);
  return { ...kiosks, items: kiosks.data?.items.filter((kiosk) => kiosk.station.id === station?.id) ?? [] };
}

/** Binds the kiosk showing the code to the station; the code is what the technician read off the screen. */
export function usePairKiosk(stationId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (pairingCode: string) => answerOf(client.POST('/api/stations/{id}/pair', { params: { path: { id: stationId } }, body: { pairingCode } })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fleetKey }),
  });
}
