import { describe, expect, it } from 'vitest';
import { i18next } from '../../app/i18n';
import { SETTINGS_FORMS } from './settings-forms';

const t = i18next.getFixedT('en');

describe('settings forms', () => {
  it('canonicalises venue locales as BCP 47 tags (Intl.getCanonicalLocales) and refuses one that is not', () => {
    const form = SETTINGS_FORMS.venues;
    const values = { name: 'Basalt Point Earth Science Centre', slug: 'basalt-point', sourceLocale: 'EN', targetLocales: 'fr, es-mx', timeZone: 'UTC' };
    expect(Object.values(form.problems(t, values)).filter(Boolean)).toEqual([]);
    expect(form.toFields(values)).toEqual({ name: 'Basalt Point Earth Science Centre', slug: 'basalt-point', sourceLocale: 'en', targetLocales: ['fr', 'es-MX'], timeZone: 'UTC' });
    expect(form.problems(t, { ...values, targetLocales: 'fr, not a tag!' }).targetLocales).toMatch(/BCP 47/);
  });

  it('sends a venue time zone as Intl spells it and refuses one Intl does not know', () => {
    const values = { name: 'x', slug: 'x', sourceLocale: 'en', targetLocales: '', timeZone: 'pacific/auckland' };
    expect(SETTINGS_FORMS.venues.toFields(values).timeZone).toBe('Pacific/Auckland');
    expect(SETTINGS_FORMS.venues.problems(t, { ...values, timeZone: 'Mars/Olympus_Mons' }).timeZone).toBe(t('settings.problems.timeZone'));
  });

  it('does not let a venue translate into its own source language', () => {
    expect(SETTINGS_FORMS.venues.problems(t, { name: 'x', slug: 'x', sourceLocale: 'en', targetLocales: 'fr, en' }).targetLocales).toBeDefined();
  });

  it('wants whole positive numbers for a station’s screen and mounting height', () => {
    const problems = SETTINGS_FORMS.stations.problems(t, { galleryId: '1', name: 'Ridge wall', screenWidthPx: '1920', screenHeightPx: '0', orientation: 'landscape', mountingHeightMm: '1.5' });
    expect(problems.screenHeightPx).toBeDefined();
    expect(problems.mountingHeightMm).toBeDefined();
    expect(problems.screenWidthPx).toBeUndefined();
  });

  it('refuses an exhibit that ends before it starts', () => {
    expect(SETTINGS_FORMS.exhibits.problems(t, { galleryId: '1', name: 'Moving plates', plannedStart: '2026-05-01', plannedEnd: '2026-04-01' }).plannedEnd).toBeDefined();
  });
});
