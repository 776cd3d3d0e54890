import { useId } from 'react';
import { formatQuantity, widgetStrings } from '../i18n/index.js';
import { formatMillionYears } from '../widgets/convection-cell/index.js';
import {
  computeSeaFloorDepth,
  formatDepthKm,
  formatHeatFlow,
  formatThicknessKm,
  GDH1,
  SEA_FLOOR_AGE_MAX_MYR,
  seaFloorDepth,
  type SeaFloorDepthParams,
  type SeaFloorDepthResult,
  type SeaFloorModel,
} from '../widgets/sea-floor-depth/index.js';
import { drawingSliderHandlers } from './drawing-slider.js';
import { DEPTH_TICKS_M, layoutSeaFloor, LITHOSPHERE, SEA, SEA_FLOOR_VIEW, seaFloorLabels, seaY, lithosphereY, THICKNESS_TICKS_KM } from './sea-floor-layout.js';
import { SimulationCaution } from './simulation-caution.js';
import { stepWithin, ValueStepper } from './value-stepper.js';
import { useVisitorParams } from './use-visitor-params.js';
import { visuallyHidden } from './visually-hidden.js';
import { widgetButtonStyle, widgetControlRowStyle, type WidgetInput } from './widget-controls.js';

export interface SeaFloorDepthProps {
  params: SeaFloorDepthParams;
  locale: string;
  /** Called with the new params when the visitor changes the age or the model. */
  onParamsChange?: (params: SeaFloorDepthParams) => void;
  showCaution?: boolean;
  /** Largest drawn width in CSS px; the drawing scales down to fit. */
  maxWidth?: number;
  /** The words drawn on the profile against their standard size: the visitor's Larger text on a kiosk. */
  textScale?: number;
  /** How the visitor moves it, for the instructions: a finger on a kiosk. */
  input?: WidgetInput;
}

const VIEW = SEA_FLOOR_VIEW;
const COLOURS = { water: '#cfe3ee', floor: '#0b3f5c', halfSpace: '#0b3f5c', plate: '#8a3412', lithosphere: '#b9a68a', text: '#24282c', marker: '#24282c' };
/** Smallest age a finger or key can pick: the models need some cooling to speak of. */
const MIN_AGE_MYR = 0.5;
const AGE_STEP_MYR = 5;
const SAMPLES = 120;
/** The model not chosen: outlined in the panel's text colour, so it keeps its contrast in either theme. */
const unchosenButtonStyle = { ...widgetButtonStyle, background: 'transparent', color: 'inherit' };

/** Age runs left to right along the axis, from the ridge crest to the oldest floor the widget takes. */
interface AgeAxis {
  left: number;
  right: number;
}
const xOf = (axis: AgeAxis, ageMyr: number) => axis.left + (ageMyr / SEA_FLOOR_AGE_MAX_MYR) * (axis.right - axis.left);
const ageAt = (axis: AgeAxis, x: number) => ((x - axis.left) / (axis.right - axis.left)) * SEA_FLOOR_AGE_MAX_MYR;
const clampAge = (ageMyr: number) => Math.round(Math.min(SEA_FLOOR_AGE_MAX_MYR, Math.max(MIN_AGE_MYR, ageMyr)) * 2) / 2;

/**
 * The curves of both models, sampled from the ridge outwards (the first sample just off the crest):
 * one computation per age gives both models' depths and the chosen model's thickness.
 */
function profiles(params: SeaFloorDepthParams, axis: AgeAxis) {
  const samples = Array.from({ length: SAMPLES + 1 }, (_, index) => {
    const age = Math.max(0.2, (index / SAMPLES) * SEA_FLOOR_AGE_MAX_MYR);
    return { x: xOf(axis, age), result: computeSeaFloorDepth({ ...params, ageMyr: age }) };
  });
  const path = (y: (result: SeaFloorDepthResult) => number) => samples.map(({ x, result }, index) => `${index === 0 ? 'M' : 'L'} ${x} ${y(result)}`).join(' ');
  return {
    halfSpace: path((result) => seaY(result.halfSpaceDepthM)),
    plate: path((result) => seaY(result.plateDepthM)),
    lithosphere: path((result) => lithosphereY(result.lithosphereThicknessKm)),
  };
}

