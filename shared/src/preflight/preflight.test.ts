import { describe, expect, it } from 'vitest';
import type { Audience } from '../authoring/views.js';
import type { PanelDocJSON, PanelNodeJSON } from '../panel/panel-json.js';
import { panelText } from '../panel/panel-text.js';
import { readingLevel } from '../panel/reading-level.js';
import { buildRevisionSnapshot } from '../review/revision-snapshot.js';
import { convectionCellDefaults } from '../widgets/index.js';
import { PANEL_COLOURS } from '../panel/panel-colours.js';
import { imageAltText } from './image-alt-text.js';
import { imageCredit } from './image-credit.js';
import { imageInLibrary } from './image-in-library.js';
import { imageLicenceExpiry } from './image-licence-expiry.js';
import { imageLicenceRecorded } from './image-licence-recorded.js';
import { liveValueTarget } from './live-value-target.js';
import { panelContent } from './panel-content.js';
import { READING_TARGETS, readingLevelRule } from './reading-level.js';
import { PREFLIGHT_RULES, preflightBlockers, runPreflight } from './run-preflight.js';
import { textContrast, textContrastRule } from './text-contrast.js';
import type { PreflightContext, PreflightMedia, PreflightRule } from './types.js';
import { widgetModelLimits } from './widget-model-limits.js';
import { widgetParams } from './widget-params.js';
import { wordBudget } from './word-budget.js';

// A family story of our own that passes every check; each test changes one thing to trip one rule.
const text = (value: string): PanelNodeJSON => ({ type: 'text', text: value });
const paragraph = (...content: PanelNodeJSON[]): PanelNodeJSON => ({ type: 'paragraph', content });
const heading = (value: string): PanelNodeJSON => ({ type: 'heading', attrs: { level: 2 }, content: [text(value)] });
const liveValue = (widgetId: string, output = 'criticalAngleDeg'): PanelNodeJSON => ({ type: 'liveValue', attrs: { widgetId, output, format: { digits: 0, unit: '°' } } });
const slope = (params: Record<string, unknown> = {}): PanelNodeJSON => ({
  type: 'widget',
  attrs: { widgetType: 'slope-force', widgetId: 'ridge-slope', params: { massKg: 10, angleDeg: 20, staticFriction: 0.6, kineticFriction: 0.5, ...params } },
});
const image = (mediaId = '31'): PanelNodeJSON => ({ type: 'panelImage', attrs: { mediaId } });
const doc = (...content: PanelNodeJSON[]): PanelDocJSON => ({ type: 'doc', content });

const slopePanel = (...extra: PanelNodeJSON[]) =>
  doc(heading('Rock on a slope'), paragraph(text('Tilt the board. The block moves above '), liveValue('ridge-slope'), text('.')), slope(), image(), ...extra);

const photo = (changes: Partial<PreflightMedia> = {}): PreflightMedia => ({
  id: 31,
  filename: 'ridge-flank.webp',
  credit: 'Basalt Point Earth Science Centre',
  licence: { kind: 'spdx', id: 'CC-BY-4.0' },
  licenceExpiresOn: '2031-12-31',
  alt: { en: 'A steep slope of dark rock on the flank of an undersea ridge.' },
  ...changes,
});

interface Story {
  audience?: Audience;
  sourceLocale?: string;
  panels?: { en?: PanelDocJSON; fr?: PanelDocJSON; wordBudget?: number; docs?: Record<string, PanelDocJSON> }[];
  media?: PreflightMedia[];
  exhibitPlannedEnd?: string | null;
  today?: string;
}

function context({ audience = 'family', sourceLocale = 'en', panels = [{}], media = [photo()], exhibitPlannedEnd = '2030-06-30', today = '2026-03-02' }: Story = {}): PreflightContext {
  const snapshot = buildRevisionSnapshot({
    id: 3,
    title: 'The slope of a spreading ridge',
    audience,
    sourceLocale,
    panels: panels.map((panel, index) => ({
      id: 100 + index,
      position: index + 1,
      wordBudget: panel.wordBudget ?? 60,
      docs: panel.docs ?? { en: panel.en ?? slopePanel(), ...(panel.fr ? { fr: panel.fr } : {}) },
    })),
  });
  return { snapshot, media, exhibitPlannedEnd, today };
}

