import { describe, expect, it } from 'vitest';
import { contrastRatio } from '../colour/colour.js';
import { interpolate, WIDGET_LOCALES, widgetStrings } from '../i18n/index.js';
import { computeSlopeForce, formatAngle, MAX_FRICTION, MAX_MASS_KG, GRAVITY_RANGE } from '../widgets/slope-force/index.js';
import { LARGE_TEXT_SCALE } from './panel/panel-theme.js';
import { ARROW_SURFACES, BLOCK, BOARD, FOOT, layoutSlope, SLOPE_PALETTE, SLOPE_VIEW, START, type Box, type Point, type SlopeLayout } from './slope-force-layout.js';

// Every half degree, and the first and last tenth; masses and gravity change the numbers only, so a coarser sweep serves them.
const ANGLES = [...Array.from({ length: 181 }, (_, index) => index / 2), 0.1, 89.9];
const COARSE_ANGLES = Array.from({ length: 19 }, (_, index) => index * 5);
const MASSES = [1e-3, 0.5, 10, 57.3, 100, 999, 1e3, 12_345, 999_999, MAX_MASS_KG];
const FRICTION = [[0, 0], [0.3, 0.2], [0.6, 0.6], [0.85, 0.6], [1, 0.2], [MAX_FRICTION, 1.5]] as const;
const GRAVITIES = [GRAVITY_RANGE.min, undefined, GRAVITY_RANGE.max];
const POSITIONS = [FOOT, (FOOT + START) / 2, START];
/** The kiosk's standard text and its Larger text (panel-theme's LARGE_TEXT_SCALE). */
const TEXT_SCALES = [1, LARGE_TEXT_SCALE];

interface Case {
  angleDeg: number;
  massKg: number;
  staticFriction: number;
  kineticFriction: number;
  gravity?: number;
  position: number;
  locale: string;
  textScale: number;
}

function* cases(): Generator<Case> {
  for (const textScale of TEXT_SCALES) {
    for (const position of POSITIONS) {
      for (const angleDeg of ANGLES) {
        for (const [staticFriction, kineticFriction] of FRICTION) {
          for (const locale of WIDGET_LOCALES) yield { angleDeg, massKg: 10, staticFriction, kineticFriction, position, locale, textScale };
        }
      }
      for (const angleDeg of COARSE_ANGLES) {
        for (const massKg of MASSES) for (const gravity of GRAVITIES) yield { angleDeg, massKg, staticFriction: 0.85, kineticFriction: 0.6, gravity, position, locale: 'en', textScale };
      }
    }
  }
}

/** Every case laid out once, shared by the checks below. */
const laidOut = [...cases()].map((item) => ({ item, layout: layoutOf(item) }));

function layoutOf(item: Case): SlopeLayout {
  const result = computeSlopeForce(item);
  const strings = widgetStrings(item.locale).slopeForce;
  return layoutSlope({
    angleDeg: item.angleDeg,
    position: item.position,
    result,
    angleText: formatAngle(item.angleDeg, item.locale),
    criticalText: interpolate(strings.criticalAngle, { angle: formatAngle(result.criticalAngleDeg, item.locale) }),
    textScale: item.textScale,
  });
}

const within = (point: Point, margin: number) => point.x >= margin && point.y >= margin && point.x <= SLOPE_VIEW.width - margin && point.y <= SLOPE_VIEW.height - margin;
const boxInside = (box: Box) => within({ x: box.x, y: box.y }, 0) && within({ x: box.x + box.width, y: box.y + box.height }, 0);
const boxesMeet = (a: Box, b: Box) => a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

/** Distance from a point to a segment (plain plane geometry). */
function distanceToSegment(point: Point, from: Point, to: Point): number {
  const dx = to.x - from.x;
  const dy = to.y - from.y;
  const lengthSquared = dx * dx + dy * dy;
  const t = lengthSquared === 0 ? 0 : Math.max(0, Math.min(1, ((point.x - from.x) * dx + (point.y - from.y) * dy) / lengthSquared));
  return Math.hypot(point.x - (from.x + t * dx), point.y - (from.y + t * dy));
}

