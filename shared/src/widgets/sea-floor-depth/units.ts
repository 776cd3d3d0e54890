import { formatQuantity } from '../../i18n/index.js';

export const formatDepthKm = (metres: number, locale: string): string => formatQuantity(metres / 1000, 'km', locale, 3);
export const formatHeatFlow = (mWm2: number, locale: string): string => formatQuantity(mWm2, 'mW/m²', locale, 3);
export const formatThicknessKm = (km: number, locale: string): string => formatQuantity(km, 'km', locale, 3);
