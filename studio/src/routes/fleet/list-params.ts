import type { FleetParams } from '../../api/fleet';
import { pageFrom, positiveId } from '../../components/lists/list-search';

export const PAGE_SIZE = 50;

export const readFleetParams = (search: URLSearchParams): FleetParams => ({
  page: pageFrom(search),
  pageSize: PAGE_SIZE,
  galleryId: positiveId(search.get('galleryId')),
});

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
