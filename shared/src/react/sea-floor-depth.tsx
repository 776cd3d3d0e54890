import { useEffect, useId, useState } from 'react';
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
import { SimulationCaution } from './simulation-caution.js';
import { stepWithin, ValueStepper } from './value-stepper.js';
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
  /** How the visitor moves it, for the instructions: a finger on a kiosk. */
  input?: WidgetInput;
}

const VIEW = { width: 480, height: 330 };
/** Age runs left to right, from the ridge crest to the oldest floor the widget takes. */
const AGE_AXIS = { left: 56, right: 464 };
/** Upper band: the sea, from sea level down to 8 km (the half-space floor reaches 7.5 km at 200 Myr). */
const SEA = { top: 34, bottom: 180, deepestM: 8000 };
/** Lower band: the cooled lithosphere under the floor, down to 150 km (a different scale, said on the drawing). */
const LITHOSPHERE = { top: 206, bottom: 316, deepestKm: 150 };
const COLOURS = { water: '#cfe3ee', floor: '#0b3f5c', halfSpace: '#0b3f5c', plate: '#8a3412', lithosphere: '#b9a68a', text: '#24282c', marker: '#24282c' };
/** Smallest age a finger or key can pick: the models need some cooling to speak of. */
const MIN_AGE_MYR = 0.5;
const AGE_STEP_MYR = 5;
/** Half the width of the longest age label ("200 million years" and its translations), so it stays inside the drawing. */
const AGE_LABEL_INSET = 80;
const SAMPLES = 120;
/** The model not chosen: outlined in the panel's text colour, so it keeps its contrast in either theme. */
const unchosenButtonStyle = { ...widgetButtonStyle, background: 'transparent', color: 'inherit' };

const xOf = (ageMyr: number) => AGE_AXIS.left + (ageMyr / SEA_FLOOR_AGE_MAX_MYR) * (AGE_AXIS.right - AGE_AXIS.left);
const ageAt = (x: number) => ((x - AGE_AXIS.left) / (AGE_AXIS.right - AGE_AXIS.left)) * SEA_FLOOR_AGE_MAX_MYR;
const seaY = (depthM: number) => SEA.top + (depthM / SEA.deepestM) * (SEA.bottom - SEA.top);
const lithosphereY = (km: number) => LITHOSPHERE.top + (Math.min(km, LITHOSPHERE.deepestKm) / LITHOSPHERE.deepestKm) * (LITHOSPHERE.bottom - LITHOSPHERE.top);
const clampAge = (ageMyr: number) => Math.round(Math.min(SEA_FLOOR_AGE_MAX_MYR, Math.max(MIN_AGE_MYR, ageMyr)) * 2) / 2;

/**
 * The curves of both models, sampled from the ridge outwards (the first sample just off the crest):
 * one computation per age gives both models' depths and the chosen model's thickness.
 */
