import { isNodeLike, isPlainObject, LIVE_PHRASE_NODE, visitPanelNodes, type PanelDocJSON, type PanelNodeJSON, type PanelPath } from '../panel/panel-json.js';
import { livePhrasesIn, widgetsIn } from '../panel/panel-queries.js';
import { checkPlaceholders, type PlaceholderProblem } from './check-placeholders.js';
import { inlineNodes } from './inline-runs.js';
import { runsFromText, type TranslationUnit, type UnitRun } from './translation-unit.js';

export interface AppliedTranslations {
  doc: PanelDocJSON;
  /** Units shown in the source language: no translation was given. */
  untranslated: string[];
  /** Units shown in the source language because their translation breaks a placeholder. */
  refused: { unitId: string; problems: PlaceholderProblem[] }[];
}

function nodeAt(doc: PanelNodeJSON, path: PanelPath): PanelNodeJSON | undefined {
  let node: unknown = doc;
  for (const step of path) node = isPlainObject(node) || Array.isArray(node) ? (node as Record<string | number, unknown>)[step] : undefined;
  return isNodeLike(node) ? node : undefined;
}

function setParam(params: Record<string, unknown>, path: readonly string[], text: string): void {
  const [head, ...rest] = path;
  if (head === undefined) return;
  if (rest.length === 0) params[head] = text;
  else if (isPlainObject(params[head])) setParam(params[head], rest, text);
}

const plainText = (runs: readonly UnitRun[]) => runs.map((run) => (run.type === 'text' ? run.text : '')).join('');

/**
 * The target-locale document: the source structure, each unit's text replaced by its translation
 * (stored in the display form, `Le {1}roc{/1} monte de {2} cm par an`), marks and live values
 * restored from the source placeholders. A unit without a translation, or with one that breaks a
 * placeholder, keeps its source text; the caller decides whether a release may show that. Alt text
 * and story title units are not in the document and are skipped: they belong to the media
 * asset and to the story.
 */
export function applyTranslations(doc: PanelDocJSON, units: readonly TranslationUnit[], translationsById: Readonly<Record<string, string>>): AppliedTranslations {
  const target = structuredClone(doc);
  const untranslated: string[] = [];
  const refused: AppliedTranslations['refused'] = [];
  const widgets = new Map(widgetsIn(target).map((widget) => [widget.widgetId, widget]));

  for (const unit of units) {
    if (unit.location.type === 'altText' || unit.location.type === 'storyTitle') continue;
    const text = Object.hasOwn(translationsById, unit.id) ? translationsById[unit.id] : undefined;
    if (text === undefined || text === '') {
      untranslated.push(unit.id);
      continue;
    }
    const runs: UnitRun[] = runsFromText(unit, text);
    const problems = checkPlaceholders(unit, runs);
    if (problems.length > 0) {
      refused.push({ unitId: unit.id, problems });
      continue;
    }
    if (unit.location.type === 'textBlock') {
      const block = nodeAt(target, unit.location.path);
      if (!block || (block.type !== 'paragraph' && block.type !== 'heading')) throw new Error(`Unit ${unit.id} was not cut from this document.`);
      const content = inlineNodes(runs, unit.placeholders);
      if (content.length > 0) block.content = content;
      else delete block.content;
    } else if (unit.location.type === 'livePhrase') {
      const plain = plainText(runs);
      const { phraseId, state } = unit.location;
      const phrase = livePhrasesIn(target).find((candidate) => candidate.phraseId === phraseId);
      if (!phrase) throw new Error(`Unit ${unit.id} was not cut from this document.`);
      // Every copy: a translated block restores its phrase from the source placeholder, so the wording goes on that node.
      visitPanelNodes(target, (node) => {
        if (node.type === LIVE_PHRASE_NODE && node.attrs?.phraseId === phraseId) node.attrs = { ...node.attrs, wordings: { ...phrase.wordings, [state]: plain } };
      });
    } else {
      const widget = widgets.get(unit.location.widgetId);
      if (!widget) throw new Error(`Unit ${unit.id} was not cut from this document.`);
      setParam(widget.params, unit.location.param, plainText(runs));
    }
  }
  return { doc: target, untranslated, refused };
}
