import { useEffect, useId, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { formatQuantity, interpolate, widgetStrings } from '../i18n/index.js';
import {
  convectionCell,
  formatMillionYears,
  formatSpeedCmYr,
  physicalScales,
  rampLookupTable,
  rayleighOf,
  COLOUR_RAMPS,
  type ConvectionCellParams,
  type ConvectionReport,
} from '../widgets/convection-cell/index.js';
import { drawArrows, drawParticles, drawStreamlines, paintField, rampPositions, streamlineSegments } from './convection-drawing.js';
import type { HostFrame } from './convection-host.js';
import { startConvectionRunner, type ConvectionRunner } from './convection-runner.js';
import { FlashGuard } from './flash-guard.js';
import { SimulationCaution } from './simulation-caution.js';
import { useReducedMotion } from './use-reduced-motion.js';
import { visuallyHidden } from './visually-hidden.js';
import { widgetButtonStyle, widgetControlRowStyle } from './widget-controls.js';

export interface ConvectionCellProps {
  params: ConvectionCellParams;
  locale: string;
  showCaution?: boolean;
  /** The kiosk's reduced-motion toggle; without it the system setting counts. */
  reducedMotion?: boolean;
  /** Drawn width in CSS px. */
  width?: number;
  /** Starting noise seed; the same seed starts the same overturn. */
  seed?: number;
  /** Told what the solver reports each time the readouts change, so live values on the panel follow it. */
  onReport?: (report: ConvectionReport) => void;
}

/** Readouts change four times a second: often enough to follow, slow enough to read. */
const READOUT_INTERVAL_MS = 250;
/**
 * A step on demand replaces the picture at once; taking at most three a second keeps even a
 * visitor tapping fast under three changes a second for any region (WCAG 2.2, 2.3.1).
 */
const SHORTEST_DEMAND_INTERVAL_MS = 1000 / 3;
/** One press of "step" advances as much as half a second of playback would. */
const FRAMES_PER_DEMANDED_STEP = 30;

/**
 * A box of mantle rock heated from below, overturning: the temperature field in one of our ramps,
 * an overlay of the flow, live Nu and Vrms. The solver runs in a Web Worker.
 */
export function ConvectionCell({ params, locale, showCaution = false, reducedMotion, width = 480, seed, onReport }: ConvectionCellProps) {
  const strings = widgetStrings(locale).convectionCell;
  const reduce = useReducedMotion(reducedMotion);
  const [playing, setPlaying] = useState(true);
  const [readout, setReadout] = useState<ConvectionReport>({ time: 0, nusselt: 1, vrms: 0 });
  const [failure, setFailure] = useState<string | null>(null);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const runner = useRef<ConvectionRunner | null>(null);
  const generation = useRef(0);
  const latest = useRef<HostFrame | null>(null);
  const target = useRef<Float32Array>(new Float32Array(0));
  const fieldCanvas = useRef<HTMLCanvasElement | null>(null);
  const streamlines = useRef<{ frame: HostFrame | null; segments: number[] }>({ frame: null, segments: [] });
  const awaiting = useRef(false);
  const lastReadout = useRef(0);
  const lastDemand = useRef(Number.NEGATIVE_INFINITY);
  const framesDrawn = useRef(0);
  const descriptionId = useId();

  const animating = playing && !reduce;
  const table = useMemo(() => rampLookupTable(params.colourRamp), [params.colourRamp]);
  const guard = useMemo(() => new FlashGuard(table), [table]);
  const height = Math.round(width / params.aspectRatio);
  const rayleigh = rayleighOf(params);
  const scales = params.units === 'physical' && params.physical ? physicalScales(params.physical) : undefined;

  const draw = (seconds: number | null) => {
    const frame = latest.current;
    const canvas = canvasRef.current;
    const ctx = canvas?.getContext('2d');
    if (!frame || !canvas || !ctx) return;
    // A frame asked for on demand (reduced motion, paused) is drawn as it is; while playing, the guard paces it.
    const shown = seconds === null ? guard.jumpTo(target.current) : guard.follow(target.current, seconds);
    const field = (fieldCanvas.current ??= document.createElement('canvas'));
    if (field.width !== frame.nx || field.height !== frame.nz) {
      field.width = frame.nx;
      field.height = frame.nz;
    }
    const fieldContext = field.getContext('2d');
    if (!fieldContext) return;
    const image = fieldContext.createImageData(frame.nx, frame.nz);
    paintField(image, shown, table, frame.nx, frame.nz);
    fieldContext.putImageData(image, 0, 0);
    const ratio = window.devicePixelRatio || 1;
    const backingWidth = Math.round(width * ratio);
    const backingHeight = Math.round(height * ratio);
    if (canvas.width !== backingWidth || canvas.height !== backingHeight) {
      canvas.width = backingWidth;
      canvas.height = backingHeight;
    }
    ctx.imageSmoothingEnabled = true;
    ctx.drawImage(field, 0, 0, canvas.width, canvas.height);
    const line = 1.5 * ratio;
    if (params.overlay === 'streamlines') {
      // Contouring is the costliest part of a frame, so it runs once per solver frame, not per drawn frame.
      if (streamlines.current.frame !== frame) streamlines.current = { frame, segments: streamlineSegments(frame.streamFunction, frame.nx, frame.nz) };
      drawStreamlines(ctx, streamlines.current.segments, frame.nx, frame.nz, canvas.width, canvas.height, line);
    }
    if (params.overlay === 'arrows') drawArrows(ctx, frame.arrows, frame.aspectRatio, canvas.width, canvas.height, line);
    if (params.overlay === 'particles') drawParticles(ctx, frame.particles, frame.aspectRatio, canvas.width, canvas.height, 2.5 * ratio);
    framesDrawn.current += 1;
    canvas.dataset.frames = String(framesDrawn.current);
  };
  // The worker's callback and the animation loop outlive a render; they read the current ones through these.
  const drawRef = useRef(draw);
  const animatingRef = useRef(animating);
  const onReportRef = useRef(onReport);
  useLayoutEffect(() => {
    drawRef.current = draw;
    animatingRef.current = animating;
    onReportRef.current = onReport;
  });

  useEffect(() => {
    const started = startConvectionRunner((message) => {
      if (message.generation !== generation.current) return;
      awaiting.current = false;
      if (message.kind === 'error') {
        setFailure(message.message);
        return;
      }
      latest.current = message;
      target.current = rampPositions(message.temperature, target.current);
      const now = performance.now();
      if (now - lastReadout.current >= READOUT_INTERVAL_MS || !animatingRef.current) {
        lastReadout.current = now;
        const report = { time: message.time, nusselt: message.nusselt, vrms: message.vrms };
        setReadout(report);
        onReportRef.current?.(report);
      }
      if (!animatingRef.current) drawRef.current(null);
    });
    runner.current = started;
    return () => started.dispose();
  }, []);
  // A new run clears the last run's failure (state adjusted while rendering, not in an effect).
  const run = [rayleigh, params.aspectRatio, params.nx, params.nz, seed].join(' ');
  const [failureRun, setFailureRun] = useState(run);
  if (failureRun !== run) {
    setFailureRun(run);
    setFailure(null);
  }
  useEffect(() => {
    generation.current += 1;
    awaiting.current = true;
    runner.current?.post({ kind: 'start', generation: generation.current, rayleigh, aspectRatio: params.aspectRatio, nx: params.nx, nz: params.nz, ...(seed === undefined ? {} : { seed }) });
  }, [rayleigh, params.aspectRatio, params.nx, params.nz, seed]);

  useEffect(() => {
    if (!animating) return undefined;
    let frame = 0;
    let last: number | undefined;
    let carry = 0;
    const tick = (now: number) => {
      const seconds = last === undefined ? 0 : Math.min((now - last) / 1000, 0.1);
      last = now;
      if (!awaiting.current && latest.current) {
        carry += params.playbackSpeed;
        const steps = Math.floor(carry);
        carry -= steps;
        if (steps > 0) {
          awaiting.current = true;
          runner.current?.post({ kind: 'advance', generation: generation.current, steps });
        }
      }
      drawRef.current(seconds);
      frame = requestAnimationFrame(tick);
    };
    frame = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(frame);
  }, [animating, params.playbackSpeed]);

  // Redraw a still picture when the look changes while nothing animates.
  useEffect(() => {
    if (!animating) drawRef.current(null);
  }, [animating, params.colourRamp, params.overlay, width]);

  const stepOnDemand = () => {
    const now = performance.now();
    if (now - lastDemand.current < SHORTEST_DEMAND_INTERVAL_MS || awaiting.current) return;
    lastDemand.current = now;
    awaiting.current = true;
    runner.current?.post({ kind: 'advance', generation: generation.current, steps: Math.max(1, Math.round(params.playbackSpeed * FRAMES_PER_DEMANDED_STEP)) });
  };

  const time = scales ? formatMillionYears(readout.time * scales.timeScaleMyr, locale) : formatQuantity(readout.time, '', locale, 3);
  const vrms = scales ? formatSpeedCmYr(readout.vrms * scales.velocityScaleCmYr, locale) : formatQuantity(readout.vrms, '', locale, 3);
  const nusselt = formatQuantity(readout.nusselt, '', locale, 3);
  const description = `${convectionCell.describe(params, locale)} ${interpolate(strings.describeLive, { nusselt, vrms })}`;
  const stops = COLOUR_RAMPS[params.colourRamp];

  return (
    <figure className="mp-convection-cell" style={{ margin: 0, width }}>
      <canvas
        ref={canvasRef}
        role="img"
        aria-label={strings.title}
        aria-describedby={descriptionId}
        style={{ width, height, display: 'block', borderRadius: 8, background: stops[0] }}
      />
      <div aria-hidden="true" style={{ display: 'flex', alignItems: 'center', gap: '0.5em', marginTop: '0.4em', fontSize: '0.85em' }}>
        <span>{strings.cold}</span>
        <span style={{ flex: 1, height: 10, borderRadius: 5, background: `linear-gradient(to right, ${stops.join(', ')})` }} />
        <span>{strings.hot}</span>
      </div>
      <dl style={{ display: 'grid', gridTemplateColumns: 'auto 1fr', gap: '0.2em 1em', margin: '0.5em 0' }}>
        <dt>{scales ? strings.timeMyr : strings.time}</dt>
        <dd data-readout="time" style={{ margin: 0, fontVariantNumeric: 'tabular-nums' }}><bdi dir="ltr">{time}</bdi></dd>
        <dt>{strings.nusselt}</dt>
        <dd data-readout="nusselt" style={{ margin: 0, fontVariantNumeric: 'tabular-nums' }}><bdi dir="ltr">{nusselt}</bdi></dd>
        <dt>{strings.vrms}</dt>
        <dd data-readout="vrms" style={{ margin: 0, fontVariantNumeric: 'tabular-nums' }}><bdi dir="ltr">{vrms}</bdi></dd>
      </dl>
      <div style={widgetControlRowStyle}>
        {reduce ? null : (
          <button type="button" aria-pressed={!playing} onClick={() => setPlaying((value) => !value)} style={widgetButtonStyle}>
            {playing ? strings.pause : strings.play}
          </button>
        )}
        {animating ? null : (
          <button type="button" onClick={stepOnDemand} style={widgetButtonStyle}>
            {strings.step}
          </button>
        )}
      </div>
      {failure ? <p role="alert">{failure}</p> : null}
      <p id={descriptionId} style={visuallyHidden}>
        {description}
      </p>
      {showCaution ? <SimulationCaution locale={locale} /> : null}
    </figure>
  );
}