const failures = (rule: PreflightRule, story?: Story) => rule.run(context(story)).filter((finding) => !finding.passed);
const passes = (rule: PreflightRule, story?: Story) => rule.run(context(story)).every((finding) => finding.passed);

describe('preflight: panel content (blocker)', () => {
  it('refuses a panel with no text, image or widget, naming it by number', () => {
    expect(failures(panelContent, { panels: [{}, { en: doc(paragraph()) }] })).toEqual([
      { passed: false, message: 'Panel 2 is empty. Write its text, add an image or a widget, or delete the panel.', panelId: 101 },
    ]);
  });

  it('passes a panel with only an image, only a widget, or only words', () => {
    expect(passes(panelContent, { panels: [{ en: doc(image()) }, { en: doc(slope()) }, { en: doc(paragraph(text('Rock flows.'))) }] })).toBe(true);
  });
});

describe('preflight: widget params (blocker)', () => {
  it('passes a slope force box the shared validation accepts', () => {
    expect(widgetParams.run(context())).toEqual([{ passed: true, message: 'Panel 1 (“Rock on a slope”): every widget\'s settings pass the science checks.', panelId: 100 }]);
  });

  it('blocks a widget whose params fail the shared validation, naming the panel, the widget and the allowed range', () => {
    const [finding, ...rest] = failures(widgetParams, { panels: [{}, { en: doc(paragraph(text('Too steep.')), slope({ angleDeg: 120 })) }] });
    expect(rest).toEqual([]);
    expect(finding?.panelId).toBe(101);
    expect(finding?.message).toMatch(/^Panel 2 \(“Too steep\.”\): the slope force box “ridge-slope” has settings to fix\. .*90.*Open the widget's settings/);
  });
});

describe('preflight: live value target (blocker)', () => {
  it('passes a live value that reads a widget on its panel', () => {
    expect(passes(liveValueTarget)).toBe(true);
  });

  it('blocks a live value whose widget is no longer on the panel', () => {
    const en = doc(paragraph(text('It slides above '), liveValue('ridge-slope'), text('.')));
    expect(failures(liveValueTarget, { panels: [{ en }] })).toEqual([
      {
        passed: false,
        panelId: 100,
        message: 'Panel 1 (“It slides above .”): This live value shows "criticalAngleDeg" of widget ridge-slope, which is no longer on this panel. Point it at a widget on this panel, or remove it.',
      },
    ]);
  });

  it('blocks a dangling live value in a translation too, naming its language', () => {
    const fr = doc(paragraph(text('Il glisse au-delà de '), liveValue('autre-pente'), text('.')), slope());
    const [finding] = failures(liveValueTarget, { panels: [{ fr }] });
    expect(finding?.message).toMatch(/^Panel 1 \(“Rock on a slope”\), French text: .*autre-pente/);
  });

  it('reports a story without live values as checked', () => {
    expect(liveValueTarget.run(context({ panels: [{ en: doc(paragraph(text('Rock moves.'))) }] }))).toEqual([{ passed: true, message: 'No panel has a live value.' }]);
  });
});

describe('preflight: image in library (blocker)', () => {
  it('passes an image the library holds', () => {
    expect(passes(imageInLibrary)).toBe(true);
  });

  it('blocks an image that is no longer in the media library, and leaves it out of the other image checks', () => {
    const story = { media: [] };
    expect(failures(imageInLibrary, story).map((finding) => finding.message)).toEqual([
      'Panel 1 (“Rock on a slope”): image 31 is no longer in the media library. Pick another image, or take it off the panel.',
    ]);
    expect(imageAltText.run(context(story))).toEqual([{ passed: true, message: 'No panel shows an image from the media library.' }]);
  });
});

describe('preflight: image alt text (blocker)', () => {
  it('passes an image with alt text in the source locale, matching the tag without regard to case', () => {
    expect(passes(imageAltText)).toBe(true);
    expect(passes(imageAltText, { media: [photo({ alt: { EN: 'Dark rock.' } })] })).toBe(true);
  });

  // RFC 4647 §3.4 lookup: the range en-GB, truncated, finds en; a range never finds a more specific tag.
  it('passes a story written in en-GB whose image has alt text in en, and not the other way round', () => {
    expect(passes(imageAltText, { sourceLocale: 'en-GB', panels: [{ docs: { 'en-GB': slopePanel() } }] })).toBe(true);
    expect(passes(imageAltText, { sourceLocale: 'en', media: [photo({ alt: { 'en-GB': 'Dark rock.' } })] })).toBe(false);
  });

  it('blocks an image whose alt text is only in another language, or blank', () => {
    for (const alt of [{ fr: 'Roche sombre.' }, { en: '   ' }] as Record<string, string>[]) {
      expect(failures(imageAltText, { media: [photo({ alt })] }).map((finding) => finding.message)).toEqual([
        'Panel 1 (“Rock on a slope”): the image “ridge-flank.webp” has no alt text in English. Describe what it shows in the media library.',
      ]);
    }
  });
});

describe('preflight: image credit (blocker)', () => {
  it('passes an image with a credit line', () => {
    expect(passes(imageCredit)).toBe(true);
  });

  it('blocks an image without a credit line', () => {
    for (const credit of [null, ' ']) {
      expect(failures(imageCredit, { media: [photo({ credit })] })).toHaveLength(1);
    }
  });
});

describe('preflight: image licence expiry (blocker)', () => {
  it('passes a licence that lasts to the exhibit\'s planned end, including one that ends on that very day', () => {
    expect(passes(imageLicenceExpiry)).toBe(true);
    expect(passes(imageLicenceExpiry, { media: [photo({ licenceExpiresOn: '2030-06-30' })] })).toBe(true);
    expect(passes(imageLicenceExpiry, { media: [photo({ licenceExpiresOn: null })] })).toBe(true);
  });

  it('blocks a licence that has run out', () => {
    const [finding] = failures(imageLicenceExpiry, { media: [photo({ licenceExpiresOn: '2026-03-01' })], exhibitPlannedEnd: null });
    expect(finding?.message).toBe('Panel 1 (“Rock on a slope”): the licence for the image “ridge-flank.webp” ran out on 2026-03-01. Renew it, or replace the image.');
  });

  it('blocks a licence that runs out before the exhibit\'s planned end', () => {
    const [finding] = failures(imageLicenceExpiry, { media: [photo({ licenceExpiresOn: '2030-06-29' })] });
    expect(finding?.message).toContain("runs out on 2030-06-29, before the exhibit's planned end on 2030-06-30");
  });

  it('passes a licence in force today when the exhibit has no planned end', () => {
    expect(passes(imageLicenceExpiry, { media: [photo({ licenceExpiresOn: '2026-03-02' })], exhibitPlannedEnd: null })).toBe(true);
  });
});

describe('preflight: image licence recorded (warning)', () => {
  it('passes an image with an SPDX licence or "all rights reserved" with a holder', () => {
    expect(passes(imageLicenceRecorded)).toBe(true);
    expect(passes(imageLicenceRecorded, { media: [photo({ licence: { kind: 'all-rights-reserved', holder: 'Tomás Reyes' } })] })).toBe(true);
  });

  it('warns about an image with no licence recorded', () => {
    expect(failures(imageLicenceRecorded, { media: [photo({ licence: null })] })).toHaveLength(1);
  });
});

describe('preflight: widget model limits (warning)', () => {
  const cell = (rayleigh: number) => ({ type: 'widget', attrs: { widgetType: 'convection-cell', widgetId: 'mantle', params: { ...convectionCellDefaults, rayleigh } } });

  it('passes a convection cell above onset', () => {
    expect(widgetModelLimits.run(context({ panels: [{ en: doc(paragraph(text('Hot rock rises.')), cell(1e5)) }] }))).toEqual([
      { passed: true, panelId: 100, message: 'Panel 1 (“Hot rock rises.”): every widget is set within the range where its model holds.' },
    ]);
  });

  // Onset in a layer of free-slip walls: Ra_c = 27π⁴/4 ≈ 657.5 at the best wavenumber (Rayleigh 1916; Chandrasekhar 1961); a square
  // cell forces wavenumber π, where Ra_c = (2π²)³/π² = 8π⁴ ≈ 779.3.
  it('warns about a convection cell below the onset of convection in its square box, 8π⁴ ≈ 779 (Rayleigh 1916; Chandrasekhar 1961)', () => {
    const [finding, ...rest] = failures(widgetModelLimits, { panels: [{ en: doc(paragraph(text('Hot rock rises.')), cell(500)) }] });
    expect(rest).toEqual([]);
    expect(finding?.message).toMatch(/^Panel 1 \(“Hot rock rises\.”\): the convection cell “mantle” is set outside the range where its simplified model holds\. Ra = 500 is below the onset of convection for this box \(779\)/);
  });

  it('warns about friction beyond rock on rock (Byerlee 1978: about 0.6 to 0.85)', () => {
    const [finding, ...rest] = failures(widgetModelLimits, { panels: [{ en: doc(slope({ staticFriction: 1.5, kineticFriction: 1 })) }] });
    expect(rest).toEqual([]);
    expect(finding?.message).toContain('Static friction 1.5 is more than rock on rock reaches');
  });

  it('warns about the half-space model on sea floor older than about 70 Myr, where measured depths flatten (Parsons and Sclater 1977)', () => {
    const floor = (model: string) => ({ type: 'widget', attrs: { widgetType: 'sea-floor-depth', widgetId: 'old-floor', params: { ageMyr: 120, model } } });
    const [finding, ...rest] = failures(widgetModelLimits, { panels: [{ en: doc(paragraph(text('Old floor sits deep.')), floor('half-space')) }] });
    expect(rest).toEqual([]);
    expect(finding?.message).toMatch(/the sea-floor depth “old-floor” is set outside the range where its simplified model holds\. The half-space model matches measured depths only up to about 70 Myr/);
    expect(passes(widgetModelLimits, { panels: [{ en: doc(paragraph(text('Old floor sits deep.')), floor('plate')) }] })).toBe(true);
  });

  it('warns about a slab whose tip reaches below the 660 km discontinuity, which the plate-forces model leaves out', () => {
    // 1000 km at 60° reaches 1000 × sin 60° = 866 km down.
    const slab = { type: 'widget', attrs: { widgetType: 'plate-forces', widgetId: 'slab', params: { ageMyr: 100, slabLengthKm: 1000, slabDipDeg: 60 } } };
    const [finding] = failures(widgetModelLimits, { panels: [{ en: doc(paragraph(text('The slab pulls.')), slab) }] });
    expect(finding?.message).toContain('The slab\'s tip is 866 km down, below the 660 km discontinuity');
  });

  it('leaves widgets that fail validation to the params check', () => {
    expect(widgetModelLimits.run(context({ panels: [{ en: doc(slope({ angleDeg: 120 })) }] }))).toEqual([{ passed: true, message: 'No panel has a widget with valid settings.' }]);
  });
});

describe('preflight: reading level (warning)', () => {
  const hard = doc(
    paragraph(
      text('Lithospheric delamination, frequently accompanying continental collision, substantially modifies asthenospheric circulation, consequently generating considerable magmatic productivity.'),
    ),
  );
  // 2 sentences, 29 words, 41 syllables: Flesch–Kincaid grade 6.7 and reading ease 72.5, above the family grade, within the school target.
  const middling = doc(paragraph(text('Sea floor rock forms at ridges and grows older as it moves away. Older rock is colder and heavier, so it sinks back into the mantle under another plate.')));

  it('passes plain family text (Flesch–Kincaid grade ≤ 6 and reading ease ≥ 70)', () => {
    const findings = readingLevelRule.run(context());
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ passed: true, panelId: 100 });
    expect(findings[0]?.message).toContain('within the family target of grade 6 or below and reading ease 70 or above');
  });

  it('warns about dense text, with the measured grade and ease and what to do', () => {
    const [finding] = failures(readingLevelRule, { panels: [{ en: hard }] });
    expect(finding?.message).toMatch(/^Panel 1 \(“Lithospheric delamination, frequently a…”\) reads at grade \d+\.\d \(Flesch–Kincaid\) and reading ease -?\d+\.\d \(Flesch\), harder than the family target.*Use shorter sentences/);
  });

  it('holds each audience to its own target', () => {
    const level = readingLevel(panelText(middling))!;
    expect(level.fleschKincaidGrade).toBeGreaterThan(READING_TARGETS.family.maxGrade);
    expect(level.fleschKincaidGrade).toBeLessThanOrEqual(READING_TARGETS.school.maxGrade);
    expect(level.fleschReadingEase).toBeGreaterThanOrEqual(READING_TARGETS.school.minEase);
    expect(failures(readingLevelRule, { audience: 'family', panels: [{ en: middling }] })).toHaveLength(1);
    expect(passes(readingLevelRule, { audience: 'school', panels: [{ en: middling }] })).toBe(true);
    expect(passes(readingLevelRule, { audience: 'adult', panels: [{ en: middling }] })).toBe(true);
  });

  it('does not measure a story written in another language, and says so', () => {
    const fr = doc(paragraph(text('La roche chaude monte lentement.')));
    expect(readingLevelRule.run(context({ sourceLocale: 'fr', panels: [{ docs: { fr } }] }))).toEqual([
      { passed: true, message: 'Reading level is measured for English text only; this story is written in French, so it was not measured.' },
    ]);
  });
});

