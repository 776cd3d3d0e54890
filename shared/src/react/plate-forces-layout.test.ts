import { describe, expect, it } from 'vitest';
import { formatQuantity, WIDGET_LOCALES, widgetStrings } from '../i18n/index.js';
import { UPPER_MANTLE_BASE_KM } from '../widgets/plate-forces/index.js';
import { boxesMeet, boxInside } from './drawing-text.js';
import { LARGE_TEXT_SCALE } from './panel/panel-theme.js';
import { layoutPlateLabels, PLATE_VIEW, RIDGE_PUSH_ARROW } from './plate-forces-layout.js';

const TEXT_SCALES = [1, LARGE_TEXT_SCALE];

function labelsOf(locale: string, textScale: number) {
  const strings = widgetStrings(locale).plateForces;
  return layoutPlateLabels(
    { ridge: strings.ridge, trench: strings.trench, discontinuity: formatQuantity(UPPER_MANTLE_BASE_KM, 'km', locale), ridgePush: strings.ridgePush, slabPull: strings.slabPull },
    textScale,
  );
}

const cases = TEXT_SCALES.flatMap((textScale) => WIDGET_LOCALES.map((locale) => ({ locale, textScale, labels: Object.values(labelsOf(locale, textScale)) })));

describe('plate-forces drawing layout', () => {
  it('keeps every label inside the frame, in every language and at both text sizes', () => {
    const problems = cases.flatMap(({ labels, locale, textScale }) => labels.filter((label) => !boxInside(label.box, PLATE_VIEW, 1)).map((label) => `"${label.text}" leaves the frame (${locale}, ×${textScale})`));
    expect(problems).toEqual([]);
  });

  it('keeps the labels apart from each other and off ridge push’s arrow', () => {
    const problems: string[] = [];
    for (const { labels, locale, textScale } of cases) {
      labels.forEach((a, index) => {
        for (const b of labels.slice(index + 1)) if (boxesMeet(a.box, b.box)) problems.push(`"${a.text}" meets "${b.text}" (${locale}, ×${textScale})`);
        // The arrow is 6 units thick with a 7-unit head: 7 units either side of its line.
        const arrow = { x: RIDGE_PUSH_ARROW.from.x, y: RIDGE_PUSH_ARROW.from.y - 7, width: RIDGE_PUSH_ARROW.to.x - RIDGE_PUSH_ARROW.from.x, height: 14 };
        if (boxesMeet(a.box, arrow)) problems.push(`"${a.text}" lies on ridge push's arrow (${locale}, ×${textScale})`);
      });
    }
    expect(problems).toEqual([]);
  });

  it('draws every label larger with Larger text, by the panel’s own scale', () => {
    for (const locale of WIDGET_LOCALES) {
      const standard = Object.values(labelsOf(locale, 1));
      const larger = Object.values(labelsOf(locale, LARGE_TEXT_SCALE));
      expect(larger.map((label) => label.fontSize)).toEqual(standard.map((label) => label.fontSize * LARGE_TEXT_SCALE));
    }
  });
});
