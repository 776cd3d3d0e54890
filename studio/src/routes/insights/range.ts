import type { InsightsFilter } from '../../api/insights';
import { positiveId } from '../../components/lists/list-search';

const DAY_MS = 86_400_000;
/** The days shown when none are chosen: the last 30, today included (the server's default too). */
export const DEFAULT_DAYS = 30;

const isoDate = (value: string | null) => (value && /^\d{4}-\d{2}-\d{2}$/.test(value) ? value : undefined);
const dayOf = (moment: Date) => moment.toISOString().slice(0, 10);

/** Gallery and days from the URL; the first gallery and the last 30 days until chosen. */
export function readInsightsFilter(search: URLSearchParams, today: Date, firstGalleryId: number | undefined): InsightsFilter | null {
  const galleryId = positiveId(search.get('galleryId')) ?? firstGalleryId;
  if (!galleryId) return null;
  const to = isoDate(search.get('to')) ?? dayOf(today);
  const from = isoDate(search.get('from')) ?? dayOf(new Date(Date.parse(`${to}T00:00:00Z`) - (DEFAULT_DAYS - 1) * DAY_MS));
  return { galleryId, from, to };
}

export const insightsFileName = ({ galleryId, from, to }: InsightsFilter) => `insights-gallery-${galleryId}-${from}_to_${to}.csv`;
