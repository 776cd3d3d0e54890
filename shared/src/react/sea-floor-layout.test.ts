import { describe, expect, it } from 'vitest';
import { formatQuantity, WIDGET_LOCALES, widgetStrings } from '../i18n/index.js';
import { formatMillionYears } from '../widgets/convection-cell/index.js';
import { SEA_FLOOR_AGE_MAX_MYR } from '../widgets/sea-floor-depth/index.js';
import { boxesMeet, boxInside } from './drawing-text.js';
import { LARGE_TEXT_SCALE } from './panel/panel-theme.js';
import { DEPTH_TICKS_M, layoutSeaFloor, SEA_FLOOR_FONT, SEA_FLOOR_VIEW, seaFloorLabels, THICKNESS_TICKS_KM, type SeaFloorLayout } from './sea-floor-layout.js';

// Every half million years the widget takes, in every language, at the kiosk's standard and Larger text.
const AGES = Array.from({ length: SEA_FLOOR_AGE_MAX_MYR * 2 }, (_, index) => (index + 1) / 2);
const TEXT_SCALES = [1, LARGE_TEXT_SCALE];

function layoutOf(ageMyr: number, locale: string, textScale: number): SeaFloorLayout {
  const strings = widgetStrings(locale).seaFloorDepth;
  return layoutSeaFloor({
    texts: {
      ridge: strings.ridge,
      seaLevel: strings.seaLevel,
      thickness: strings.thickness,
      depthTicks: DEPTH_TICKS_M.map((depthM) => formatQuantity(depthM / 1000, 'km', locale)),
      thicknessTicks: THICKNESS_TICKS_KM.map((km) => formatQuantity(km, 'km', locale)),
      age: formatMillionYears(ageMyr, locale),
    },
    ageMyr,
    maxAgeMyr: SEA_FLOOR_AGE_MAX_MYR,
    textScale,
  });
}

const cases = TEXT_SCALES.flatMap((textScale) => WIDGET_LOCALES.flatMap((locale) => AGES.map((ageMyr) => ({ ageMyr, locale, textScale, layout: layoutOf(ageMyr, locale, textScale) }))));

describe('sea-floor depth drawing layout', () => {
  it('keeps every label inside the frame at every age, in every language and at both text sizes', () => {
    const problems = cases.flatMap(({ layout, ...item }) =>
      seaFloorLabels(layout).filter((label) => !boxInside(label.box, SEA_FLOOR_VIEW, 1)).map((label) => `"${label.text}" leaves the frame: ${JSON.stringify(item)}`),
    );
    expect(problems.slice(0, 10)).toEqual([]);
  });

  it('keeps the labels apart from each other, and the depth scale’s words left of the axis', () => {
    const problems: string[] = [];
    for (const { layout, ...item } of cases) {
      const labels = seaFloorLabels(layout);
      labels.forEach((a, index) => {
        for (const b of labels.slice(index + 1)) if (boxesMeet(a.box, b.box)) problems.push(`"${a.text}" meets "${b.text}": ${JSON.stringify(item)}`);
      });
      for (const tick of [...layout.depthTicks, ...layout.thicknessTicks]) if (tick.box.x + tick.box.width > layout.axis.left) problems.push(`"${tick.text}" crosses the axis: ${JSON.stringify(item)}`);
      if (problems.length > 10) break;
    }
    expect(problems).toEqual([]);
  });

  it('draws every label larger with Larger text, by the panel’s own scale', () => {
    for (const locale of WIDGET_LOCALES) {
      const standard = seaFloorLabels(layoutOf(100, locale, 1));
      const larger = seaFloorLabels(layoutOf(100, locale, LARGE_TEXT_SCALE));
      expect(larger.map((label) => label.fontSize)).toEqual(standard.map((label) => label.fontSize * LARGE_TEXT_SCALE));
    }
    expect(layoutOf(100, 'en', 1).ridge.fontSize).toBe(SEA_FLOOR_FONT.name);
  });

  it('keeps age 0 where it always was at the standard text size, and moves it right for larger depth labels', () => {
    // x = 56 at 0 Myr and 464 at 200 Myr: the browser tests touch the drawing by these.
    for (const locale of WIDGET_LOCALES) expect(layoutOf(50, locale, 1).axis).toEqual({ left: 56, right: 464 });
    expect(layoutOf(50, 'en', LARGE_TEXT_SCALE).axis.left).toBeGreaterThan(56);
  });
});
