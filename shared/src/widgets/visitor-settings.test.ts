import { describe, expect, it } from 'vitest';
import { WIDGET_LOCALES } from '../i18n/index.js';
import { WIDGET_TYPES, widgetJsonSchema } from './registry.js';
import { visitorSettingName, visitorSettingsOf } from './visitor-settings.js';

describe('settings a visitor moves on a kiosk', () => {
  it('are settings of their widget, each named in every visitor language', () => {
    for (const type of WIDGET_TYPES) {
      const properties = Object.keys((widgetJsonSchema(type).properties ?? {}) as object);
      for (const setting of visitorSettingsOf(type)) {
        expect(properties, `${type} has no setting ${setting}`).toContain(setting);
        for (const locale of WIDGET_LOCALES) expect(visitorSettingName(type, setting, locale), `${type}.${setting} in ${locale}`).toMatch(/\p{L}{2}/u);
      }
    }
  });

  it('are the slope’s tilt, the sea floor’s age and model, and the slab’s length and plate’s age; the convection cell is only watched', () => {
    expect(Object.fromEntries(WIDGET_TYPES.map((type) => [type, visitorSettingsOf(type)]))).toEqual({
      'slope-force': ['angleDeg'],
      'convection-cell': [],
      'sea-floor-depth': ['ageMyr', 'model'],
      'plate-forces': ['slabLengthKm', 'ageMyr'],
    });
    expect(visitorSettingName('plate-forces', 'slabLengthKm', 'fr')).toBe('Longueur de la plaque plongeante');
    expect(visitorSettingName('plate-forces', 'gravityMs2', 'en')).toBeUndefined();
    expect(visitorSettingName('no-such-widget', 'ageMyr', 'en')).toBeUndefined();
  });
});
