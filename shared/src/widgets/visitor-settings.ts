import { widgetStrings, type WidgetStrings } from '../i18n/index.js';
import { isWidgetType, type WidgetType } from './registry.js';

/**
 * The settings a visitor moves on a kiosk, per widget, each with the name the kiosk gives it: what
 * Insights counts touches of (in the studio's language) and what the demo's invented visits touch.
 * The convection cell is watched, not set: a visitor plays, pauses and steps it.
 */
const VISITOR_SETTINGS: Readonly<Record<WidgetType, Readonly<Record<string, (strings: WidgetStrings) => string>>>> = {
  'slope-force': { angleDeg: (strings) => strings.slopeForce.angleLabel },
  'convection-cell': {},
  'sea-floor-depth': { ageMyr: (strings) => strings.seaFloorDepth.ageLabel, model: (strings) => strings.seaFloorDepth.modelLabel },
  'plate-forces': { slabLengthKm: (strings) => strings.plateForces.slabLengthLabel, ageMyr: (strings) => strings.plateForces.ageLabel },
};

export const visitorSettingsOf = (widgetType: string): string[] => (isWidgetType(widgetType) ? Object.keys(VISITOR_SETTINGS[widgetType]) : []);

/** A setting's name as visitors read it on the kiosk, in this language; undefined for one a visitor cannot move. */
export function visitorSettingName(widgetType: string, setting: string, locale: string): string | undefined {
  if (!isWidgetType(widgetType)) return undefined;
  const settings = VISITOR_SETTINGS[widgetType];
  return Object.hasOwn(settings, setting) ? settings[setting]!(widgetStrings(locale)) : undefined;
}
