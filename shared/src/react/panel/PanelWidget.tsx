import type { CSSProperties } from 'react';
import {
  isWidgetType,
  widgetModule,
  type ConvectionCellParams,
  type PlateForcesParams,
  type SeaFloorDepthParams,
  type SimulationReport,
  type SlopeForceParams,
  type WidgetType,
} from '../../widgets/index.js';
import { ConvectionCell } from '../convection-cell.js';
import { PlateForces } from '../plate-forces.js';
import { SeaFloorDepth } from '../sea-floor-depth.js';
import { SlopeForceBox } from '../slope-force-box.js';
import type { WidgetInput } from '../widget-controls.js';
import { VisitorModelCard } from '../visitor-model-card.js';

export interface PanelWidgetProps {
  widgetType: string;
  params: unknown;
  locale: string;
  reducedMotion: boolean;
  highContrast: boolean;
  /** In the studio editor the widget says it is a simplified model, next to where its params are set. */
  editing?: boolean;
  /** Widest the drawing may be, in CSS px at the station's full size. */
  maxWidth?: number;
  /** How much larger than standard the words drawn in the widget are: the visitor's Larger text on a kiosk. */
  textScale?: number;
  onParamsChange: (params: Record<string, unknown>) => void;
  /** Told what a running simulation reports, for the live values that show its outputs. */
  onReport?: (report: SimulationReport) => void;
  /** How the visitor moves it, for its instructions: a finger on a kiosk. */
  input?: WidgetInput;
  /** Digits of the live values of its outputs on the same panel, by output name. */
  outputDigits?: Readonly<Record<string, number>>;
  /** The curator lets visitors open the model card ("How do we know?") under the widget. */
  visitorModelCard?: boolean;
}

const blockStyle: CSSProperties = { margin: '0.75em 0' };
const problemStyle: CSSProperties = { ...blockStyle, padding: '1em', border: '2px dashed currentColor' };

export interface WidgetDrawingProps extends Omit<PanelWidgetProps, 'widgetType' | 'params' | 'reducedMotion' | 'highContrast' | 'visitorModelCard'> {
  widgetType: WidgetType;
  params: unknown;
  /** The kiosk's reduced-motion toggle; without it the system setting counts. */
  reducedMotion?: boolean;
}

/**
 * The shared component of each widget type, given params the registry has already accepted: a
 * panel's widget block, and the studio's widget workbench.
 */
export function WidgetDrawing({ widgetType, params, locale, reducedMotion, editing = false, maxWidth, textScale = 1, onParamsChange, onReport, input, outputDigits }: WidgetDrawingProps) {
  switch (widgetType) {
    case 'slope-force':
      return (
        <SlopeForceBox
          params={params as SlopeForceParams}
          locale={locale}
          reducedMotion={reducedMotion}
          showCaution={editing}
          maxWidth={maxWidth}
          textScale={textScale}
          input={input}
          outputDigits={outputDigits}
          onParamsChange={(next) => onParamsChange({ ...next })}
        />
      );
    case 'convection-cell':
      return (
        <ConvectionCell params={params as ConvectionCellParams} locale={locale} reducedMotion={reducedMotion} showCaution={editing} width={maxWidth} onReport={onReport} />
      );
    case 'sea-floor-depth':
      return (
        <SeaFloorDepth params={params as SeaFloorDepthParams} locale={locale} showCaution={editing} maxWidth={maxWidth} textScale={textScale} input={input} onParamsChange={(next) => onParamsChange({ ...next })} />
      );
    case 'plate-forces':
      return <PlateForces params={params as PlateForcesParams} locale={locale} showCaution={editing} maxWidth={maxWidth} textScale={textScale} onParamsChange={(next) => onParamsChange({ ...next })} />;
  }
}

/** One widget block, checked against the registry before it is drawn, as the server checks it. */
export function PanelWidget(props: PanelWidgetProps) {
  const { widgetType, params } = props;
  if (!isWidgetType(widgetType)) {
    return (
      <div style={problemStyle} className="mp-widget" data-widget-problem="unknown-type">
        {`Unknown widget "${widgetType}".`}
      </div>
    );
  }
  const checked = widgetModule(widgetType).validate(params);
  if (!checked.ok) {
    return (
      <div style={problemStyle} className="mp-widget" data-widget-type={widgetType} data-widget-problem="invalid-params">
        {checked.errors.map((error) => error.message).join(' ')}
      </div>
    );
  }
  return (
    <div style={blockStyle} className="mp-widget" data-widget-type={widgetType}>
      <WidgetDrawing {...props} widgetType={widgetType} params={checked.params} />
      {props.visitorModelCard ? <VisitorModelCard widgetType={widgetType} locale={props.locale} /> : null}
    </div>
  );
}