function profiles(params: SeaFloorDepthParams) {
  const samples = Array.from({ length: SAMPLES + 1 }, (_, index) => {
    const age = Math.max(0.2, (index / SAMPLES) * SEA_FLOOR_AGE_MAX_MYR);
    return { x: xOf(age), result: computeSeaFloorDepth({ ...params, ageMyr: age }) };
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
export function SeaFloorDepth({ params, locale, onParamsChange, showCaution = false, maxWidth = 560, input = 'desk' }: SeaFloorDepthProps) {
  const strings = widgetStrings(locale).seaFloorDepth;
  const [shown, setShown] = useState(params);
  useEffect(() => setShown(params), [params]);
  const descriptionId = useId();
  const statusId = useId();

  const change = (next: Partial<SeaFloorDepthParams>) => {
    const updated = { ...shown, ...next };
    setShown(updated);
    onParamsChange?.(updated);
  };
  const changeAge = (ageMyr: number) => {
    const next = clampAge(ageMyr);
    if (next !== shown.ageMyr) change({ ageMyr: next });
  };

  const slider = drawingSliderHandlers({
    view: VIEW,
    valueAt: ({ x }) => ageAt(x),
    value: shown.ageMyr,
    step: 1,
    fineStep: 0.5,
    pageStep: 10,
    min: MIN_AGE_MYR,
    max: SEA_FLOOR_AGE_MAX_MYR,
    onChange: changeAge,
  });

  const result = computeSeaFloorDepth(shown);
  const curves = profiles(shown);
  const markerX = xOf(shown.ageMyr);
  const age = formatMillionYears(shown.ageMyr, locale);
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
        <path d={`${curves[shown.model === 'plate' ? 'plate' : 'halfSpace']} L ${AGE_AXIS.right} ${SEA.top} L ${AGE_AXIS.left} ${SEA.top} Z`} fill={COLOURS.water} />
        <line x1={AGE_AXIS.left} y1={SEA.top} x2={AGE_AXIS.right} y2={SEA.top} stroke={COLOURS.floor} strokeWidth={2} />
        <text x={AGE_AXIS.right} y={SEA.top - 8} fontSize={14} textAnchor="end" fill={COLOURS.text}>{strings.seaLevel}</text>
        <text x={AGE_AXIS.left} y={SEA.top - 8} fontSize={14} fill={COLOURS.text}>{strings.ridge}</text>
        {[2000, 4000, 6000].map((depthM) => (
          <g key={depthM}>
            <line x1={AGE_AXIS.left - 4} y1={seaY(depthM)} x2={AGE_AXIS.left} y2={seaY(depthM)} stroke={COLOURS.text} />
            <text x={AGE_AXIS.left - 6} y={seaY(depthM)} fontSize={13} textAnchor="end" dominantBaseline="middle" fill={COLOURS.text}>{formatQuantity(depthM / 1000, 'km', locale)}</text>
          </g>
        ))}
        <path d={curves.halfSpace} fill="none" stroke={COLOURS.halfSpace} strokeWidth={chosen('half-space') ? 4 : 2} strokeDasharray="8 5" data-curve="half-space" />
        <path d={curves.plate} fill="none" stroke={COLOURS.plate} strokeWidth={chosen('plate') ? 4 : 2} data-curve="plate" />
        <path d={`${curves.lithosphere} L ${AGE_AXIS.right} ${LITHOSPHERE.top} L ${AGE_AXIS.left} ${LITHOSPHERE.top} Z`} fill={COLOURS.lithosphere} />
        <line x1={AGE_AXIS.left} y1={lithosphereY(GDH1.plateThicknessKm)} x2={AGE_AXIS.right} y2={lithosphereY(GDH1.plateThicknessKm)} stroke={COLOURS.plate} strokeDasharray="3 4" />
        <text x={AGE_AXIS.left + 4} y={LITHOSPHERE.top + 14} fontSize={14} fill={COLOURS.text}>{strings.thickness}</text>
        {[50, 100, 150].map((km) => (
          <text key={km} x={AGE_AXIS.left - 6} y={lithosphereY(km)} fontSize={13} textAnchor="end" dominantBaseline="middle" fill={COLOURS.text}>{formatQuantity(km, 'km', locale)}</text>
        ))}
        <line x1={markerX} y1={SEA.top} x2={markerX} y2={LITHOSPHERE.bottom} stroke={COLOURS.marker} strokeWidth={2} />
        <circle cx={markerX} cy={seaY(result.depthM)} r={9} fill="#fffdf7" stroke={COLOURS.marker} strokeWidth={3} />
        <circle cx={markerX} cy={lithosphereY(result.lithosphereThicknessKm)} r={6} fill="#fffdf7" stroke={COLOURS.marker} strokeWidth={2} />
        <text x={Math.min(Math.max(markerX, AGE_LABEL_INSET), VIEW.width - AGE_LABEL_INSET)} y={VIEW.height - 6} fontSize={13} fontWeight={700} textAnchor="middle" fill={COLOURS.text}>{age}</text>
      </svg>
      <p id={statusId} role="status" data-model={shown.model} style={{ margin: '0.5em 0', display: 'grid', gridTemplateColumns: 'auto 1fr', gap: '0 0.75em' }}>
        <span>{strings.depth}</span>
        <strong data-readout="depth">{formatDepthKm(result.depthM, locale)}</strong>
        <span>{strings.heatFlow}</span>
        <strong data-readout="heat-flow">{formatHeatFlow(result.heatFlowMWm2, locale)}</strong>
        <span>{strings.thickness}</span>
        <strong data-readout="thickness">{formatThicknessKm(result.lithosphereThicknessKm, locale)}</strong>
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
