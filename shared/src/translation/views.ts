import type { Can, TranslationCan } from '../auth/can.js';
import type { Page } from '../auth/views.js';
import type { PanelDocJSON } from '../panel/panel-json.js';
import type { LengthBudgetWarning } from './length-budget.js';
import type { Placeholder, UnitKind } from './translation-unit.js';
import type { LocaleCompleteness, UnitStatus } from './unit-status.js';

/** The views of issue 6 (translation) as the API sends them; studio and server both code against these. */

/** A row of the translator's worklist: one story in one target locale. */
export interface TranslationWorklistItem extends LocaleCompleteness {
  storyId: number;
  storyTitle: string;
  can: TranslationCan;
}

/** GET /api/translations/stories: the worklist, with the locales it can be narrowed to. */
export type TranslationWorklistPage = Page<TranslationWorklistItem> & {
  can: Can<'translations'>;
  /** The locales of the caller's worklist (before a locale or search filter), for the locale filter. */
  locales: string[];
};

/** One target locale of a story: its progress and what the caller may do in it. */
export interface TranslationTargetView extends LocaleCompleteness {
  can: TranslationCan;
}

/** GET /api/stories/:id/translations: one entry per target locale of the story's venue the caller reads. */
export type StoryTranslationsView = TranslationTargetView[];

/** GET …/units: a page of one target's units, with what the caller may do in that target. */
export type TranslationUnitPage = Page<TranslationUnitView> & { can: TranslationCan };

export const UNIT_STATUSES = ['untranslated', 'translated', 'stale'] as const satisfies readonly UnitStatus[];

export interface TranslationUnitView {
  unitId: string;
  /** Null for an image's alt text, which belongs to the media asset. */
  panelId: number | null;
  /** The panel's place in the story, counted from 1; for alt text, the first panel showing the image. */
  panelNumber: number | null;
  mediaId: number | null;
  kind: UnitKind;
  /** The current source in the display form: `Hot rock {1}rises{/1} at {2} cm a year`. */
  source: string;
  /** What each `{n}` stands for, for the editor's chips. */
  placeholders: Placeholder[];
  /** Characters the translation should keep within. */
  budget: number;
  status: UnitStatus;
  /** The stored translation in the display form, or null. */
  target: string | null;
  /** For a stale unit: the source as it read when it was translated. */
  previousSource: string | null;
  /** Send it back with the next save; 0 while the unit has never been translated. */
  version: number;
  translatedBy: { id: number; name: string } | null;
  /** @format date-time */
  updatedAt: string | null;
}

export interface SaveTranslationUnitBody {
  text: string;
  version: number;
}

export interface SavedTranslationUnit {
  version: number;
  status: UnitStatus;
  /** The saved text's length against its budget when it is over: saved all the same, as in an XLIFF import. */
  warnings: LengthBudgetWarning[];
}

/** PUT …/units/:unitId answers 409 with this when someone saved the unit first. */
export interface TranslationConflictBody {
  statusCode: 409;
  message: string;
  currentVersion: number;
  text: string | null;
}

export interface TranslationPreviewPanel {
  panelId: number;
  position: number;
  /** The target-locale document; a unit without a usable translation shows its source text. */
  doc: PanelDocJSON;
  /** Units shown in the source language. */
  fallbackUnitIds: string[];
}

/** GET /api/stories/:id/translations/:locale/preview: what the kiosk would draw in the locale. */
export interface TranslationPreviewView {
  storyId: number;
  locale: string;
  /** Writing direction of the locale, for the mirrored right-to-left preview. */
  dir: 'ltr' | 'rtl';
  /** The story's title in the locale, or null while it has no current translation. */
  title: string | null;
  panels: TranslationPreviewPanel[];
  /** Alt text per media id in the locale, falling back to the source. */
  alt: { [mediaId: string]: string };
}

/** PUT …/xliff answers with this once the whole file has been taken. */
export interface XliffImportResult {
  updated: number;
  unchanged: number;
  /** Units of the story in this locale still stale after the import. */
  stale: number;
  /** One per unit whose target in the file is over its length budget: imported all the same, to be shortened. */
  warnings: LengthBudgetWarning[];
}
