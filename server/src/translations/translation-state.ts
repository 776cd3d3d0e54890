import {
  carryTranslations, displayOf, localeCompleteness, unitStatus,
  type LocaleCompleteness, type StoredTranslation, type TranslationUnit, type UnitStatus,
} from '@mantlepiece/shared';
import type { MediaAltText } from '../media/models/media-alt-text.model.js';
import type { Translation } from './models/translation.model.js';
import type { StorySource } from './source-units.service.js';

/** A translation as the rules read it: a stored row, or an image's alt text in the target locale. */
export interface StoredUnitTranslation extends StoredTranslation {
  /** The unit id the text was saved under; another id when `carryTranslations` moved it. */
  unitId: string;
  sourceText: string;
  translator: { id: number; name: string } | null;
  updatedAt: Date | null;
}

export interface UnitState {
  unit: TranslationUnit;
  panelId: number | null;
  /** Null for the story's title, which is on no panel. */
  panelNumber: number | null;
  /** The version of the panel's source document; null for alt text. */
  sourceVersion: number | null;
  mediaId: number | null;
  /** The translation the unit shows: its own, or one carried over from a renumbered unit. */
  translation?: StoredUnitTranslation;
  /** The row saved under this unit's own id, whose version a save must name. */
  own?: Translation;
  status: UnitStatus;
}

const stored = (row: Translation): StoredUnitTranslation => ({
  unitId: row.unitId,
  text: row.text,
  sourceHash: row.sourceHash,
  sourceText: row.sourceText,
  translator: row.translator ? { id: row.translator.id, name: row.translator.name } : null,
  updatedAt: row.updatedAt,
});

/** Alt text, unlike panel text, has no placeholders, so the plain text and the display form differ only in escaped braces. */
export const altDisplay = (text: string) => displayOf([{ type: 'text', text }]);

/**
 * The state of every unit of a story in one locale, in reading order (the title, then each panel's
 * units, then the alt text of images it shows first). An alt text is read from the media library, where every other
 * part of the system reads it; its row here only says which source it was made from. An alt text
 * typed straight into the media library has no row, and counts as made from the current source.
 */
export function unitStates(source: StorySource, rows: readonly Translation[], targetAltTexts: readonly MediaAltText[]): UnitState[] {
  const rowsById = new Map(rows.map((row) => [row.unitId, row]));
  const altTextOf = new Map(targetAltTexts.map((alt) => [alt.mediaAssetId, alt]));
  const titleRow = rowsById.get(source.title.id);
  const titleTranslation = titleRow ? stored(titleRow) : undefined;
  const states: UnitState[] = [{
    unit: source.title, panelId: null, panelNumber: null, sourceVersion: null, mediaId: null, translation: titleTranslation, own: titleRow,
    status: unitStatus({ sourceHash: source.title.sourceHash, translation: titleTranslation }),
  }];
  for (const panel of source.panels) {
    const own = Object.fromEntries(rows.filter((row) => row.panelId === panel.panelId).map((row) => [row.unitId, stored(row)]));
    const carried = carryTranslations(panel.units, own);
    for (const unit of panel.units) {
      const translation = carried[unit.id];
      states.push({
        unit, panelId: panel.panelId, panelNumber: panel.panelNumber, sourceVersion: panel.version, mediaId: null, translation, own: rowsById.get(unit.id),
        status: unitStatus({ sourceHash: unit.sourceHash, translation }),
      });
    }
    for (const alt of source.altTexts.filter((each) => each.panelNumber === panel.panelNumber)) {
      const row = rowsById.get(alt.unit.id);
      const target = altTextOf.get(alt.mediaId);
      const translation: StoredUnitTranslation | undefined = target
        ? {
            unitId: alt.unit.id,
            text: altDisplay(target.text),
            sourceHash: row?.sourceHash ?? alt.unit.sourceHash,
            sourceText: row?.sourceText ?? alt.unit.display,
            translator: row ? stored(row).translator : null,
            updatedAt: row?.updatedAt ?? null,
          }
        : undefined;
      states.push({
        unit: alt.unit, panelId: null, panelNumber: alt.panelNumber, sourceVersion: null, mediaId: alt.mediaId, translation, own: row,
        status: unitStatus({ sourceHash: alt.unit.sourceHash, translation }),
      });
    }
  }
  return states;
}

export function completenessOf(locale: string, states: readonly UnitState[]): LocaleCompleteness {
  const shown = Object.fromEntries(states.flatMap((state) => (state.translation ? [[state.unit.id, state.translation] as const] : [])));
  return localeCompleteness(locale, states.map((state) => state.unit), shown);
}

/** The translations to apply to the source: only those made from the current source. */
export function currentTranslationsOf(states: readonly UnitState[]): Record<string, string> {
  return Object.fromEntries(states.filter((state) => state.status === 'translated').map((state) => [state.unit.id, state.translation!.text]));
}
