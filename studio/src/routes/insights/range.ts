import type { InsightsFilter } from '../../api/insights';
import { positiveId } from '../../components/lists/list-search';

const isoDate = (value: string | null) => (value && /^\d{4}-\d{2}-\d{2}$/.test(value) ? value : undefined);

/**
 * Gallery and days from the URL; the first gallery until one is chosen. Days not chosen are left
 * to the server, which counts back from today on the venue's clock, not this browser's.
 */
export function readInsightsFilter(search: URLSearchParams, firstGalleryId: number | undefined): InsightsFilter | null {
  const galleryId = positiveId(search.get('galleryId')) ?? firstGalleryId;
  if (!galleryId) return null;
  const from = isoDate(search.get('from'));
  const to = isoDate(search.get('to'));
  return { galleryId, ...(from ? { from } : {}), ...(to ? { to } : {}) };
}

export const insightsFileName = ({ galleryId, from, to }: Required<InsightsFilter>) => `insights-gallery-${galleryId}-${from}_to_${to}.csv`;
