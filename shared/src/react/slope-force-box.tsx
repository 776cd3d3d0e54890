import { useCallback, useEffect, useId, useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { interpolate, widgetStrings } from '../i18n/index.js';
import { computeSlopeForce, formatAngle, formatForce, slopeForce, type SlopeForceParams } from '../widgets/slope-force/index.js';
import { SimulationCaution } from './simulation-caution.js';
import { useReducedMotion } from './use-reduced-motion.js';
import { visuallyHidden } from './visually-hidden.js';

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
}

const VIEW = { width: 480, height: 330 };
const PIVOT = { x: 60, y: 290 };
const BOARD = 360;
const BLOCK = 48;
/** The drawn board stands for 3 m, so a sliding block crosses it in about a second at typical accelerations. */
const PIXELS_PER_METRE = BOARD / 3;
const START = BOARD * 0.62;
const BOTTOM = BLOCK / 2 + 4;
/** Longest drawn force arrow, for the weight; the components are drawn to the same scale. */
const WEIGHT_ARROW = 110;
/** A reduced-motion step shows where the block is a quarter of a second later. */
const REDUCED_MOTION_STEP_S = 0.25;
const DEG = Math.PI / 180;

const COLOURS = { weight: '#2f3a44', normal: '#1b5e8c', shear: '#b3470c', friction: '#4f5d1f', board: '#6b5a45', block: '#8a9199' };

interface Point {
  x: number;
  y: number;
}

const along = (from: Point, direction: Point, length: number): Point => ({ x: from.x + direction.x * length, y: from.y + direction.y * length });

function Arrow({ from, direction, length, colour, label }: { from: Point; direction: Point; length: number; colour: string; label: string }) {
  if (length < 1) return null;
  const tip = along(from, direction, length);
  const head = 9;
  const normal = { x: -direction.y, y: direction.x };
  const back = along(tip, direction, -head);
  const points = [tip, along(back, normal, head / 2), along(back, normal, -head / 2)].map((p) => `${p.x},${p.y}`).join(' ');
  const labelAt = along(tip, direction, 14);
  return (
    <g>
      <line x1={from.x} y1={from.y} x2={back.x} y2={back.y} stroke={colour} strokeWidth={4} strokeLinecap="round" />
      <polygon points={points} fill={colour} />
      <text x={labelAt.x} y={labelAt.y} fill={colour} fontSize={13} fontWeight={600} textAnchor={direction.x < -0.3 ? 'end' : direction.x > 0.3 ? 'start' : 'middle'} dominantBaseline="middle" paintOrder="stroke" stroke="#fffdf7" strokeWidth={4}>
        {label}
      </text>
    </g>
  );
}

/**
 * A block on a tilting slope: its weight split into the part pressing into the slope and the part
 * pulling it down, against friction. Tilt it by dragging (mouse or touch) or with the arrow keys.
 */
