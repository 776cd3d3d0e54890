import { Fragment, type CSSProperties, type ReactNode } from 'react';
import { isPanelHref } from '../../panel/panel-link/panel-href.js';
import { DEFAULT_LIVE_VALUE_FORMAT, isLiveValueFormat } from '../../panel/live-value/live-value-format.js';
import { liveValueText, readLiveValue, type WidgetReading } from '../../panel/live-value/live-value-reading.js';
import { livePhraseText, readLivePhrase } from '../../panel/live-phrase/live-phrase-reading.js';
import { isLivePhraseWordings } from '../../panel/live-phrase/live-phrase-wordings.js';
import { isNodeLike, isPlainObject, LIVE_PHRASE_NODE, LIVE_VALUE_NODE, PANEL_IMAGE_NODE, WIDGET_NODE, type PanelMarkJSON, type PanelNodeJSON } from '../../panel/panel-json.js';
import type { SimulationReport } from '../../widgets/index.js';
import type { WidgetInput } from '../widget-controls.js';
import type { ResolveMedia } from './panel-media.js';
import { PanelImageFigure } from './PanelImageFigure.js';
import { PanelWidget } from './PanelWidget.js';

/** What every node needs to draw itself; passed down the walk rather than through React context. */
export interface PanelRenderContext {
  locale: string;
  readings: ReadonlyMap<string, WidgetReading>;
  paramsById: ReadonlyMap<string, unknown>;
  resolveMedia: ResolveMedia;
  links: 'anchor' | 'text';
  reducedMotion: boolean;
  highContrast: boolean;
  widgetMaxWidth: number;
  /** How much larger than their standard size the words drawn in a widget are (the visitor's Larger text). */
  drawingTextScale: number;
  /** How visitors move widgets here: a finger on a kiosk. */
  widgetInput: WidgetInput;
  /** Digits of the panel's live values, by widget and output, so a drawing rounds a value as its caption does. */
  outputDigits: ReadonlyMap<string, Readonly<Record<string, number>>>;
  onWidgetParamsChange: (widgetId: string, params: Record<string, unknown>) => void;
  onWidgetReport: (widgetId: string, report: SimulationReport) => void;
}

const headingStyle: CSSProperties = { color: 'var(--mp-heading)', lineHeight: 1.15, margin: '0 0 0.4em' };
const linkStyle: CSSProperties = { color: 'var(--mp-link)', textDecoration: 'underline' };
const liveValueStyle: CSSProperties = { color: 'var(--mp-live-value)', fontWeight: 600, fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' };

const str = (value: unknown) => (typeof value === 'string' ? value : '');

function withMark(mark: PanelMarkJSON, children: ReactNode, context: PanelRenderContext): ReactNode {
  switch (mark.type) {
    case 'bold':
      return <strong>{children}</strong>;
    case 'italic':
      return <em>{children}</em>;
    case 'link': {
      const href = mark.attrs?.href;
      // A kiosk must not leave the story, and nothing but http, https or mailto is ever an href.
      if (context.links === 'text' || !isPanelHref(href)) return <span className="mp-link" style={linkStyle}>{children}</span>;
      return (
        <a href={href} target="_blank" rel="noopener noreferrer nofollow" className="mp-link" style={linkStyle}>
          {children}
        </a>
      );
    }
    default:
      return children;
  }
}

function renderChildren(node: PanelNodeJSON, context: PanelRenderContext): ReactNode[] {
  return (Array.isArray(node.content) ? node.content : []).filter(isNodeLike).map((child, index) => renderPanelNode(child, context, index));
}

/**
 * One document node as React elements. Only the panel's own node and mark types are drawn; text is
 * always a React text child, so nothing in a document can become markup or script.
 */
export function renderPanelNode(node: PanelNodeJSON, context: PanelRenderContext, key: number): ReactNode {
  const attrs = node.attrs ?? {};
  switch (node.type) {
    case 'doc':
      return renderChildren(node, context);
    case 'paragraph':
      return <p key={key}>{renderChildren(node, context)}</p>;
    case 'heading':
      return attrs.level === 3 ? (
        <h3 key={key} style={{ ...headingStyle, fontSize: '1.2em' }}>
          {renderChildren(node, context)}
        </h3>
      ) : (
        <h2 key={key} style={{ ...headingStyle, fontSize: '1.6em' }}>
          {renderChildren(node, context)}
        </h2>
      );
    case 'bulletList':
      return <ul key={key}>{renderChildren(node, context)}</ul>;
    case 'orderedList':
      return (
        <ol key={key} start={typeof attrs.start === 'number' ? attrs.start : undefined}>
          {renderChildren(node, context)}
        </ol>
      );
    case 'listItem':
      return <li key={key}>{renderChildren(node, context)}</li>;
    case 'blockquote':
      return <blockquote key={key}>{renderChildren(node, context)}</blockquote>;
    case 'hardBreak':
      return <br key={key} />;
    case 'text': {
      const marks = Array.isArray(node.marks) ? node.marks : [];
      return <Fragment key={key}>{marks.reduceRight<ReactNode>((inner, mark) => withMark(mark, inner, context), str(node.text))}</Fragment>;
    }
    case LIVE_VALUE_NODE: {
      const reading = readLiveValue({ widgetId: str(attrs.widgetId), output: str(attrs.output) }, context.readings);
      const format = isLiveValueFormat(attrs.format) ? attrs.format : DEFAULT_LIVE_VALUE_FORMAT;
      // A number with its unit is isolated left to right, so "562 N" and "38.7°" keep their order inside Arabic; a state is a word of the text's own language.
      return (
        <span key={key} className="mp-live-value" dir={reading.ok && 'value' in reading ? 'ltr' : undefined} style={liveValueStyle} data-widget-id={str(attrs.widgetId)} data-output={str(attrs.output)}>
          {liveValueText(reading, format, context.locale)}
        </span>
      );
    }
    case LIVE_PHRASE_NODE: {
      const reading = readLivePhrase({ widgetId: str(attrs.widgetId), wordings: isLivePhraseWordings(attrs.wordings) ? attrs.wordings : {} }, context.readings);
      // Polite, so a screen reader hears the new wording when the visitor tips the block over.
      return (
        <span key={key} className="mp-live-phrase" aria-live="polite" data-widget-id={str(attrs.widgetId)} data-state={reading.ok ? reading.state : undefined}>
          {livePhraseText(reading)}
        </span>
      );
    }
    case WIDGET_NODE: {
      const widgetId = str(attrs.widgetId);
      return (
        <PanelWidget
          key={key}
          widgetType={str(attrs.widgetType)}
          params={context.paramsById.get(widgetId) ?? (isPlainObject(attrs.params) ? attrs.params : {})}
          locale={context.locale}
          reducedMotion={context.reducedMotion}
          highContrast={context.highContrast}
          maxWidth={context.widgetMaxWidth}
          textScale={context.drawingTextScale}
          input={context.widgetInput}
          outputDigits={context.outputDigits.get(widgetId)}
          visitorModelCard={attrs.visitorModelCard === true}
          onParamsChange={(params) => context.onWidgetParamsChange(widgetId, params)}
          onReport={(report) => context.onWidgetReport(widgetId, report)}
        />
      );
    }
    case PANEL_IMAGE_NODE:
      return <PanelImageFigure key={key} media={context.resolveMedia(str(attrs.mediaId))} />;
    default:
      return null;
  }
}
