import { useId } from 'react';
import { formatQuantity, interpolate, widgetStrings } from '../i18n/index.js';
import { formatMillionYears } from '../widgets/convection-cell/index.js';
import { computePlateForces, formatForcePerMetre, plateForces, SLAB_LENGTH_MAX_KM, UPPER_MANTLE_BASE_KM, type PlateForcesParams } from '../widgets/plate-forces/index.js';
import { drawingSliderHandlers } from './drawing-slider.js';
import { DISCONTINUITY_Y, layoutPlateLabels, PLATE, PLATE_VIEW, RIDGE_PUSH_ARROW, RIDGE_X, SEA_LEVEL, TRENCH, UNITS_PER_KM, type PlateLabel } from './plate-forces-layout.js';
import { SimulationCaution } from './simulation-caution.js';
import { stepWithin, ValueStepper } from './value-stepper.js';
import { useVisitorParams } from './use-visitor-params.js';
import { visuallyHidden } from './visually-hidden.js';

export interface PlateForcesProps {
  params: PlateForcesParams;
  locale: string;
  /** Called with the new params when the visitor changes the slab's length or the plate's age. */
  onParamsChange?: (params: PlateForcesParams) => void;
  showCaution?: boolean;
  /** Largest drawn width in CSS px; the drawing scales down to fit. */
  maxWidth?: number;
  /** The words drawn on the plate against their standard size: the visitor's Larger text on a kiosk. */
  textScale?: number;
}

const VIEW = PLATE_VIEW;
const COLOURS = { sea: '#cfe3ee', plate: '#6b5a45', mantle: '#f0d9b5', push: '#0b3f5c', pull: '#8a3412', text: '#24282c' };
const AGE_STEP_MYR = 10;
const LENGTH_STEP_KM = 100;
const DEG = Math.PI / 180;

const roundLength = (km: number) => Math.round(Math.min(SLAB_LENGTH_MAX_KM, Math.max(0, km)) / 10) * 10;

function Arrow({ from, to, colour, label }: { from: { x: number; y: number }; to: { x: number; y: number }; colour: string; label: PlateLabel }) {
  const length = Math.hypot(to.x - from.x, to.y - from.y);
  const unit = { x: (to.x - from.x) / length, y: (to.y - from.y) / length };
  const back = { x: to.x - unit.x * 12, y: to.y - unit.y * 12 };
  const head = [to, { x: back.x - unit.y * 7, y: back.y + unit.x * 7 }, { x: back.x + unit.y * 7, y: back.y - unit.x * 7 }].map((p) => `${p.x},${p.y}`).join(' ');
  return (
    <g>
      <line x1={from.x} y1={from.y} x2={back.x} y2={back.y} stroke={colour} strokeWidth={6} strokeLinecap="round" />
      <polygon points={head} fill={colour} />
      <text x={label.x} y={label.y} fontSize={label.fontSize} fontWeight={700} textAnchor={label.anchor} dominantBaseline="middle" fill={colour} paintOrder="stroke" stroke="#fffdf7" strokeWidth={4}>
        {label.text}
      </text>
    </g>
  );
}

function PlaceLabel({ label }: { label: PlateLabel }) {
  return (
    <text x={label.x} y={label.y} fontSize={label.fontSize} textAnchor={label.anchor} dominantBaseline="middle" fill={COLOURS.text}>
      {label.text}
    </text>
  );
}

/** One force as a bar whose length is to scale with the other's. */
function ForceBar({ label, value, fraction, colour, name }: { label: string; value: string; fraction: number; colour: string; name: string }) {
  return (
    <div style={{ margin: '0.3em 0' }} data-force={name}>
      <div style={{ display: 'flex', justifyContent: 'space-between', gap: '1em' }}>
        <span>{label}</span>
        {/* A number with its unit reads left to right inside Arabic too. */}
        <strong style={{ fontVariantNumeric: 'tabular-nums' }}><bdi dir="ltr">{value}</bdi></strong>
      </div>
      <div aria-hidden="true" style={{ height: '0.6em', background: 'rgba(0,0,0,0.08)', borderRadius: 4 }}>
        <div style={{ width: `${Math.max(fraction * 100, 0.5)}%`, height: '100%', background: colour, borderRadius: 4 }} />
      </div>
    </div>
  );
}