export function SlopeForceBox({ params, locale, onParamsChange, showCaution = false, reducedMotion, maxWidth = 560 }: SlopeForceBoxProps) {
  const strings = widgetStrings(locale).slopeForce;
  const reduce = useReducedMotion(reducedMotion);
  const [angle, setAngle] = useState(params.angleDeg);
  const [position, setPosition] = useState(START);
  // The animation loop reads and writes these between renders.
  const positionRef = useRef(START);
  const velocity = useRef(0);
  const moveTo = (next: number) => {
    positionRef.current = Math.max(BOTTOM, next);
    setPosition(positionRef.current);
  };
  const descriptionId = useId();
  const statusId = useId();

  useEffect(() => setAngle(params.angleDeg), [params.angleDeg]);

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

  const atBottom = position <= BOTTOM;
  useEffect(() => {
    if (!slides || reduce || atBottom) return undefined;
    let frame = 0;
    let last: number | undefined;
    const tick = (now: number) => {
      const dt = last === undefined ? 0 : Math.min((now - last) / 1000, 0.05);
      last = now;
      velocity.current += accelerationMs2 * PIXELS_PER_METRE * dt;
      moveTo(positionRef.current - velocity.current * dt);
      if (positionRef.current > BOTTOM) frame = requestAnimationFrame(tick);
    };
    frame = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(frame);
  }, [slides, reduce, accelerationMs2, atBottom]);

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

  const angleFromPointer = (event: PointerEvent<SVGSVGElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    if (box.width === 0 || box.height === 0) return;
    const x = ((event.clientX - box.left) / box.width) * VIEW.width;
    const y = ((event.clientY - box.top) / box.height) * VIEW.height;
    changeAngle(Math.atan2(PIVOT.y - y, Math.max(x - PIVOT.x, 0)) / DEG);
  };

  const onPointerDown = (event: PointerEvent<SVGSVGElement>) => {
    event.currentTarget.setPointerCapture?.(event.pointerId);
    event.currentTarget.focus();
    angleFromPointer(event);
  };
  const onPointerMove = (event: PointerEvent<SVGSVGElement>) => {
    if (event.currentTarget.hasPointerCapture?.(event.pointerId)) angleFromPointer(event);
  };

  const onKeyDown = (event: KeyboardEvent<SVGSVGElement>) => {
    const fine = event.shiftKey ? 0.1 : 1;
    const moves: Record<string, number | undefined> = {
      ArrowUp: angle + fine,
      ArrowRight: angle + fine,
      ArrowDown: angle - fine,
      ArrowLeft: angle - fine,
      PageUp: angle + 10,
      PageDown: angle - 10,
      Home: 0,
      End: 90,
    };
    const next = moves[event.key];
    if (next === undefined) return;
    event.preventDefault();
    changeAngle(next);
  };

  const cos = Math.cos(angle * DEG);
  const sin = Math.sin(angle * DEG);
  const uphill = { x: cos, y: -sin };
  const downhill = { x: -cos, y: sin };
  const intoSlope = { x: sin, y: cos };
  const outOfSlope = { x: -sin, y: -cos };
  const end = along(PIVOT, uphill, BOARD);
  const contact = along(PIVOT, uphill, position);
  const centre = along(contact, outOfSlope, BLOCK / 2);
  const scale = WEIGHT_ARROW / result.weightN;
  const arc = 56;
  const critical = result.criticalAngleDeg;
  const criticalEnd = along(PIVOT, { x: Math.cos(critical * DEG), y: -Math.sin(critical * DEG) }, BOARD * 0.85);
  const stateText = slides ? strings.slides : strings.holds;
  const description = slopeForce.describe(current, locale);

  return (
    <figure className="mp-slope-force-box" style={{ margin: 0, maxWidth }}>
      <svg
        viewBox={`0 0 ${VIEW.width} ${VIEW.height}`}
        role="slider"
        tabIndex={0}
        aria-label={`${strings.title}: ${strings.angleLabel}`}
        aria-valuemin={0}
        aria-valuemax={90}
        aria-valuenow={angle}
        aria-valuetext={`${formatAngle(angle, locale)}, ${stateText}`}
        aria-describedby={`${statusId} ${descriptionId}`}
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onKeyDown={onKeyDown}
        style={{ width: '100%', aspectRatio: `${VIEW.width} / ${VIEW.height}`, touchAction: 'none', cursor: 'grab', display: 'block', background: '#f6efe2', borderRadius: 8 }}
      >
        <title>{strings.title}</title>
        <line x1={20} y1={PIVOT.y} x2={VIEW.width - 20} y2={PIVOT.y} stroke="#4a4a4a" strokeWidth={2} />
        <polygon points={`${PIVOT.x},${PIVOT.y} ${end.x},${end.y} ${end.x},${PIVOT.y}`} fill="#e4d6bd" />
        <line x1={PIVOT.x} y1={PIVOT.y} x2={criticalEnd.x} y2={criticalEnd.y} stroke="#4a4a4a" strokeWidth={1.5} strokeDasharray="6 5" />
        <text x={criticalEnd.x + 6} y={criticalEnd.y - 6} fontSize={12} fill="#3a3a3a">
          {interpolate(strings.criticalAngle, { angle: formatAngle(critical, locale) })}
        </text>
        <line x1={PIVOT.x} y1={PIVOT.y} x2={end.x} y2={end.y} stroke={COLOURS.board} strokeWidth={8} strokeLinecap="round" />
        <path d={`M ${PIVOT.x + arc} ${PIVOT.y} A ${arc} ${arc} 0 0 0 ${PIVOT.x + arc * cos} ${PIVOT.y - arc * sin}`} fill="none" stroke="#3a3a3a" strokeWidth={2} />
        <text x={PIVOT.x + (arc + 22) * Math.cos((angle / 2) * DEG)} y={PIVOT.y - (arc + 12) * Math.sin((angle / 2) * DEG)} fontSize={15} fontWeight={700} fill="#222" dominantBaseline="middle">
          {formatAngle(angle, locale)}
        </text>
        <g transform={`rotate(${-angle} ${contact.x} ${contact.y})`}>
          <rect x={contact.x - BLOCK / 2} y={contact.y - BLOCK} width={BLOCK} height={BLOCK} rx={4} fill={COLOURS.block} stroke="#2f3a44" strokeWidth={2} />
        </g>
        <Arrow from={centre} direction={{ x: 0, y: 1 }} length={result.weightN * scale} colour={COLOURS.weight} label={`${strings.weight} ${formatForce(result.weightN, locale)}`} />
        <Arrow from={centre} direction={intoSlope} length={result.normalN * scale} colour={COLOURS.normal} label={`${strings.normal} ${formatForce(result.normalN, locale)}`} />
        <Arrow from={centre} direction={downhill} length={result.shearN * scale} colour={COLOURS.shear} label={`${strings.shear} ${formatForce(result.shearN, locale)}`} />
        <Arrow from={contact} direction={uphill} length={result.frictionN * scale} colour={COLOURS.friction} label={`${strings.friction} ${formatForce(result.frictionN, locale)}`} />
        <circle cx={end.x} cy={end.y} r={20} fill="#fffdf7" stroke={COLOURS.board} strokeWidth={3} />
        <path d={`M ${end.x - 7} ${end.y - 3} L ${end.x} ${end.y - 10} L ${end.x + 7} ${end.y - 3} M ${end.x - 7} ${end.y + 3} L ${end.x} ${end.y + 10} L ${end.x + 7} ${end.y + 3}`} stroke={COLOURS.board} strokeWidth={2.5} fill="none" />
      </svg>
      <p id={statusId} role="status" data-state={slides ? 'slides' : 'holds'} style={{ display: 'flex', alignItems: 'center', gap: '0.5em', fontWeight: 700, fontSize: '1.15em', margin: '0.5em 0' }}>
        <span aria-hidden="true" style={{ fontSize: '1.2em' }}>{slides ? '↘' : '■'}</span>
        <span>{stateText}</span>
        <span style={{ fontWeight: 400 }}>{slides ? strings.slidesDetail : strings.holdsDetail}</span>
      </p>
      <figcaption style={{ fontSize: '0.9em' }}>{strings.instructions}</figcaption>
      <p id={descriptionId} style={visuallyHidden}>
        {description}
      </p>
      <div style={{ display: 'flex', gap: '0.5em', marginTop: '0.5em' }}>
        {reduce && slides && !atBottom ? (
          <button type="button" onClick={stepForward} style={{ minHeight: 44, minWidth: 44 }}>
            {strings.step}
          </button>
        ) : null}
        {position < START ? (
          <button type="button" onClick={reset} style={{ minHeight: 44, minWidth: 44 }}>
            {strings.reset}
          </button>
        ) : null}
      </div>
      {showCaution ? <SimulationCaution locale={locale} /> : null}
    </figure>
  );
}
