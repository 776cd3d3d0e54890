import type { SlopeForceResult } from '../widgets/slope-force/index.js';
import { fittedFontSize, textWidth, type Box } from './drawing-text.js';

export type { Box } from './drawing-text.js';

/**
 * Where everything of the slope force drawing goes, for one angle and one place of the block on
 * the board: a pure function, so a test can sweep every angle and mass and check that arrows and
 * labels stay inside the frame and clear of each other and of the drag handle.
 */

export const SLOPE_VIEW = { width: 480, height: 360 } as const;
/** The hinge of the board, on the ground line; room below it holds the weight arrow on a flat slope. */
export const PIVOT = { x: 56, y: 292 } as const;
export const BOARD = 250;
export const BLOCK = 44;
/** Where the block starts (and is put back to): half-way up, so the friction arrow stops short of the handle. */
export const START = BOARD * 0.5;
/** The block's downhill face rests on the board's first pixels: it stops at the foot, not beyond. */
export const FOOT = BLOCK / 2 + 2;
const HANDLE_RADIUS = 20;
/** Longest drawn force arrow, for the weight; the components are drawn to the same scale. */
const WEIGHT_ARROW = 70;
/** Components drawn this far beside the weight, so a flat (N = W) or vertical (S = W) slope keeps them apart. */
const COMPONENT_OFFSET = 12;
const ARC_RADIUS = 48;
/** The critical-angle label's band along the top: no board, handle or arrow reaches it at any angle (the sweep test checks). */
const TOP_BAND_Y = 20;
/** The dashed key before the critical-angle label, with the frame's margin before it. */
const CRITICAL_KEY_ROOM = 32;
/** Label sizes at the kiosk's standard text size; Larger text scales them (layoutSlope's textScale). */
export const LABEL_FONT = { angle: 15, critical: 13 } as const;

const DEG = Math.PI / 180;

/**
 * The drawing's own colours, the same in every panel theme. Every arrow stays above WCAG 2.2's
 * 3:1 for graphics (SC 1.4.11) against each surface it can cross (the sweep test checks), and its
 * light casing parts it from the darker board.
 */
export const SLOPE_PALETTE = {
  background: '#f6efe2',
  wedge: '#e4d6bd',
  block: '#c9cfd4',
  board: '#8b6f4e',
  casing: '#fffdf7',
  ink: '#2b2b2b',
  arrows: { weight: '#1f2a33', normal: '#15507a', shear: '#a63f08', friction: '#5a2d82' },
} as const;

/** What an arrow can lie across: the sky behind, the ground below, the wedge under the board, the block, and its own casing. */
export const ARROW_SURFACES = ['background', 'wedge', 'block', 'casing'] as const;

export interface Point {
  x: number;
  y: number;
}

export type ForceName = 'weight' | 'normal' | 'shear' | 'friction';

export interface ArrowLayout {
  force: ForceName;
  from: Point;
  to: Point;
}

export interface LabelLayout {
  /** The space the text takes, estimated from its length (see textWidth); the text is centred on it vertically. */
  box: Box;
  /** The side of the box the text is pinned to, so a longer translation grows away from what it must not cover. */
  edge: 'left' | 'right';
  fontSize: number;
}

export interface SlopeLayout {
  pivot: Point;
  boardEnd: Point;
  /** Corners of the block, going round. */
  block: Point[];
  contact: Point;
  arrows: ArrowLayout[];
  arc: { radius: number; end: Point };
  criticalLine: { from: Point; to: Point };
  handle: { centre: Point; radius: number };
  angleLabel: LabelLayout;
  criticalLabel: LabelLayout;
  /** A short dashed stroke before the critical-angle label, matching the dashed line it names. */
  criticalKey: { from: Point; to: Point };
}

interface Segment {
  from: Point;
  to: Point;
  /** Half the stroke, plus a little air. */
  halfWidth: number;
}

const insideFrame = (box: Box) => box.x >= 2 && box.y >= 2 && box.x + box.width <= SLOPE_VIEW.width - 2 && box.y + box.height <= SLOPE_VIEW.height - 2;

/** Whether a thick segment touches a box: sampled every pixel along its length, which is exact enough at this size. */
function segmentMeetsBox({ from, to, halfWidth }: Segment, box: Box): boolean {
  const steps = Math.max(1, Math.ceil(Math.hypot(to.x - from.x, to.y - from.y)));
  for (let step = 0; step <= steps; step++) {
    const x = from.x + ((to.x - from.x) * step) / steps;
    const y = from.y + ((to.y - from.y) * step) / steps;
    if (x + halfWidth > box.x && x - halfWidth < box.x + box.width && y + halfWidth > box.y && y - halfWidth < box.y + box.height) return true;
  }
  return false;
}

const along = (from: Point, direction: Point, length: number): Point => ({ x: from.x + direction.x * length, y: from.y + direction.y * length });

/** A label pinned by one side at x, centred on y. */
function label(edge: LabelLayout['edge'], x: number, y: number, text: string, fontSize: number): LabelLayout {
  const width = textWidth(text, fontSize);
  return { edge, fontSize, box: { x: edge === 'left' ? x : x - width, y: y - fontSize * 0.7, width, height: fontSize * 1.4 } };
}