/**
 * Sea floor from the ridge crest to old ocean: depth by the half-space and the plate model, the
 * cooled lithosphere underneath, and the floor's heat flow at the age the visitor picks by dragging
 * along the floor, with the buttons or with the arrow keys.
 */
export function SeaFloorDepth({ params, locale, onParamsChange, showCaution = false, maxWidth = 560, textScale = 1, input = 'desk' }: SeaFloorDepthProps) {
  const strings = widgetStrings(locale).seaFloorDepth;
  const [shown, change] = useVisitorParams(params, onParamsChange);
  const descriptionId = useId();
  const statusId = useId();
  const changeAge = (ageMyr: number) => {
    const next = clampAge(ageMyr);
    if (next !== shown.ageMyr) change({ ageMyr: next });
  };

  const age = formatMillionYears(shown.ageMyr, locale);
  const layout = layoutSeaFloor({
    texts: {
      ridge: strings.ridge,
      seaLevel: strings.seaLevel,
      thickness: strings.thickness,
      depthTicks: DEPTH_TICKS_M.map((depthM) => formatQuantity(depthM / 1000, 'km', locale)),
      thicknessTicks: THICKNESS_TICKS_KM.map((km) => formatQuantity(km, 'km', locale)),
      age,
    },
    ageMyr: shown.ageMyr,
    maxAgeMyr: SEA_FLOOR_AGE_MAX_MYR,
    textScale,
  });
  const { axis } = layout;
  const slider = drawingSliderHandlers({
    view: VIEW,
    valueAt: ({ x }) => ageAt(axis, x),
    value: shown.ageMyr,
    step: 1,
    fineStep: 0.5,
    pageStep: 10,
    min: MIN_AGE_MYR,
    max: SEA_FLOOR_AGE_MAX_MYR,
    onChange: changeAge,
  });

  const result = computeSeaFloorDepth(shown);
  const curves = profiles(shown, axis);
  const markerX = xOf(axis, shown.ageMyr);
  const chosen = (model: SeaFloorModel) => shown.model === model;
  const younger = stepWithin(shown.ageMyr, -AGE_STEP_MYR, 1, SEA_FLOOR_AGE_MAX_MYR);
  const older = stepWithin(shown.ageMyr, AGE_STEP_MYR, 1, SEA_FLOOR_AGE_MAX_MYR);

  return (
    <figure className="mp-sea-floor-depth" style={{ margin: 0, maxWidth }}>
      <svg
        viewBox={`0 0 ${VIEW.width} ${VIEW.height}`}
        role="slider"
        tabIndex={0}
        aria-label={`${strings.title}: ${strings.ageLabel}`}
        aria-valuemin={MIN_AGE_MYR}
        aria-valuemax={SEA_FLOOR_AGE_MAX_MYR}
        aria-valuenow={shown.ageMyr}
        aria-valuetext={`${age}, ${formatDepthKm(result.depthM, locale)}`}
        aria-describedby={`${statusId} ${descriptionId}`}
        {...slider}
        style={{ direction: 'ltr', width: '100%', aspectRatio: `${VIEW.width} / ${VIEW.height}`, touchAction: 'none', cursor: 'ew-resize', display: 'block', background: '#f6efe2', borderRadius: 8 }}
      >
        <title>{strings.title}</title>
        <path d={`${curves[shown.model === 'plate' ? 'plate' : 'halfSpace']} L ${axis.right} ${SEA.top} L ${axis.left} ${SEA.top} Z`} fill={COLOURS.water} />
        <line x1={axis.left} y1={SEA.top} x2={axis.right} y2={SEA.top} stroke={COLOURS.floor} strokeWidth={2} />
        {DEPTH_TICKS_M.map((depthM) => (
          <line key={depthM} x1={axis.left - 4} y1={seaY(depthM)} x2={axis.left} y2={seaY(depthM)} stroke={COLOURS.text} />
        ))}
        <path d={curves.halfSpace} fill="none" stroke={COLOURS.halfSpace} strokeWidth={chosen('half-space') ? 4 : 2} strokeDasharray="8 5" data-curve="half-space" />
        <path d={curves.plate} fill="none" stroke={COLOURS.plate} strokeWidth={chosen('plate') ? 4 : 2} data-curve="plate" />
        <path d={`${curves.lithosphere} L ${axis.right} ${LITHOSPHERE.top} L ${axis.left} ${LITHOSPHERE.top} Z`} fill={COLOURS.lithosphere} />
        <line x1={axis.left} y1={lithosphereY(GDH1.plateThicknessKm)} x2={axis.right} y2={lithosphereY(GDH1.plateThicknessKm)} stroke={COLOURS.plate} strokeDasharray="3 4" />
        <line x1={markerX} y1={SEA.top} x2={markerX} y2={LITHOSPHERE.bottom} stroke={COLOURS.marker} strokeWidth={2} />
        <circle cx={markerX} cy={seaY(result.depthM)} r={9} fill="#fffdf7" stroke={COLOURS.marker} strokeWidth={3} />
        <circle cx={markerX} cy={lithosphereY(result.lithosphereThicknessKm)} r={6} fill="#fffdf7" stroke={COLOURS.marker} strokeWidth={2} />
        {seaFloorLabels(layout).map((item, index) => (
          <text key={index} x={item.x} y={item.y} fontSize={item.fontSize} fontWeight={item === layout.age ? 700 : undefined} textAnchor={item.anchor} dominantBaseline="middle" fill={COLOURS.text} paintOrder="stroke" stroke="#f6efe2" strokeWidth={4}>
            {item.text}
          </text>
        ))}
      </svg>
      <p id={statusId} role="status" data-model={shown.model} style={{ margin: '0.5em 0', display: 'grid', gridTemplateColumns: 'auto 1fr', gap: '0 0.75em' }}>
        <span>{strings.depth}</span>
        <strong data-readout="depth"><bdi dir="ltr">{formatDepthKm(result.depthM, locale)}</bdi></strong>
        <span>{strings.heatFlow}</span>
        <strong data-readout="heat-flow"><bdi dir="ltr">{formatHeatFlow(result.heatFlowMWm2, locale)}</bdi></strong>
        <span>{strings.thickness}</span>
        <strong data-readout="thickness"><bdi dir="ltr">{formatThicknessKm(result.lithosphereThicknessKm, locale)}</bdi></strong>
      </p>
      <ValueStepper
        label={strings.ageLabel}
        shown={age}
        lessLabel={strings.younger}
        moreLabel={strings.older}
        onLess={younger === undefined ? undefined : () => changeAge(younger)}
        onMore={older === undefined ? undefined : () => changeAge(older)}
      />
      <div role="group" aria-label={strings.modelLabel} style={widgetControlRowStyle}>
        {(['half-space', 'plate'] as const).map((model) => (
          <button key={model} type="button" aria-pressed={chosen(model)} onClick={() => chosen(model) || change({ model })} style={chosen(model) ? widgetButtonStyle : unchosenButtonStyle}>
            {model === 'plate' ? strings.plate : strings.halfSpace}
          </button>
        ))}
      </div>
      <figcaption style={{ fontSize: '0.9em' }}>{input === 'touch' ? strings.instructionsTouch : strings.instructions}</figcaption>
      <p id={descriptionId} style={visuallyHidden}>
        {seaFloorDepth.describe(shown, locale)}
      </p>
      {showCaution ? <SimulationCaution locale={locale} /> : null}
    </figure>
  );
}