describe('preflight: word budget (warning)', () => {
  it('passes a panel within its budget, saying how many words it has', () => {
    expect(wordBudget.run(context())).toEqual([{ passed: true, panelId: 100, message: 'Panel 1 (“Rock on a slope”) has 12 of its 60 words.' }]);
  });

  it('warns about a panel over its budget, with how many words to cut', () => {
    expect(failures(wordBudget, { panels: [{ wordBudget: 10 }] })).toEqual([
      { passed: false, panelId: 100, message: 'Panel 1 (“Rock on a slope”) has 12 words, 2 over its budget of 10. Cut 2 words, or split the panel in two.' },
    ]);
  });
});

describe('preflight: text contrast (warning)', () => {
  it("passes the kiosk's own panel palette, whose lowest pair it names", () => {
    const findings = textContrast.run(context());
    expect(findings).toHaveLength(1);
    expect(findings[0]?.passed).toBe(true);
    expect(findings[0]?.message).toMatch(/all meet WCAG 2\.2 AA's 4\.5:1; the lowest is .* at \d+\.\d\d:1\.$/);
  });

  it('warns about a palette with a text colour under 4.5:1 on its surface (WCAG 2.2 SC 1.4.3)', () => {
    const scheme = { ...PANEL_COLOURS.standard, surface: '#ffffff', text: '#000000', heading: '#000000', liveValue: '#000000' };
    // #767676 on white is 4.54:1 and passes; #777777 is 4.48:1 and does not.
    expect(textContrastRule({ standard: { ...scheme, link: '#767676' } }).run(context())[0]?.passed).toBe(true);
    expect(textContrastRule({ standard: { ...scheme, link: '#777777' } }).run(context())).toEqual([
      {
        passed: false,
        message:
          "In the kiosk's standard colours, links (#777777) on the panel surface (#ffffff) have a contrast of 4.47:1, below the 4.5:1 that WCAG 2.2 AA asks for text. The panel palette needs a darker or lighter colour; tell the Mantlepiece developers.",
      },
    ]);
  });
});

describe('runPreflight', () => {
  it('lists every check at least once, with its severity, and no blockers for a story that passes', () => {
    const entries = runPreflight(context());
    expect(new Set(entries.map((entry) => entry.check))).toEqual(new Set(PREFLIGHT_RULES.map((rule) => rule.id)));
    expect(entries.every((entry) => entry.passed)).toBe(true);
    expect(preflightBlockers(entries)).toEqual([]);
    expect(entries.find((entry) => entry.check === 'widget-params')).toEqual({
      check: 'widget-params',
      severity: 'blocker',
      passed: true,
      panelId: 100,
      message: 'Panel 1 (“Rock on a slope”): every widget\'s settings pass the science checks.',
    });
  });

  it('gives one entry per panel for a panel check, and picks out the failed blockers', () => {
    const entries = runPreflight(context({ panels: [{}, { en: doc(paragraph(text('Tilt it.')), slope({ angleDeg: 120 })) }], media: [photo({ credit: null })] }));
    expect(entries.filter((entry) => entry.check === 'word-budget').map((entry) => entry.panelId)).toEqual([100, 101]);
    expect(preflightBlockers(entries).map((entry) => [entry.check, entry.panelId])).toEqual([
      ['widget-params', 101],
      ['image-credit', 100],
    ]);
  });

  it('gives every rule its own id', () => {
    expect(new Set(PREFLIGHT_RULES.map((rule) => rule.id)).size).toBe(PREFLIGHT_RULES.length);
  });

  it('refuses dates that are not YYYY-MM-DD rather than comparing them wrongly', () => {
    expect(() => runPreflight(context({ today: '2/3/2026' }))).toThrow(RangeError);
    expect(() => runPreflight(context({ media: [photo({ licenceExpiresOn: '31.12.2031' })] }))).toThrow(RangeError);
  });
});