/** cos and sin exact at 0° and 90°, as the model computes them. */
function cosSin(angleDeg: number): [number, number] {
  if (angleDeg === 0) return [1, 0];
  if (angleDeg === 90) return [0, 1];
  return [Math.cos(angleDeg * DEG), Math.sin(angleDeg * DEG)];
}

export interface SlopeLayoutInput {
  angleDeg: number;
  /** How far up the board the block's contact point is, in drawing units (FOOT to START). */
  position: number;
  result: Pick<SlopeForceResult, 'weightN' | 'normalN' | 'shearN' | 'frictionN' | 'criticalAngleDeg'>;
  angleText: string;
  criticalText: string;
  /** The visitor's text size against the standard one (Larger text on a kiosk); 1 when left out. */
  textScale?: number;
}

export function layoutSlope({ angleDeg, position, result, angleText, criticalText, textScale = 1 }: SlopeLayoutInput): SlopeLayout {
  const [cos, sin] = cosSin(angleDeg);
  const uphill = { x: cos, y: -sin };
  const downhill = { x: -cos, y: sin };
  const intoSlope = { x: sin, y: cos };
  const outOfSlope = { x: -sin, y: -cos };
  const pivot = { ...PIVOT };
  const boardEnd = along(pivot, uphill, BOARD);
  const place = Math.min(START, Math.max(FOOT, position));
  const contact = along(pivot, uphill, place);
  const downhillFoot = along(contact, uphill, -BLOCK / 2);
  const uphillFoot = along(contact, uphill, BLOCK / 2);
  const block = [downhillFoot, uphillFoot, along(uphillFoot, outOfSlope, BLOCK), along(downhillFoot, outOfSlope, BLOCK)];
  const centre = along(contact, outOfSlope, BLOCK / 2);

  const scale = result.weightN > 0 ? WEIGHT_ARROW / result.weightN : 0;
  const arrow = (force: ForceName, from: Point, direction: Point, newtons: number): ArrowLayout => ({ force, from, to: along(from, direction, newtons * scale) });
  const arrows = [
    arrow('weight', centre, { x: 0, y: 1 }, result.weightN),
    arrow('normal', along(centre, uphill, COMPONENT_OFFSET), intoSlope, result.normalN),
    arrow('shear', along(centre, outOfSlope, COMPONENT_OFFSET), downhill, result.shearN),
    // Friction acts along the contact: drawn just above the board from the block's uphill face.
    arrow('friction', along(uphillFoot, outOfSlope, 8), uphill, result.frictionN),
  ].filter((item) => Math.hypot(item.to.x - item.from.x, item.to.y - item.from.y) >= 1);

  const [criticalCos, criticalSin] = cosSin(result.criticalAngleDeg);
  const criticalLine = { from: pivot, to: along(pivot, { x: criticalCos, y: -criticalSin }, BOARD * 0.8) };

  const angleFont = LABEL_FONT.angle * textScale;
  // The angle goes beside its arc where there is room, else under the ground line by the hinge, else at the far end of the ground.
  const half = (angleDeg / 2) * DEG;
  const candidates = [
    ...(angleDeg >= 20 ? [label('left', pivot.x + (ARC_RADIUS + 8) * Math.cos(half), pivot.y - (ARC_RADIUS + 4) * Math.sin(half), angleText, angleFont)] : []),
    label('right', pivot.x - 6, pivot.y + 22, angleText, angleFont),
    label('left', pivot.x + ARC_RADIUS + 4, pivot.y + 22, angleText, angleFont),
    label('right', SLOPE_VIEW.width - 12, pivot.y + 22, angleText, angleFont),
  ];
  const obstacles: Segment[] = [
    ...arrows.map((item) => ({ from: item.from, to: item.to, halfWidth: 7 })),
    { from: pivot, to: boardEnd, halfWidth: 6 },
    ...block.map((corner, index) => ({ from: corner, to: block[(index + 1) % block.length]!, halfWidth: 2 })),
  ];
  const clear = (candidate: LabelLayout) => insideFrame(candidate.box) && obstacles.every((segment) => !segmentMeetsBox(segment, candidate.box));
  const angleLabel = candidates.find(clear) ?? candidates[candidates.length - 1]!;

  // The critical angle is named along the top, away from the handle and the arrows, its text starting just after its dashed key.
  const criticalFont = fittedFontSize(criticalText, LABEL_FONT.critical, textScale, SLOPE_VIEW.width - 12 - CRITICAL_KEY_ROOM);
  const criticalLabel = label('left', SLOPE_VIEW.width - 12 - textWidth(criticalText, criticalFont), TOP_BAND_Y, criticalText, criticalFont);
  const criticalKey = { from: { x: criticalLabel.box.x - 30, y: TOP_BAND_Y }, to: { x: criticalLabel.box.x - 8, y: TOP_BAND_Y } };

  return {
    pivot,
    boardEnd,
    block,
    contact,
    arrows,
    arc: { radius: ARC_RADIUS, end: along(pivot, uphill, ARC_RADIUS) },
    criticalLine,
    handle: { centre: boardEnd, radius: HANDLE_RADIUS },
    angleLabel,
    criticalLabel,
    criticalKey,
  };
}
