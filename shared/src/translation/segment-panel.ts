import { isNodeLike, WIDGET_NODE, type PanelNodeJSON, type PanelPath } from '../panel/panel-json.js';
import { livePhrasesIn, widgetsIn } from '../panel/panel-queries.js';
import { isWidgetType, widgetJsonSchema } from '../widgets/index.js';
import { inlineSource, visibleLength } from './inline-runs.js';
import { translatableParams } from './translatable-params.js';
import { displayOf, withSourceHash, type TranslationUnit, type UnhashedUnit, type UnitKind, type UnitRun } from './translation-unit.js';

export interface SegmentPanelOptions {
  panelId: string | number;
  sourceLocale: string;
  panelNumber?: number;
}

export interface TextBlockSegment {
  id: string;
  kind: UnitKind;
  path: PanelPath;
  block: PanelNodeJSON;
}

/** Unit ids are XLIFF NMTOKENs (no "/"), so the parts are joined with ".", which no panel or widget id contains. */
export const panelUnitPrefix = (panelId: string | number) => `p${panelId}`;

const KIND_OF_CONTAINER: Record<string, UnitKind> = { listItem: 'listItem', blockquote: 'quote' };

const hasWords = (runs: readonly UnitRun[]) => runs.some((run) => run.type === 'text' && run.text.trim() !== '');

/**
 * Every paragraph and heading with text, in document order, with its unit id. A block inside a
 * list item or a quote takes that kind (the nearest container wins). The id counts blocks of the
 * same kind: `p42.paragraph.3` is the panel's third paragraph. It is content-independent, so
 * editing the words keeps it, and it survives inserting, removing or moving blocks of other
 * kinds, widgets and images. Inserting a block of the same kind before it renumbers it; the unit's
 * source hash then no longer matches its old translation, so the translation shows as stale rather
 * than silently landing on the wrong text (and `carryTranslations` moves it back by hash).
 */
export function textBlocksOf(doc: PanelNodeJSON, panelId: string | number): TextBlockSegment[] {
  const segments: TextBlockSegment[] = [];
  const counts = new Map<UnitKind, number>();
  const walk = (node: PanelNodeJSON, path: PanelPath, container: UnitKind | undefined) => {
    if (node.type === 'paragraph' || node.type === 'heading') {
      if (!hasWords(inlineSource(node).runs)) return;
      const kind: UnitKind = container ?? (node.type === 'heading' ? 'heading' : 'paragraph');
      const ordinal = (counts.get(kind) ?? 0) + 1;
      counts.set(kind, ordinal);
      segments.push({ id: `${panelUnitPrefix(panelId)}.${kind}.${ordinal}`, kind, path, block: node });
      return;
    }
    const inner = KIND_OF_CONTAINER[node.type] ?? container;
    (node.content ?? []).forEach((child, index) => {
      if (isNodeLike(child)) walk(child, [...path, 'content', index], inner);
    });
  };
  walk(doc, [], undefined);
  return segments;
}

function textBlockUnit(segment: TextBlockSegment, options: SegmentPanelOptions): UnhashedUnit {
  const { runs, placeholders } = inlineSource(segment.block);
  const level = segment.block.type === 'heading' ? segment.block.attrs?.level : undefined;
  return {
    id: segment.id,
    kind: segment.kind,
    sourceLocale: options.sourceLocale,
    location: { type: 'textBlock', path: segment.path },
    context: { panelId: String(options.panelId), panelNumber: options.panelNumber, headingLevel: typeof level === 'number' ? level : undefined },
    runs,
    placeholders,
    display: displayOf(runs),
    sourceLength: visibleLength(runs, placeholders),
  };
}

/** A unit of plain text: no marks, no placeholders. */
export function plainUnit(fields: Omit<UnhashedUnit, 'runs' | 'placeholders' | 'display' | 'sourceLength'>, text: string): UnhashedUnit {
  const runs: UnitRun[] = [{ type: 'text', text }];
  return { ...fields, runs, placeholders: [], display: displayOf(runs), sourceLength: visibleLength(runs, []) };
}

/** Text a curator typed into a widget's params (a caption, a label), where the widget declares any. */
function widgetUnits(doc: PanelNodeJSON, options: SegmentPanelOptions): UnhashedUnit[] {
  const units: UnhashedUnit[] = [];
  const walk = (node: PanelNodeJSON) => {
    if (node.type === WIDGET_NODE) {
      const { widgetType, widgetId, params } = node.attrs ?? {};
      if (!isWidgetType(widgetType) || typeof widgetId !== 'string') return;
      for (const { param, text } of translatableParams(widgetJsonSchema(widgetType), params)) {
        if (text.trim() === '') continue;
        const fields = {
          id: `${panelUnitPrefix(options.panelId)}.widget.${widgetId}.${param.join('.')}`,
          kind: 'widgetText' as const,
          sourceLocale: options.sourceLocale,
          location: { type: 'widgetParam' as const, widgetId, param },
          context: { panelId: String(options.panelId), panelNumber: options.panelNumber, widgetType },
        };
        units.push(plainUnit(fields, text));
      }
      return;
    }
    (node.content ?? []).filter(isNodeLike).forEach(walk);
  };
  walk(doc);
  return units;
}

/**
 * Each wording of each live phrase: `p42.phrase.ph-x1.slides`. The sentence around a phrase
 * carries it as a placeholder; its wordings are translated on their own, each with its state named.
 */
function livePhraseUnits(doc: PanelNodeJSON, options: SegmentPanelOptions): UnhashedUnit[] {
  const widgetTypes = new Map(widgetsIn(doc).map((widget) => [widget.widgetId, widget.widgetType]));
  return livePhrasesIn(doc).flatMap(({ phraseId, widgetId, wordings }) =>
    Object.entries(wordings)
      .filter(([, text]) => text.trim() !== '')
      .map(([state, text]) =>
        plainUnit(
          {
            id: `${panelUnitPrefix(options.panelId)}.phrase.${phraseId}.${state}`,
            kind: 'livePhrase',
            sourceLocale: options.sourceLocale,
            location: { type: 'livePhrase', phraseId, state },
            context: { panelId: String(options.panelId), panelNumber: options.panelNumber, widgetType: widgetTypes.get(widgetId), state },
          },
          text,
        ),
      ),
  );
}

/** Cuts a panel's source document into translation units: its text blocks, its widgets' text, then its live phrases' wordings. */
export async function segmentPanel(doc: PanelNodeJSON, options: SegmentPanelOptions): Promise<TranslationUnit[]> {
  const units = [
    ...textBlocksOf(doc, options.panelId).map((segment) => textBlockUnit(segment, options)),
    ...widgetUnits(doc, options),
    // After the text blocks: applying a block's translation puts its phrases back from the source, and the wordings go in after.
    ...livePhraseUnits(doc, options),
  ];
  return Promise.all(units.map(withSourceHash));
}

/**
 * The alt text of a media asset as a unit. Alt text lives with the asset, per locale, so its unit
 * belongs to the asset (`m17.alt`) and one translation serves every panel that shows the image.
 */
export async function segmentAltText(mediaId: string, text: string, options: { sourceLocale: string; panelNumber?: number }): Promise<TranslationUnit> {
  return withSourceHash(
    plainUnit(
      { id: `m${mediaId}.alt`, kind: 'altText', sourceLocale: options.sourceLocale, location: { type: 'altText', mediaId }, context: { mediaId, panelNumber: options.panelNumber } },
      text,
    ),
  );
}