const pointToBox = (point: Point, box: Box) => Math.hypot(Math.max(box.x - point.x, 0, point.x - (box.x + box.width)), Math.max(box.y - point.y, 0, point.y - (box.y + box.height)));

/** Whether a segment crosses a box (Liang–Barsky clipping). */
function segmentCrossesBox(from: Point, to: Point, box: Box): boolean {
  let [enter, leave] = [0, 1];
  const dx = to.x - from.x;
  const dy = to.y - from.y;
  const edges: [number, number][] = [[-dx, from.x - box.x], [dx, box.x + box.width - from.x], [-dy, from.y - box.y], [dy, box.y + box.height - from.y]];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return false;
      continue;
    }
    const t = q / p;
    if (p < 0) enter = Math.max(enter, t);
    else leave = Math.min(leave, t);
    if (enter > leave) return false;
  }
  return true;
}

/** Distance from a box to a segment: zero when they cross, else the nearest of corner-to-segment and end-to-box. */
function distanceBoxToSegment(box: Box, from: Point, to: Point): number {
  if (segmentCrossesBox(from, to, box)) return 0;
  const corners = [{ x: box.x, y: box.y }, { x: box.x + box.width, y: box.y }, { x: box.x, y: box.y + box.height }, { x: box.x + box.width, y: box.y + box.height }];
  return Math.min(...corners.map((corner) => distanceToSegment(corner, from, to)), pointToBox(from, box), pointToBox(to, box));
}

const describeCase = (item: Case) => JSON.stringify(item);

