import type { CSSProperties } from 'react';
import { isWidgetType, widgetModule } from '../../widgets/index.js';

export interface PanelWidgetProps {
  widgetType: string;
  params: unknown;
  locale: string;
  reducedMotion: boolean;
  highContrast: boolean;
  onParamsChange: (params: Record<string, unknown>) => void;
}

const figureStyle: CSSProperties = { margin: '0.75em 0' };
const problemStyle: CSSProperties = { ...figureStyle, padding: '1em', border: '2px dashed currentColor' };

/** One widget block: its simulation, and its plain-language description for screen readers. */
export function PanelWidget({ widgetType, params, locale }: PanelWidgetProps) {
  if (!isWidgetType(widgetType)) {
    return (
      <figure style={problemStyle} className="mp-widget" data-widget-problem="unknown-type">
        {`Unknown widget "${widgetType}".`}
      </figure>
    );
  }
  const widget = widgetModule(widgetType);
  const checked = widget.validate(params);
  if (!checked.ok) {
    return (
      <figure style={problemStyle} className="mp-widget" data-widget-type={widgetType} data-widget-problem="invalid-params">
        {checked.errors.map((error) => error.message).join(' ')}
      </figure>
    );
  }
  return (
    <figure style={figureStyle} className="mp-widget" data-widget-type={widgetType}>
      <figcaption>{widget.describe(checked.params, locale)}</figcaption>
    </figure>
  );
}
