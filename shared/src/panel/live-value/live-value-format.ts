import { formatQuantity } from '../../i18n/index.js';

/**
 * Unit symbols a live value may show after its number. A closed list so a document carries a
 * choice, not free text, and so translators never see units as words to translate.
 */
const LIVE_VALUE_UNITS = ['', '°', '%', 'N', 'kN', 'MN', 'N/m', 'kg', 't', 'm', 'km', 'm/s', 'm/s²', 'cm/yr', 'K', '°C', 'Pa', 'MPa', 'Pa·s', 'Myr', 'mW/m²'] as const;
export type LiveValueUnit = (typeof LIVE_VALUE_UNITS)[number];

export interface LiveValueFormat {
  /** Significant digits, 1–6: a caption rounds the way a label on the wall would. */
  digits: number;
  /** The unit the widget's output is already in; the number is shown as computed, never converted. */
  unit: LiveValueUnit;
}

export const DEFAULT_LIVE_VALUE_FORMAT: LiveValueFormat = { digits: 3, unit: '' };

export function isLiveValueFormat(value: unknown): value is LiveValueFormat {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  const keys = Object.keys(value);
  const { digits, unit } = value as Record<string, unknown>;
  return (
    keys.length === 2 &&
    Number.isInteger(digits) &&
    (digits as number) >= 1 &&
    (digits as number) <= 6 &&
    (LIVE_VALUE_UNITS as readonly unknown[]).includes(unit)
  );
}

export function assertLiveValueFormat(value: unknown): void {
  if (!isLiveValueFormat(value)) {
    throw new RangeError(`A live value's format is {digits: 1 to 6, unit: one of ${LIVE_VALUE_UNITS.map((unit) => JSON.stringify(unit)).join(', ')}}.`);
  }
}

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const superscript = (exponent: number) =>
  `${exponent < 0 ? '⁻' : ''}${String(Math.abs(exponent)).replace(/\d/g, (digit) => SUPERSCRIPT_DIGITS[Number(digit)] ?? digit)}`;

/** Beyond these a row of zeros is unreadable on a wall, so the value switches to powers of ten. */
const isExtreme = (value: number) => value !== 0 && (Math.abs(value) >= 1e7 || Math.abs(value) < 1e-3);

/** The number as a visitor reads it in their language, with the SI spacing the widgets use. */
export function formatLiveValue(value: number, format: LiveValueFormat, locale: string): string {
  if (!isExtreme(value)) return formatQuantity(value, format.unit, locale, format.digits);
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  const mantissa = formatQuantity(value / 10 ** exponent, '', locale, format.digits);
  const power = `${mantissa}\u00a0×\u00a010${superscript(exponent)}`;
  return format.unit === '' ? power : `${power}\u00a0${format.unit}`;
}