/**
 * A plate from its ridge to the trench where it sinks: ridge push and slab pull per metre of plate
 * edge, side by side to scale, with what resists them named and the caution that both are rough
 * estimates. The visitor drags the slab's tip (or uses the buttons or arrow keys) to lengthen it.
 */
export function PlateForces({ params, locale, onParamsChange, showCaution = false, maxWidth = 560, textScale = 1 }: PlateForcesProps) {
  const strings = widgetStrings(locale).plateForces;
  const [shown, change] = useVisitorParams(params, onParamsChange);
  const descriptionId = useId();
  const statusId = useId();
  const changeLength = (km: number) => {
    const next = roundLength(km);
    if (next !== shown.slabLengthKm) change({ slabLengthKm: next });
  };

  const dip = { x: Math.cos(shown.slabDipDeg * DEG), y: Math.sin(shown.slabDipDeg * DEG) };
  const slabTop = { x: TRENCH.x, y: PLATE.top };
  const drawnLength = shown.slabLengthKm * UNITS_PER_KM;
  const tip = { x: slabTop.x + dip.x * drawnLength, y: slabTop.y + dip.y * drawnLength };

  const slider = drawingSliderHandlers({
    view: VIEW,
    // The finger's distance down the slab, along its dip.
    valueAt: ({ x, y }) => ((x - slabTop.x) * dip.x + (y - slabTop.y) * dip.y) / UNITS_PER_KM,
    value: shown.slabLengthKm,
    step: 50,
    fineStep: 10,
    pageStep: 500,
    min: 0,
    max: SLAB_LENGTH_MAX_KM,
    onChange: changeLength,
  });

  const result = computePlateForces(shown);
  const largest = Math.max(result.ridgePushNPerM, result.slabPullNPerM);
  const state = result.slabPullDominates ? 'slab-pull-dominates' : 'ridge-push-dominates';
  const lengthText = formatQuantity(shown.slabLengthKm, 'km', locale);
  const shorter = stepWithin(shown.slabLengthKm, -LENGTH_STEP_KM, 0, SLAB_LENGTH_MAX_KM);
  const longer = stepWithin(shown.slabLengthKm, LENGTH_STEP_KM, 0, SLAB_LENGTH_MAX_KM);
  const younger = stepWithin(shown.ageMyr, -AGE_STEP_MYR, AGE_STEP_MYR, 200);
  const older = stepWithin(shown.ageMyr, AGE_STEP_MYR, AGE_STEP_MYR, 200);
  const labels = layoutPlateLabels(
    { ridge: strings.ridge, trench: strings.trench, discontinuity: formatQuantity(UPPER_MANTLE_BASE_KM, 'km', locale), ridgePush: strings.ridgePush, slabPull: strings.slabPull },
    textScale,
  );
  const slabNormal = { x: -dip.y * PLATE.thickness, y: dip.x * PLATE.thickness };

  return (
    <figure className="mp-plate-forces" style={{ margin: 0, maxWidth }}>
      <svg
        viewBox={`0 0 ${VIEW.width} ${VIEW.height}`}
        role="slider"
        tabIndex={0}
        aria-label={`${strings.title}: ${strings.slabLengthLabel}`}
        aria-valuemin={0}
        aria-valuemax={SLAB_LENGTH_MAX_KM}
        aria-valuenow={shown.slabLengthKm}
        aria-valuetext={lengthText}
        aria-describedby={`${statusId} ${descriptionId}`}
        {...slider}
        style={{ direction: 'ltr', width: '100%', aspectRatio: `${VIEW.width} / ${VIEW.height}`, touchAction: 'none', cursor: 'grab', display: 'block', background: COLOURS.mantle, borderRadius: 8 }}
      >
        <title>{strings.title}</title>
        <rect x={0} y={0} width={VIEW.width} height={SEA_LEVEL} fill="#f6efe2" />
        <path d={`M 0 ${SEA_LEVEL} L ${VIEW.width} ${SEA_LEVEL} L ${VIEW.width} ${PLATE.top} L ${TRENCH.x + 14} ${PLATE.top + 8} L ${RIDGE_X + 30} ${PLATE.top} Q ${RIDGE_X} ${SEA_LEVEL + 6} 0 ${PLATE.top} Z`} fill={COLOURS.sea} />
        <line x1={0} y1={DISCONTINUITY_Y} x2={VIEW.width} y2={DISCONTINUITY_Y} stroke={COLOURS.text} strokeDasharray="4 5" />
        <PlaceLabel label={labels.discontinuity} />
        <path d={`M ${RIDGE_X} ${PLATE.top - 12} Q ${RIDGE_X + 40} ${PLATE.top} ${TRENCH.x} ${PLATE.top} L ${TRENCH.x} ${PLATE.top + PLATE.thickness} L ${RIDGE_X + 30} ${PLATE.top + PLATE.thickness * 0.4} Z`} fill={COLOURS.plate} />
        {drawnLength > 0 ? (
          <polygon points={[slabTop, tip, { x: tip.x + slabNormal.x, y: tip.y + slabNormal.y }, { x: slabTop.x + slabNormal.x, y: slabTop.y + slabNormal.y }].map((p) => `${p.x},${p.y}`).join(' ')} fill={COLOURS.plate} data-slab="" />
        ) : null}
        <circle cx={tip.x + slabNormal.x / 2} cy={tip.y + slabNormal.y / 2} r={16} fill="#fffdf7" stroke={COLOURS.plate} strokeWidth={3} />
        <PlaceLabel label={labels.ridge} />
        <PlaceLabel label={labels.trench} />
        <Arrow from={RIDGE_PUSH_ARROW.from} to={RIDGE_PUSH_ARROW.to} colour={COLOURS.push} label={labels.ridgePush} />
        {drawnLength > 30 ? (
          <Arrow
            from={{ x: slabTop.x + dip.x * drawnLength * 0.3 - 26 * dip.y, y: slabTop.y + dip.y * drawnLength * 0.3 + 26 * dip.x }}
            to={{ x: slabTop.x + dip.x * drawnLength * 0.8 - 26 * dip.y, y: slabTop.y + dip.y * drawnLength * 0.8 + 26 * dip.x }}
            colour={COLOURS.pull}
            label={labels.slabPull}
          />
        ) : null}
      </svg>
      <div id={statusId} role="status" data-state={state} style={{ margin: '0.5em 0' }}>
        <ForceBar name="ridge-push" label={strings.ridgePush} value={formatForcePerMetre(result.ridgePushNPerM, locale)} fraction={result.ridgePushNPerM / largest} colour={COLOURS.push} />
        <ForceBar name="slab-pull" label={strings.slabPull} value={formatForcePerMetre(result.slabPullNPerM, locale)} fraction={result.slabPullNPerM / largest} colour={COLOURS.pull} />
        <p style={{ margin: '0.3em 0', fontSize: '0.85em' }}>{strings.perMetre}</p>
        <p style={{ margin: '0.3em 0', fontWeight: 700 }}>
          {result.slabPullDominates ? strings.slabPullDominates : strings.ridgePushDominates}
          {'. '}
          <span style={{ fontWeight: 400 }}>{interpolate(strings.ratio, { ratio: formatQuantity(result.slabToRidgeRatio, '', locale, 2) })}</span>
        </p>
      </div>
      <ValueStepper
        label={strings.slabLengthLabel}
        shown={lengthText}
        lessLabel={strings.less}
        moreLabel={strings.more}
        onLess={shorter === undefined ? undefined : () => changeLength(shorter)}
        onMore={longer === undefined ? undefined : () => changeLength(longer)}
      />
      <ValueStepper
        label={strings.ageLabel}
        shown={formatMillionYears(shown.ageMyr, locale)}
        lessLabel={strings.less}
        moreLabel={strings.more}
        onLess={younger === undefined ? undefined : () => change({ ageMyr: younger })}
        onMore={older === undefined ? undefined : () => change({ ageMyr: older })}
      />
      <p style={{ margin: '0.4em 0', fontSize: '0.9em' }}>{strings.resistance}</p>
      <p className="mp-widget-caution" role="note" style={{ margin: '0.4em 0', fontSize: '0.9em' }}>{strings.caution}</p>
      <figcaption style={{ fontSize: '0.9em' }}>{strings.instructions}</figcaption>
      <p id={descriptionId} style={visuallyHidden}>
        {plateForces.describe(shown, locale)}
      </p>
      {showCaution ? <SimulationCaution locale={locale} /> : null}
    </figure>
  );
}
