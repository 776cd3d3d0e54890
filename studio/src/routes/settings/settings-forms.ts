import { canonicalTimeZone, ORIENTATIONS, type Orientation } from '@mantlepiece/shared';
import type { TFunction } from 'i18next';
import type { SettingsCollection, SettingsFields, SettingsView } from '../../api/settings';
import { parseLocales, requiredProblem } from '../../components/forms/validation';

/** One input of a settings dialog. Every value is edited as text and converted when sent. */
export interface SettingsInput {
  name: string;
  kind: 'text' | 'number' | 'date' | 'orientation' | 'venue' | 'gallery' | 'timeZone' | 'language' | 'languages';
  required?: boolean;
  /** Hint key under settings.hints. */
  hint?: 'slug' | 'sourceLocale' | 'targetLocales' | 'mounting' | 'screen' | 'timeZone';
  unit?: string;
}

export type SettingsValues = Record<string, string>;

const positiveInteger = (t: TFunction, value: string) => (/^\d+$/.test(value.trim()) && Number(value) > 0 ? undefined : t('settings.problems.positiveInteger'));

export interface SettingsForm<C extends SettingsCollection> {
  inputs: SettingsInput[];
  empty: SettingsValues;
  valuesOf: (view: SettingsView<C>) => SettingsValues;
  problems: (t: TFunction, values: SettingsValues) => Record<string, string | undefined>;
  toFields: (values: SettingsValues) => SettingsFields<C>;
}

const venueForm: SettingsForm<'venues'> = {
  inputs: [
    { name: 'name', kind: 'text', required: true },
    { name: 'slug', kind: 'text', required: true, hint: 'slug' },
    { name: 'sourceLocale', kind: 'language', required: true, hint: 'sourceLocale' },
    { name: 'targetLocales', kind: 'languages', hint: 'targetLocales' },
    { name: 'timeZone', kind: 'timeZone', required: true, hint: 'timeZone' },
  ],
  // A new venue is most likely where the person setting it up is.
  empty: { name: '', slug: '', sourceLocale: 'en', targetLocales: '', timeZone: new Intl.DateTimeFormat().resolvedOptions().timeZone },
  valuesOf: (venue) => ({
    name: venue.name, slug: venue.slug, sourceLocale: venue.sourceLocale, targetLocales: venue.targetLocales.join(', '), timeZone: venue.timeZone,
  }),
  problems: (t, values) => {
    const source = parseLocales(values.sourceLocale ?? '');
    const targets = parseLocales(values.targetLocales ?? '');
    return {
      name: requiredProblem(t, values.name ?? ''),
      slug: /^[a-z0-9]+(?:-[a-z0-9]+)*$/.test(values.slug ?? '') ? undefined : t('settings.problems.slug'),
      sourceLocale: source.invalid || source.locales.length !== 1 ? t('validation.localeInvalid', { tag: values.sourceLocale ?? '' }) : undefined,
      targetLocales: targets.invalid
        ? t('validation.localeInvalid', { tag: targets.invalid })
        : targets.locales.includes(source.locales[0] ?? '') ? t('settings.problems.targetIsSource') : undefined,
      timeZone: canonicalTimeZone(values.timeZone ?? '') ? undefined : t('settings.problems.timeZone'),
    };
  },
  toFields: (values) => ({
    name: values.name!.trim(),
    slug: values.slug!.trim(),
    sourceLocale: parseLocales(values.sourceLocale!).locales[0]!,
    targetLocales: parseLocales(values.targetLocales ?? '').locales,
    timeZone: canonicalTimeZone(values.timeZone!)!,
  }),
};

const galleryForm: SettingsForm<'galleries'> = {
  inputs: [
    { name: 'venueId', kind: 'venue', required: true },
    { name: 'name', kind: 'text', required: true },
  ],
  empty: { venueId: '', name: '' },
  valuesOf: (gallery) => ({ venueId: String(gallery.venueId), name: gallery.name }),
  problems: (t, values) => ({ venueId: requiredProblem(t, values.venueId ?? ''), name: requiredProblem(t, values.name ?? '') }),
  toFields: (values) => ({ venueId: Number(values.venueId), name: values.name!.trim() }),
};

const stationForm: SettingsForm<'stations'> = {
  inputs: [
    { name: 'galleryId', kind: 'gallery', required: true },
    { name: 'name', kind: 'text', required: true },
    { name: 'screenWidthPx', kind: 'number', required: true, unit: 'px', hint: 'screen' },
    { name: 'screenHeightPx', kind: 'number', required: true, unit: 'px' },
    { name: 'orientation', kind: 'orientation', required: true },
    { name: 'mountingHeightMm', kind: 'number', required: true, unit: 'mm', hint: 'mounting' },
  ],
  empty: { galleryId: '', name: '', screenWidthPx: '1920', screenHeightPx: '1080', orientation: 'landscape', mountingHeightMm: '' },
  valuesOf: (station) => ({
    galleryId: String(station.galleryId),
    name: station.name,
    screenWidthPx: String(station.screenWidthPx),
    screenHeightPx: String(station.screenHeightPx),
    orientation: station.orientation,
    mountingHeightMm: String(station.mountingHeightMm),
  }),
  problems: (t, values) => ({
    galleryId: requiredProblem(t, values.galleryId ?? ''),
    name: requiredProblem(t, values.name ?? ''),
    screenWidthPx: positiveInteger(t, values.screenWidthPx ?? ''),
    screenHeightPx: positiveInteger(t, values.screenHeightPx ?? ''),
    orientation: ORIENTATIONS.includes(values.orientation as Orientation) ? undefined : t('validation.required'),
    mountingHeightMm: positiveInteger(t, values.mountingHeightMm ?? ''),
  }),
  toFields: (values) => ({
    galleryId: Number(values.galleryId),
    name: values.name!.trim(),
    screenWidthPx: Number(values.screenWidthPx),
    screenHeightPx: Number(values.screenHeightPx),
    orientation: values.orientation as Orientation,
    mountingHeightMm: Number(values.mountingHeightMm),
  }),
};

const exhibitForm: SettingsForm<'exhibits'> = {
  inputs: [
    { name: 'galleryId', kind: 'gallery', required: true },
    { name: 'name', kind: 'text', required: true },
    { name: 'plannedStart', kind: 'date' },
    { name: 'plannedEnd', kind: 'date' },
  ],
  empty: { galleryId: '', name: '', plannedStart: '', plannedEnd: '' },
  valuesOf: (exhibit) => ({ galleryId: String(exhibit.galleryId), name: exhibit.name, plannedStart: exhibit.plannedStart ?? '', plannedEnd: exhibit.plannedEnd ?? '' }),
  problems: (t, values) => ({
    galleryId: requiredProblem(t, values.galleryId ?? ''),
    name: requiredProblem(t, values.name ?? ''),
    plannedEnd: values.plannedStart && values.plannedEnd && values.plannedEnd < values.plannedStart ? t('settings.problems.endBeforeStart') : undefined,
  }),
  toFields: (values) => ({ galleryId: Number(values.galleryId), name: values.name!.trim(), plannedStart: values.plannedStart || null, plannedEnd: values.plannedEnd || null }),
};

export const SETTINGS_FORMS: { [C in SettingsCollection]: SettingsForm<C> } = {
  venues: venueForm,
  galleries: galleryForm,
  stations: stationForm,
  exhibits: exhibitForm,
};
