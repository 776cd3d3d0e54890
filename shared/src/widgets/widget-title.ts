import { widgetStrings, type WidgetStrings } from '../i18n/index.js';
import { isWidgetType, type WidgetType } from './registry.js';

/** Where each widget's visitor-facing words live in the widget strings. */
const STRINGS_OF = {
  'slope-force': 'slopeForce',
  'convection-cell': 'convectionCell',
  'sea-floor-depth': 'seaFloorDepth',
  'plate-forces': 'plateForces',
} as const satisfies Record<WidgetType, keyof WidgetStrings>;

/** A widget's name in a visitor language; an unknown type shows as itself so the problem stays visible. */
export function widgetTitle(widgetType: string, locale: string): string {
  return isWidgetType(widgetType) ? widgetStrings(locale)[STRINGS_OF[widgetType]].title : widgetType;
}
