import type { MediaView } from '@mantlepiece/shared';

/** Whether the licence runs out within `days` of `today` (dates as YYYY-MM-DD, compared as calendar days). */
export function licenceExpiresWithin(asset: Pick<MediaView, 'licenceExpiresOn'>, days: number, today: string): boolean {
  if (!asset.licenceExpiresOn) return false;
  const left = (Date.parse(`${asset.licenceExpiresOn}T00:00:00Z`) - Date.parse(`${today}T00:00:00Z`)) / 86_400_000;
  return left <= days;
}

export const todayIso = () => new Date().toISOString().slice(0, 10);

export function formatBytes(bytes: number, locale: string): string {
  const units = ['byte', 'kilobyte', 'megabyte', 'gigabyte'] as const;
  let value = bytes;
  let unit = 0;
  while (value >= 1000 && unit < units.length - 1) {
    value /= 1000;
    unit++;
  }
  return new Intl.NumberFormat(locale, { style: 'unit', unit: units[unit], unitDisplay: 'short', maximumFractionDigits: unit === 0 ? 0 : 1 }).format(value);
}
