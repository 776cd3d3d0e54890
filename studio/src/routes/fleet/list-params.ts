import type { FleetParams } from '../../api/fleet';
import { KIOSK_ACCESS, LONG_PAGE_SIZE, type KioskAccess } from '@mantlepiece/shared';
import { oneOf, pageFrom, positiveId } from '../../components/lists/list-search';

/** What the Fleet shows unless asked otherwise: the kiosks that still play, not those revoked. */
export const DEFAULT_ACCESS: KioskAccess = 'active';
const ALL = 'all';
export const ACCESS_CHOICES = [...KIOSK_ACCESS, ALL] as const;

export const readFleetParams = (search: URLSearchParams): FleetParams => ({
  page: pageFrom(search),
  pageSize: LONG_PAGE_SIZE,
  galleryId: positiveId(search.get('galleryId')),
  access: accessFrom(search.get('access')),
});

/** `?access=all` shows both; anything else unknown falls back to the active kiosks. */
function accessFrom(value: string | null): KioskAccess | undefined {
  const chosen = oneOf(value, ACCESS_CHOICES) ?? DEFAULT_ACCESS;
  return chosen === ALL ? undefined : chosen;
}

/** Rows in the server's order (by gallery), cut wherever the gallery changes, for a heading row per gallery. */
export function byGallery<K extends { gallery: { id: number; name: string } }>(kiosks: readonly K[]): { gallery: K['gallery']; kiosks: K[] }[] {
  const groups: { gallery: K['gallery']; kiosks: K[] }[] = [];
  for (const kiosk of kiosks) {
    const last = groups[groups.length - 1];
    if (last?.gallery.id === kiosk.gallery.id) last.kiosks.push(kiosk);
    else groups.push({ gallery: kiosk.gallery, kiosks: [kiosk] });
  }
  return groups;
}
