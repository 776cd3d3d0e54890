import type { KioskSwitch } from '@mantlepiece/shared/kiosk';

/** What one visitor chose; the idle reset puts it all back for the next one. */
export interface VisitorSettings {
  locale: string;
  largeText: boolean;
  highContrast: boolean;
  /** Undefined: follow the screen's own prefers-reduced-motion setting. */
  reducedMotion: boolean | undefined;
}

export const initialSettings = (sourceLocale: string): VisitorSettings => ({ locale: sourceLocale, largeText: false, highContrast: false, reducedMotion: undefined });

export const SWITCH_SETTING = {
  large_text: 'largeText',
  high_contrast: 'highContrast',
  reduced_motion: 'reducedMotion',
} as const satisfies Record<KioskSwitch, keyof VisitorSettings>;
