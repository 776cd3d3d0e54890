import type { z } from '../../zod.js';
import { formatLimit } from '../validation.js';
import {
  boundaryLayerThickness,
  COLUMNS_PER_BOUNDARY_LAYER,
  columnsNeeded,
  estimatedNusselt,
  FRAME_BUDGET_POINT_STEPS,
  onsetRayleigh,
  POINTS_PER_BOUNDARY_LAYER,
  rayleighOf,
  rowsNeeded,
  smallestGridAtLeast,
} from './derived.js';
import { GRID_SIZES, RAYLEIGH_RANGE, type ConvectionCellParams } from './params.js';

type Context = z.core.$RefinementCtx<ConvectionCellParams>;

const largestGrid = GRID_SIZES[GRID_SIZES.length - 1]!;
const percent = (fraction: number) => `${(fraction * 100).toPrecision(2)} %`;

type Problem = { path: string[]; message: string };

/** Ra as the settings give it, or why they give none: the number itself or the physical properties, never both or neither. */
function sourceOf(params: ConvectionCellParams): { rayleigh?: number; problems: Problem[] } {
  if (params.rayleigh !== undefined && params.physical) {
    return { problems: [{ path: ['physical'], message: 'Set either the Rayleigh number Ra or the physical properties it is computed from, not both.' }] };
  }
  if (params.rayleigh === undefined && !params.physical) {
    return { problems: [{ path: ['rayleigh'], message: 'Set the Rayleigh number Ra, or the physical properties it is computed from.' }] };
  }
  const problems: Problem[] = [];
  if (params.units === 'physical' && !params.physical) {
    problems.push({
      path: ['units'],
      message: 'Physical units need the physical properties (the depth and diffusivity set the time and speed scales). Set them, or choose non-dimensional units.',
    });
  }
  const rayleigh = rayleighOf(params);
  if (params.physical && !(rayleigh >= RAYLEIGH_RANGE.min && rayleigh <= RAYLEIGH_RANGE.max)) {
    problems.push({
      path: ['physical'],
      message: `These properties give Ra = ${formatLimit(rayleigh)}; the convection cell handles Ra from ${formatLimit(RAYLEIGH_RANGE.min)} to ${formatLimit(RAYLEIGH_RANGE.max)}. Ra grows with the depth cubed, so a shallower box or a stiffer (more viscous) rock lowers it.`,
    });
    return { problems };
  }
  return { rayleigh, problems };
}

/** Where Ra comes from (it reads rayleigh, physical and units). */
export function checkSource(params: ConvectionCellParams, ctx: Context) {
  for (const problem of sourceOf(params).problems) ctx.addIssue({ code: 'custom', ...problem });
}

/**
 * The thermal boundary layer thins as Ra^(-1/3); a grid that cannot resolve it gives wrong heat flow
 * and speeds (it reads the source of Ra, aspectRatio, nx and nz; a wrong source is checkSource's to report).
 */
export function checkResolution(params: ConvectionCellParams, ctx: Context) {
  const { rayleigh } = sourceOf(params);
  if (rayleigh === undefined) return;
  if (rayleigh <= onsetRayleigh(params.aspectRatio)) return;
  const thickness = boundaryLayerThickness(estimatedNusselt(rayleigh, params.aspectRatio));
  const layer = `At Ra = ${formatLimit(rayleigh)} the thermal boundary layers are about ${percent(thickness)} of the depth thick`;
  const rows = rowsNeeded(thickness);
  if (params.nz < rows) {
    ctx.addIssue({
      code: 'custom',
      path: ['nz'],
      message: `${layer}; nz = ${params.nz} puts ${(thickness * params.nz).toFixed(1)} rows across each, and at least ${POINTS_PER_BOUNDARY_LAYER} are needed to resolve it. ${gridAdvice('nz', rows)}`,
    });
  }
  const columns = columnsNeeded(thickness, params.aspectRatio);
  if (params.nx < columns) {
    ctx.addIssue({
      code: 'custom',
      path: ['nx'],
      message: `${layer}, and the rising and sinking plumes are about as wide; nx = ${params.nx} across a box ${params.aspectRatio} times as wide as deep puts ${((thickness * params.nx) / params.aspectRatio).toFixed(1)} columns across each, and at least ${COLUMNS_PER_BOUNDARY_LAYER} are needed. ${gridAdvice('nx', columns)}`,
    });
  }
}

function gridAdvice(axis: 'nx' | 'nz', need: number): string {
  const pick = smallestGridAtLeast(need);
  if (pick) return `Pick ${axis} = ${pick} or more.`;
  return `Even ${axis} = ${largestGrid} is too coarse: lower Ra${axis === 'nx' ? ' or make the box narrower' : ''}.`;
}

/** What one frame asks of the kiosk (it reads nx, nz and playbackSpeed). */
export function checkFrameBudget(params: ConvectionCellParams, ctx: Context) {
  const points = params.nx * params.nz;
  const load = points * params.playbackSpeed;
  if (load <= FRAME_BUDGET_POINT_STEPS) return;
  const why = `${params.nx} × ${params.nz} points at ${params.playbackSpeed} steps per frame is ${formatLimit(load)} point-steps a frame, more than a kiosk can compute in one 16.7 ms frame at 60 frames a second (budget ${formatLimit(FRAME_BUDGET_POINT_STEPS)})`;
  const fastestSpeed = FRAME_BUDGET_POINT_STEPS / points;
  if (fastestSpeed >= 0.25) {
    ctx.addIssue({ code: 'custom', path: ['playbackSpeed'], message: `${why}. Pick a playback speed of at most ${formatLimit(fastestSpeed)}, or a coarser grid.` });
  } else {
    ctx.addIssue({
      code: 'custom',
      path: [params.nx >= params.nz ? 'nx' : 'nz'],
      message: `${why}. Pick a grid of at most ${formatLimit(FRAME_BUDGET_POINT_STEPS * 4)} points in all (nx × nz) at the slowest playback speed, 0.25, or fewer at faster speeds.`,
    });
  }
}
