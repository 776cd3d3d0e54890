import { formatQuantity } from '../../i18n/index.js';

/** A force in the unit a visitor reads most easily: N below a thousand, then kN, then MN. */
export function formatForce(newtons: number, locale: string): string {
  const magnitude = Math.abs(newtons);
  if (magnitude >= 1e6) return formatQuantity(newtons / 1e6, 'MN', locale);
  if (magnitude >= 1e3) return formatQuantity(newtons / 1e3, 'kN', locale);
  return formatQuantity(newtons, 'N', locale);
}

export function formatMass(kilograms: number, locale: string): string {
  return kilograms >= 1e3 ? formatQuantity(kilograms / 1e3, 't', locale) : formatQuantity(kilograms, 'kg', locale);
}

export const formatAngle = (degrees: number, locale: string): string => formatQuantity(degrees, '°', locale, 3);

export const formatAcceleration = (ms2: number, locale: string): string => formatQuantity(ms2, 'm/s²', locale);
