import { useCallback, useMemo, useRef, useState } from 'react';
import { readPanelWidgets } from '../../panel/live-value/live-value-reading.js';
import { PANEL_IMAGE_NODE, WIDGET_NODE, type PanelDocJSON, type PanelNodeJSON } from '../../panel/panel-json.js';
import { directionOf, PANEL_LAYOUTS, type PanelLayout, type TextDirection } from '../../panel/panel-presentation.js';
import { liveValuesIn, widgetsIn } from '../../panel/panel-queries.js';
import type { SimulationReport } from '../../widgets/index.js';
import { renderPanelNode, type PanelRenderContext } from './panel-nodes.js';
import type { ResolveMedia } from './panel-media.js';
import type { WidgetInput } from '../widget-controls.js';
import { MoreBelowCue, useMoreBelow, type MoreBelowLook } from '../more-below.js';
import { LARGE_TEXT_SCALE, landscapeColumnStyle, panelRootStyle, WIDGET_MAX_WIDTH } from './panel-theme.js';

export interface PanelViewProps {
  doc: PanelDocJSON;
  /** BCP 47 tag of the document's language: numbers, lang and (unless given) direction follow it. */
  locale: string;
  dir?: TextDirection;
  layout?: PanelLayout;
  largeText?: boolean;
  highContrast?: boolean;
  reducedMotion?: boolean;
  resolveMedia: ResolveMedia;
  /** 'text' on a kiosk, where a link must not take a visitor out of the story. */
  links?: 'anchor' | 'text';
  /** Told each time a visitor moves a widget's params (the kiosk counts widget use from it). */
  onVisitorParamsChange?: (widgetId: string, params: Record<string, unknown>) => void;
  /** How visitors move the widgets, for their instructions: 'touch' on a kiosk. */
  widgetInput?: WidgetInput;
}

/** Something kept per widget that belongs to the document it was set on; a new panel starts without it. */
interface PerWidget<T> {
  doc: PanelDocJSON;
  byWidget: ReadonlyMap<string, T>;
}

function usePerWidget<T>(doc: PanelDocJSON) {
  const [state, setState] = useState<PerWidget<T>>({ doc, byWidget: new Map() });
  const current = state.doc === doc ? state.byWidget : new Map<string, T>();
  const set = useCallback(
    (widgetId: string, value: T) => setState((previous) => ({ doc, byWidget: new Map(previous.doc === doc ? previous.byWidget : []).set(widgetId, value) })),
    [doc],
  );
  return [current, set] as const;
}

/** The digits each live value on the panel shows, by widget and output; the first live value of an output sets them. */
function outputDigitsIn(doc: PanelDocJSON): ReadonlyMap<string, Readonly<Record<string, number>>> {
  const byWidget = new Map<string, Record<string, number>>();
  for (const { widgetId, output, format } of liveValuesIn(doc)) {
    const outputs = byWidget.get(widgetId) ?? {};
    outputs[output] ??= format.digits;
    byWidget.set(widgetId, outputs);
  }
  return byWidget;
}

/** The cue at a long panel's foot, in the panel's own padding and colours. */
const PANEL_MORE_BELOW: MoreBelowLook = {
  padBlock: 'var(--mp-panel-pad-block)',
  padInline: 'var(--mp-panel-pad-inline)',
  fade: 'var(--mp-surface)',
  surface: 'var(--mp-control-surface)',
  text: 'var(--mp-control-text)',
  border: 'var(--mp-control-border)',
};

/**
 * A panel as a gallery screen draws it: the Tiptap JSON walked into React elements, with no editor
 * and no raw HTML. Widgets stay live under touch, and live values follow what the visitor sets.
 */
export function PanelView({ doc, locale, dir, layout = 'landscape', largeText = false, highContrast = false, reducedMotion = false, resolveMedia, links = 'anchor', onVisitorParamsChange, widgetInput = 'desk' }: PanelViewProps) {
  const [paramsById, setVisitorParams] = usePerWidget<unknown>(doc);
  // What each running simulation last reported, for live values of its outputs (Nu, speed, time).
  const [reportsById, setReport] = usePerWidget<SimulationReport>(doc);
  const widgets = useMemo(() => widgetsIn(doc), [doc]);
  const outputDigits = useMemo(() => outputDigitsIn(doc), [doc]);
  const readings = useMemo(() => readPanelWidgets(widgets, paramsById, reportsById), [widgets, paramsById, reportsById]);
  const onWidgetParamsChange = useCallback(
    (widgetId: string, params: Record<string, unknown>) => {
      setVisitorParams(widgetId, params);
      onVisitorParamsChange?.(widgetId, params);
    },
    [setVisitorParams, onVisitorParamsChange],
  );

  const scroller = useRef<HTMLElement>(null);
  const moreBelow = useMoreBelow(scroller, doc);
  const { width, height } = PANEL_LAYOUTS[layout];
  const context: PanelRenderContext = {
    locale,
    readings,
    paramsById,
    resolveMedia,
    links,
    reducedMotion,
    highContrast,
    widgetMaxWidth: WIDGET_MAX_WIDTH[layout],
    drawingTextScale: largeText ? LARGE_TEXT_SCALE : 1,
    widgetInput,
    outputDigits,
    onWidgetParamsChange,
    onWidgetReport: setReport,
  };
  return (
    <article
      ref={scroller}
      className="mp-panel"
      lang={locale}
      dir={dir ?? directionOf(locale)}
      data-layout={layout}
      data-large-text={largeText || undefined}
      data-high-contrast={highContrast || undefined}
      data-reduced-motion={reducedMotion || undefined}
      data-more-below={moreBelow || undefined}
      style={panelRootStyle(layout, width, height, largeText, highContrast)}
    >
      {layout === 'landscape' ? <LandscapeColumns doc={doc} context={context} /> : renderPanelNode(doc, context, 0)}
      {moreBelow ? <MoreBelowCue look={PANEL_MORE_BELOW} /> : null}
    </article>
  );
}

const isMediaNode = (node: PanelNodeJSON) => node.type === WIDGET_NODE || node.type === PANEL_IMAGE_NODE;

/**
 * A wide screen reads best with the words on one side and the widgets and pictures on the other:
 * stacked in one column, a widget pushed the caption below it off the bottom of a 1080 px screen.
 * Each column keeps the document's order, and the words come first for a screen reader.
 */
function LandscapeColumns({ doc, context }: { doc: PanelDocJSON; context: PanelRenderContext }) {
  const blocks = (doc.content ?? []) as PanelNodeJSON[];
  const media = blocks.filter(isMediaNode);
  if (media.length === 0 || media.length === blocks.length) return <>{renderPanelNode(doc, context, 0)}</>;
  const column = (nodes: PanelNodeJSON[]) => renderPanelNode({ type: 'doc', content: nodes }, context, 0);
  return (
    <div style={landscapeColumnStyle.row}>
      <div className="mp-panel-text" style={landscapeColumnStyle.text}>{column(blocks.filter((node) => !isMediaNode(node)))}</div>
      <div className="mp-panel-media" style={landscapeColumnStyle.media}>{column(media)}</div>
    </div>
  );
}
