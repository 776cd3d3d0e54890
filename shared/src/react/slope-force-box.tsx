import { useCallback, useEffect, useId, useRef, useState } from 'react';
import { interpolate, widgetStrings } from '../i18n/index.js';
import { formatLiveValue } from '../panel/live-value/live-value-format.js';
import { directionOf } from '../panel/panel-presentation.js';
import { computeSlopeForce, formatAngle, formatForce, slopeForce, slopeForceOutputs, type SlopeForceParams, type SlopeForceResult } from '../widgets/slope-force/index.js';
import { drawingSliderHandlers } from './drawing-slider.js';
import { SimulationCaution } from './simulation-caution.js';
import { BOARD, FOOT, layoutSlope, PIVOT, SLOPE_PALETTE, SLOPE_VIEW, START, type ForceName, type LabelLayout, type Point } from './slope-force-layout.js';
import { useReducedMotion } from './use-reduced-motion.js';
import { visuallyHidden } from './visually-hidden.js';
import { widgetButtonStyle, widgetControlRowStyle, type WidgetInput } from './widget-controls.js';

export interface SlopeForceBoxProps {
  params: SlopeForceParams;
  locale: string;
  /** Called with the new params when the visitor tilts the slope. */
  onParamsChange?: (params: SlopeForceParams) => void;
  /** Show the "simplified teaching model" caution (the studio shows it where curators set params). */
  showCaution?: boolean;
  /** The kiosk's reduced-motion toggle; without it the system setting counts. */
  reducedMotion?: boolean;
  /** Largest drawn width in CSS px; the drawing scales down to fit. */
  maxWidth?: number;
  /** The words drawn on the slope against their standard size: the visitor's Larger text on a kiosk. */
  textScale?: number;
  /** How the visitor moves it, for the instructions: a finger on a kiosk. */
  input?: WidgetInput;
  /** Significant digits of the live values on the same panel, by output name, so drawing and caption round alike. */
  outputDigits?: Readonly<Record<string, number>>;
}

/** The drawing's world units per metre: the board stands for 3 m, so a sliding block crosses it in about a second. */
const PIXELS_PER_METRE = BOARD / 3;
/** A reduced-motion step shows where the block is a quarter of a second later. */
const REDUCED_MOTION_STEP_S = 0.25;
const DEG = Math.PI / 180;
const FORCES = ['weight', 'normal', 'shear', 'friction'] as const satisfies readonly ForceName[];
const FORCE_OUTPUT = { weight: 'weightN', normal: 'normalN', shear: 'shearN', friction: 'frictionN' } as const satisfies Record<ForceName, keyof SlopeForceResult>;
/** The weight and friction solid, the weight's two parts dashed: told apart by more than colour. */
const FORCE_DASH: Record<ForceName, string | undefined> = { weight: undefined, normal: '10 6', shear: '10 6', friction: undefined };

/** Left to right whatever the language around it, so "562 N" and "38.7°" never come out reversed. */
const isolated = (text: string) => `\u2066${text}\u2069`;

const points = (list: Point[]) => list.map((p) => `${p.x},${p.y}`).join(' ');

function ArrowShape({ from, to, colour, dash, width = 4 }: { from: Point; to: Point; colour: string; dash?: string; width?: number }) {
  const length = Math.hypot(to.x - from.x, to.y - from.y);
  if (length < 1) return null;
  const direction = { x: (to.x - from.x) / length, y: (to.y - from.y) / length };
  const head = Math.min(10, length);
  const normal = { x: -direction.y, y: direction.x };
  const back = { x: to.x - direction.x * head, y: to.y - direction.y * head };
  const tip = [to, { x: back.x + (normal.x * head) / 2, y: back.y + (normal.y * head) / 2 }, { x: back.x - (normal.x * head) / 2, y: back.y - (normal.y * head) / 2 }];
  return (
    <g>
      {/* A light casing under each arrow, so it stands out from the board, the block and the ground alike. */}
      <line x1={from.x} y1={from.y} x2={back.x} y2={back.y} stroke={SLOPE_PALETTE.casing} strokeWidth={width + 4} strokeLinecap="round" />
      <polygon points={points(tip)} fill={SLOPE_PALETTE.casing} stroke={SLOPE_PALETTE.casing} strokeWidth={4} strokeLinejoin="round" />
      <line x1={from.x} y1={from.y} x2={back.x} y2={back.y} stroke={colour} strokeWidth={width} strokeDasharray={dash} />
      <polygon points={points(tip)} fill={colour} />
    </g>
  );
}

