import { describe, expect, it } from 'vitest';
import { WIDGET_LOCALES } from '../i18n/index.js';
import { WIDGET_TYPES, widgetJsonSchema } from './registry.js';
import { settingChoiceName, settingName } from './setting-names.js';

type Schema = { title?: string; type?: string; enum?: unknown[]; properties?: Record<string, Schema> };

/** Every param path of a widget's published JSON Schema, with its title and its choices. */
function settingsOf(schema: Schema, parent: string[] = []): { path: string[]; title?: string; choices: unknown[] }[] {
  return Object.entries(schema.properties ?? {}).flatMap(([name, child]) => [
    { path: [...parent, name], title: child.title, choices: child.enum ?? [] },
    ...(child.type === 'object' ? settingsOf(child, [...parent, name]) : []),
  ]);
}

describe('widget setting names', () => {
  it('names every setting and every named choice of every widget in every studio language', () => {
    for (const type of WIDGET_TYPES) {
      for (const setting of settingsOf(widgetJsonSchema(type) as Schema)) {
        for (const locale of WIDGET_LOCALES) {
          expect(settingName(type, setting.path, locale), `${type} ${setting.path.join('.')} in ${locale}`).toBeTruthy();
          for (const choice of setting.choices.filter((value) => typeof value === 'string')) {
            expect(settingChoiceName(type, setting.path, choice as string, locale), `${type} ${setting.path.join('.')}=${String(choice)} in ${locale}`).toBeTruthy();
          }
        }
      }
    }
  });

  it('names each setting in English as its JSON Schema title does, so the two cannot drift apart', () => {
    for (const type of WIDGET_TYPES) {
      for (const setting of settingsOf(widgetJsonSchema(type) as Schema)) {
        expect(settingName(type, setting.path, 'en'), `${type} ${setting.path.join('.')}`).toBe(setting.title);
      }
    }
  });

  it('follows the language asked for, by BCP 47 lookup, and knows no path a widget lacks', () => {
    expect(settingName('slope-force', ['massKg'], 'fr-CA')).toBe('Masse');
    expect(settingName('convection-cell', ['physical', 'viscosityPas'], 'es')).toBe('Viscosidad');
    expect(settingChoiceName('sea-floor-depth', ['model'], 'plate', 'ar')).toBe('نموذج الصفيحة');
    expect(settingName('slope-force', ['viscosityPas'], 'en')).toBeUndefined();
    expect(settingName('no-such-widget', ['massKg'], 'en')).toBeUndefined();
    expect(settingChoiceName('convection-cell', ['nx'], 32, 'en')).toBeUndefined();
  });
});
