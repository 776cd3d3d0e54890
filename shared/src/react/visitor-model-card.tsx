import type { CSSProperties } from 'react';
import { widgetStrings } from '../i18n/index.js';
import { modelCardIn } from '../widgets/model-card.js';
import { widgetModule, type WidgetType } from '../widgets/index.js';
import { widgetButtonStyle } from './widget-controls.js';

const cardStyle: CSSProperties = { marginTop: '0.5em', padding: '0.6em 1em', borderInlineStart: '6px solid var(--mp-control-border, #0b3f5c)' };
const headingStyle: CSSProperties = { fontSize: '1em', margin: '0.6em 0 0.2em' };
const listStyle: CSSProperties = { margin: 0, paddingInlineStart: '1.2em' };
// Symbols read left to right in every language, Arabic included.
const formulaStyle: CSSProperties = { display: 'block', direction: 'ltr', unicodeBidi: 'isolate', fontFamily: 'inherit', fontWeight: 600 };

/**
 * "How do we know?": a widget's model card as a visitor opens it beside the widget on a gallery
 * screen, in the visitor's language: what the model is, its equations, what it assumes, where it
 * holds and where it comes from. A native disclosure, so touch, keys and screen readers all open it;
 * sources are named with their DOI as text, since a kiosk does not leave the exhibit for the web.
 */
export function VisitorModelCard({ widgetType, locale }: { widgetType: WidgetType; locale: string }) {
  const words = widgetStrings(locale).modelCard;
  const card = modelCardIn(widgetModule(widgetType).model, locale);
  const list = (title: string, items: readonly string[], name: string) => (
    <>
      <h3 style={headingStyle}>{title}</h3>
      <ul style={listStyle} data-model-card={name}>{items.map((item) => <li key={item}>{item}</li>)}</ul>
    </>
  );
  return (
    <details className="mp-model-card" data-model-card-of={widgetType}>
      <summary style={{ ...widgetButtonStyle, display: 'inline-flex', alignItems: 'center', marginTop: '0.5em', listStyle: 'none' }}>{words.open}</summary>
      <div style={cardStyle}>
        <p style={{ margin: 0 }}>{card.summary}</p>
        <h3 style={headingStyle}>{words.equations}</h3>
        <ul style={listStyle} data-model-card="equations">
          {card.equations.map((equation) => (
            <li key={equation.formula}>
              <span style={formulaStyle}>{equation.formula}</span>
              {equation.meaning}
            </li>
          ))}
        </ul>
        {list(words.assumptions, card.assumptions, 'assumptions')}
        {list(words.range, card.range, 'range')}
        {list(words.sources, card.sources.map((source) => (source.doi ? `${source.citation} doi:${source.doi}` : source.citation)), 'sources')}
      </div>
    </details>
  );
}
