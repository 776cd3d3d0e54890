import { lengthBudget, type TranslationUnitView } from '@mantlepiece/shared';
import type { UnitState } from './translation-state.js';

export const toTranslationUnitView = (state: UnitState, locale: string): TranslationUnitView => ({
  unitId: state.unit.id,
  panelId: state.panelId,
  panelNumber: state.panelNumber,
  mediaId: state.mediaId,
  kind: state.unit.kind,
  source: state.unit.display,
  placeholders: state.unit.placeholders,
  budget: lengthBudget(state.unit, { targetLocale: locale }),
  status: state.status,
  target: state.translation?.text ?? null,
  previousSource: state.status === 'stale' ? state.translation!.sourceText : null,
  version: state.own?.version ?? 0,
  translatedBy: state.translation?.translator ?? null,
  updatedAt: state.translation?.updatedAt?.toISOString() ?? null,
});