// Each check walks some twenty thousand layouts: a busy machine needs more than the default five seconds.
describe('slope force drawing layout', { timeout: 30_000 }, () => {
  it('keeps every arrow, the block, the handle and both labels inside the frame at every angle, mass, friction and language', () => {
    const problems: string[] = [];
    for (const { item, layout } of laidOut) {
      // An arrow is 4 units wide with a 10-unit head and a 2-unit casing: 7 units of room around its line.
      for (const arrow of layout.arrows) if (!within(arrow.from, 7) || !within(arrow.to, 7)) problems.push(`${arrow.force} arrow leaves the frame: ${describeCase(item)}`);
      for (const corner of layout.block) if (!within(corner, 1)) problems.push(`block leaves the frame: ${describeCase(item)}`);
      const { centre, radius } = layout.handle;
      if (!within({ x: centre.x - radius, y: centre.y - radius }, 1) || !within({ x: centre.x + radius, y: centre.y + radius }, 1)) problems.push(`handle leaves the frame: ${describeCase(item)}`);
      if (!boxInside(layout.angleLabel.box)) problems.push(`angle label leaves the frame: ${describeCase(item)}`);
      if (!boxInside(layout.criticalLabel.box)) problems.push(`critical-angle label leaves the frame: ${describeCase(item)}`);
      if (!within(layout.criticalKey.from, 2)) problems.push(`critical-angle key leaves the frame: ${describeCase(item)}`);
      if (problems.length > 10) break;
    }
    expect(problems).toEqual([]);
  });

  it('keeps the labels apart from each other, from the handle, the board, the block and every arrow', () => {
    const problems: string[] = [];
    for (const { item, layout } of laidOut) {
      const labels = { angle: layout.angleLabel.box, 'critical angle': layout.criticalLabel.box };
      if (boxesMeet(labels.angle, labels['critical angle'])) problems.push(`angle and critical-angle labels overlap: ${describeCase(item)}`);
      for (const [name, box] of Object.entries(labels)) {
        // The handle is a disc: its centre must be further from the box than its radius.
        const { centre, radius } = layout.handle;
        if (distanceBoxToSegment(box, centre, centre) < radius + 2) problems.push(`${name} label under the handle: ${describeCase(item)}`);
        if (distanceBoxToSegment(box, layout.pivot, layout.boardEnd) < 4) problems.push(`${name} label on the board: ${describeCase(item)}`);
        layout.block.forEach((corner, index) => {
          if (distanceBoxToSegment(box, corner, layout.block[(index + 1) % 4]!) < 1) problems.push(`${name} label on the block: ${describeCase(item)}`);
        });
        for (const arrow of layout.arrows) if (distanceBoxToSegment(box, arrow.from, arrow.to) < 5) problems.push(`${name} label on the ${arrow.force} arrow: ${describeCase(item)}`);
      }
      if (problems.length > 10) break;
    }
    expect(problems).toEqual([]);
  });

  it('draws both labels larger with Larger text, the angle always by the full scale', () => {
    // The cases come once per text size, in the same order: the second half is the first at Larger text.
    const half = laidOut.length / 2;
    const problems: string[] = [];
    for (let index = 0; index < half && problems.length <= 10; index++) {
      const standard = laidOut[index]!;
      const larger = laidOut[index + half]!;
      expect({ ...larger.item, textScale: 1 }).toEqual(standard.item);
      if (Math.abs(larger.layout.angleLabel.fontSize - standard.layout.angleLabel.fontSize * LARGE_TEXT_SCALE) > 1e-9) problems.push(`angle label not scaled: ${describeCase(larger.item)}`);
      if (larger.layout.criticalLabel.fontSize <= standard.layout.criticalLabel.fontSize) problems.push(`critical-angle label not larger: ${describeCase(larger.item)}`);
    }
    expect(problems).toEqual([]);
  });

  it('keeps the arrow heads apart, even where two forces point the same way (N = W on a flat slope, S = W on a vertical one)', () => {
    const problems: string[] = [];
    for (const { item, layout: { arrows } } of laidOut) {
      for (const [index, a] of arrows.entries()) {
        for (const b of arrows.slice(index + 1)) {
          if (Math.hypot(a.to.x - b.to.x, a.to.y - b.to.y) < 10) problems.push(`${a.force} and ${b.force} heads meet: ${describeCase(item)}`);
        }
      }
      if (problems.length > 10) break;
    }
    expect(problems).toEqual([]);
  });

  it('stops the block at the foot of the slope and never lets it run past either end of the board', () => {
    for (const angleDeg of [0, 10, 45, 80, 90]) {
      const layout = layoutSlope({ angleDeg, position: -500, result: computeSlopeForce({ angleDeg, massKg: 10, staticFriction: 0, kineticFriction: 0 }), angleText: '', criticalText: '' });
      const [downhillFoot, uphillFoot] = layout.block as [Point, Point];
      // Both feet lie on the board segment, the downhill one at its first units.
      expect(distanceToSegment(downhillFoot, layout.pivot, layout.boardEnd), `downhill foot off the board at ${angleDeg}°`).toBeLessThan(1e-9);
      expect(distanceToSegment(uphillFoot, layout.pivot, layout.boardEnd), `uphill foot off the board at ${angleDeg}°`).toBeLessThan(1e-9);
      expect(Math.hypot(downhillFoot.x - layout.pivot.x, downhillFoot.y - layout.pivot.y)).toBeCloseTo(FOOT - BLOCK / 2, 9);
    }
    expect(START + BLOCK / 2).toBeLessThanOrEqual(BOARD);
  });

  it('draws each arrow at WCAG 2.2 non-text contrast, 3:1 or more, against everything it crosses', () => {
    // WCAG 2.2 success criterion 1.4.11 Non-text Contrast: graphical objects need 3:1 against adjacent colours.
    for (const [force, colour] of Object.entries(SLOPE_PALETTE.arrows)) {
      for (const surface of ARROW_SURFACES) {
        expect(contrastRatio(colour, SLOPE_PALETTE[surface]), `${force} arrow on ${surface}`).toBeGreaterThanOrEqual(3);
      }
    }
    // Where an arrow crosses the board, its casing lies between them, and the casing itself stands out from the board.
    expect(contrastRatio(SLOPE_PALETTE.casing, SLOPE_PALETTE.board)).toBeGreaterThanOrEqual(3);
  });
});