/**
 * A block on a tilting slope: its weight split into the part pressing into the slope and the part
 * pulling it down, against friction. Tilt it by dragging (finger or mouse) or with the arrow keys.
 * The forces are named, with their values, in a key below the drawing, where the words can wrap
 * and grow with the panel's text; the drawing keeps only the angle and the critical angle.
 */
export function SlopeForceBox({ params, locale, onParamsChange, showCaution = false, reducedMotion, maxWidth = 560, textScale = 1, input = 'desk', outputDigits = {} }: SlopeForceBoxProps) {
  const strings = widgetStrings(locale).slopeForce;
  const reduce = useReducedMotion(reducedMotion);
  const [angle, setAngle] = useState(params.angleDeg);
  const [position, setPosition] = useState(START);
  // The animation loop reads and writes these between renders.
  const positionRef = useRef(START);
  const velocity = useRef(0);
  const moveTo = (next: number) => {
    positionRef.current = Math.max(FOOT, next);
    setPosition(positionRef.current);
  };
  const descriptionId = useId();
  const statusId = useId();

  // A new angle from outside replaces the one the visitor moved (state adjusted while rendering, not in an effect).
  const [angleFor, setAngleFor] = useState(params.angleDeg);
  if (angleFor !== params.angleDeg) {
    setAngleFor(params.angleDeg);
    setAngle(params.angleDeg);
  }

  const current = { ...params, angleDeg: angle };
  const result = computeSlopeForce(current);
  const { slides, accelerationMs2 } = result;

  const changeAngle = useCallback(
    (next: number) => {
      const clamped = Math.round(Math.min(90, Math.max(0, next)) * 10) / 10;
      setAngle(clamped);
      onParamsChange?.({ ...params, angleDeg: clamped });
    },
    [onParamsChange, params],
  );

  // Static friction holds again once the slope is lowered; a held block does not creep.
  useEffect(() => {
    if (!slides) velocity.current = 0;
  }, [slides]);

  const atFoot = position <= FOOT;
  useEffect(() => {
    if (!slides || reduce || atFoot) return undefined;
    let frame = 0;
    let last: number | undefined;
    const tick = (now: number) => {
      const dt = last === undefined ? 0 : Math.min((now - last) / 1000, 0.05);
      last = now;
      velocity.current += accelerationMs2 * PIXELS_PER_METRE * dt;
      moveTo(positionRef.current - velocity.current * dt);
      if (positionRef.current > FOOT) frame = requestAnimationFrame(tick);
    };
    frame = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(frame);
  }, [slides, reduce, accelerationMs2, atFoot]);

  const stepForward = () => {
    const a = accelerationMs2 * PIXELS_PER_METRE;
    const dt = REDUCED_MOTION_STEP_S;
    moveTo(positionRef.current - (velocity.current * dt + 0.5 * a * dt * dt));
    velocity.current += a * dt;
  };

  const reset = () => {
    velocity.current = 0;
    moveTo(START);
  };

  const slider = drawingSliderHandlers({
    view: SLOPE_VIEW,
    valueAt: ({ x, y }) => Math.atan2(PIVOT.y - y, Math.max(x - PIVOT.x, 0)) / DEG,
    value: angle,
    step: 1,
    fineStep: 0.1,
    pageStep: 10,
    min: 0,
    max: 90,
    onChange: changeAngle,
  });

  // One formatter for the drawing and the live values beside it: a value a caption shows rounds as the caption does.
  const shown = (output: keyof SlopeForceResult, value: number, own: (value: number, locale: string) => string) => {
    const digits = outputDigits[output];
    const declared = slopeForceOutputs.find((candidate) => candidate.name === output);
    const unit = declared?.kind === 'number' ? declared.unit : undefined;
    return digits !== undefined && unit !== undefined ? formatLiveValue(value, { digits, unit }, locale) : own(value, locale);
  };
  const angleText = formatAngle(angle, locale);
  const criticalText = interpolate(strings.criticalAngle, { angle: isolated(shown('criticalAngleDeg', result.criticalAngleDeg, formatAngle)) });
  const layout = layoutSlope({ angleDeg: angle, position, result, angleText, criticalText, textScale });
  const dir = directionOf(locale);
  const anchor = (label: LabelLayout) => ({
    x: label.edge === 'left' ? label.box.x : label.box.x + label.box.width,
    y: label.box.y + label.box.height / 2,
    // SVG anchors by the text's own direction: in Arabic its start is on the right.
    textAnchor: (label.edge === 'left') === (dir === 'ltr') ? ('start' as const) : ('end' as const),
  });
  const { pivot, boardEnd, arc, criticalLine, handle } = layout;
  const cos = Math.cos(angle * DEG);
  const sin = Math.sin(angle * DEG);
  const stateText = slides ? strings.slides : strings.holds;
  const description = slopeForce.describe(current, locale);

  return (
    <figure className="mp-slope-force-box" style={{ margin: 0, maxWidth }}>
      <svg
        viewBox={`0 0 ${SLOPE_VIEW.width} ${SLOPE_VIEW.height}`}
        role="slider"
        tabIndex={0}
        aria-label={`${strings.title}: ${strings.angleLabel}`}
        aria-valuemin={0}
        aria-valuemax={90}
        aria-valuenow={angle}
        aria-valuetext={`${angleText}, ${stateText}`}
        aria-describedby={`${statusId} ${descriptionId}`}
        {...slider}
        style={{ width: '100%', aspectRatio: `${SLOPE_VIEW.width} / ${SLOPE_VIEW.height}`, touchAction: 'none', cursor: 'grab', display: 'block', background: SLOPE_PALETTE.background, borderRadius: 8 }}
      >
        <title>{strings.title}</title>
        <line x1={12} y1={pivot.y} x2={SLOPE_VIEW.width - 12} y2={pivot.y} stroke={SLOPE_PALETTE.ink} strokeWidth={2} />
        <polygon points={points([pivot, boardEnd, { x: boardEnd.x, y: pivot.y }])} fill={SLOPE_PALETTE.wedge} />
        <line x1={criticalLine.from.x} y1={criticalLine.from.y} x2={criticalLine.to.x} y2={criticalLine.to.y} stroke={SLOPE_PALETTE.ink} strokeWidth={1.5} strokeDasharray="6 5" />
        <line x1={pivot.x} y1={pivot.y} x2={boardEnd.x} y2={boardEnd.y} stroke={SLOPE_PALETTE.board} strokeWidth={8} strokeLinecap="round" />
        <path d={`M ${pivot.x + arc.radius} ${pivot.y} A ${arc.radius} ${arc.radius} 0 0 0 ${pivot.x + arc.radius * cos} ${pivot.y - arc.radius * sin}`} fill="none" stroke={SLOPE_PALETTE.ink} strokeWidth={2} />
        <polygon points={points(layout.block)} fill={SLOPE_PALETTE.block} stroke={SLOPE_PALETTE.ink} strokeWidth={2} strokeLinejoin="round" />
        {layout.arrows.map((arrow) => <ArrowShape key={arrow.force} from={arrow.from} to={arrow.to} colour={SLOPE_PALETTE.arrows[arrow.force]} dash={FORCE_DASH[arrow.force]} />)}
        <text {...anchor(layout.angleLabel)} fontSize={layout.angleLabel.fontSize} fontWeight={700} fill={SLOPE_PALETTE.ink} dominantBaseline="middle">
          {isolated(angleText)}
        </text>
        <g>
          <line x1={layout.criticalKey.from.x} y1={layout.criticalKey.from.y} x2={layout.criticalKey.to.x} y2={layout.criticalKey.to.y} stroke={SLOPE_PALETTE.ink} strokeWidth={1.5} strokeDasharray="6 5" />
          <text {...anchor(layout.criticalLabel)} direction={dir} fontSize={layout.criticalLabel.fontSize} fill={SLOPE_PALETTE.ink} dominantBaseline="middle">
            {criticalText}
          </text>
        </g>
        <circle cx={handle.centre.x} cy={handle.centre.y} r={handle.radius} fill={SLOPE_PALETTE.casing} stroke={SLOPE_PALETTE.board} strokeWidth={3} />
        <path d={`M ${boardEnd.x - 7} ${boardEnd.y - 3} L ${boardEnd.x} ${boardEnd.y - 10} L ${boardEnd.x + 7} ${boardEnd.y - 3} M ${boardEnd.x - 7} ${boardEnd.y + 3} L ${boardEnd.x} ${boardEnd.y + 10} L ${boardEnd.x + 7} ${boardEnd.y + 3}`} stroke={SLOPE_PALETTE.board} strokeWidth={2.5} fill="none" />
      </svg>
      <p id={statusId} role="status" data-state={slides ? 'slides' : 'holds'} style={{ display: 'flex', flexWrap: 'wrap', alignItems: 'baseline', gap: '0 0.5em', fontWeight: 700, fontSize: '1.1em', margin: '0.4em 0' }}>
        <span aria-hidden="true">{slides ? '↘' : '■'}</span>
        <span>{stateText}</span>
        <span style={{ fontWeight: 400, fontSize: '0.85em' }}>{slides ? strings.slidesDetail : strings.holdsDetail}</span>
      </p>
      <ul className="mp-slope-forces" style={{ listStyle: 'none', margin: '0.3em 0', padding: 0, display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(12em, 1fr))', gap: '0.2em 1em', fontSize: '0.85em' }}>
        {FORCES.map((force) => (
          <li key={force} data-force={force} style={{ display: 'flex', alignItems: 'center', gap: '0.4em' }}>
            <svg viewBox="0 0 48 20" aria-hidden="true" style={{ width: '2.4em', height: '1em', flex: 'none', background: SLOPE_PALETTE.background, borderRadius: 4 }}>
              <ArrowShape from={{ x: 6, y: 10 }} to={{ x: 44, y: 10 }} colour={SLOPE_PALETTE.arrows[force]} dash={FORCE_DASH[force]} width={3} />
            </svg>
            <span>
              {strings[force]} <bdi dir="ltr" style={{ fontWeight: 700, whiteSpace: 'nowrap' }}>{shown(FORCE_OUTPUT[force], result[FORCE_OUTPUT[force]], formatForce)}</bdi>
            </span>
          </li>
        ))}
      </ul>
      <figcaption style={{ fontSize: '0.85em' }}>{input === 'touch' ? strings.instructionsTouch : strings.instructions}</figcaption>
      <p id={descriptionId} style={visuallyHidden}>
        {description}
      </p>
      {(reduce && slides && !atFoot) || position < START ? (
        <div style={widgetControlRowStyle}>
          {reduce && slides && !atFoot ? (
            <button type="button" onClick={stepForward} style={widgetButtonStyle}>
              {strings.step}
            </button>
          ) : null}
          {position < START ? (
            <button type="button" onClick={reset} style={widgetButtonStyle}>
              {strings.reset}
            </button>
          ) : null}
        </div>
      ) : null}
      {showCaution ? <SimulationCaution locale={locale} /> : null}
    </figure>
  );
}
