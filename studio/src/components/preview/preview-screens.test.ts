import { describe, expect, it } from 'vitest';
import { previewScreens, zoomToFit } from './preview-screens';

describe('previewScreens', () => {
  it('always offers the two screens a panel is written for, even when a venue has no stations', () => {
    expect(previewScreens([])).toEqual([
      { width: 1920, height: 1080, layout: 'landscape', stations: [] },
      { width: 1080, height: 1920, layout: 'portrait', stations: [] },
    ]);
  });

  it('groups stations by screen size and adds the other sizes, largest first, laid out as the kiosk would', () => {
    const screens = previewScreens([
      { name: 'Rift Table', screenWidthPx: 1920, screenHeightPx: 1080 },
      { name: 'Trench Wall', screenWidthPx: 1080, screenHeightPx: 1920 },
      { name: 'Lab Bench', screenWidthPx: 1280, screenHeightPx: 1024 },
      { name: 'Plate Map Wall', screenWidthPx: 1920, screenHeightPx: 1080 },
      { name: 'Atrium', screenWidthPx: 3840, screenHeightPx: 2160 },
      { name: 'Column', screenWidthPx: 768, screenHeightPx: 1366 },
    ]);
    expect(screens.map((screen) => [screen.width, screen.height, screen.layout, screen.stations])).toEqual([
      [1920, 1080, 'landscape', ['Rift Table', 'Plate Map Wall']],
      [1080, 1920, 'portrait', ['Trench Wall']],
      [3840, 2160, 'landscape', ['Atrium']],
      [1280, 1024, 'landscape', ['Lab Bench']],
      [768, 1366, 'portrait', ['Column']],
    ]);
  });
});

describe('zoomToFit', () => {
  it('scales by the tighter side, so the whole screen shows (arithmetic: 1200/1920 = 0.625 beats 800/1080 ≈ 0.741)', () => {
    expect(zoomToFit({ width: 1920, height: 1080 }, { width: 1200, height: 800 })).toBe(0.625);
    expect(zoomToFit({ width: 1080, height: 1920 }, { width: 1200, height: 960 })).toBe(0.5);
  });

  it('grows a screen smaller than the viewport, and leaves an unmeasured one at full size', () => {
    expect(zoomToFit({ width: 800, height: 600 }, { width: 1600, height: 1500 })).toBe(2);
    expect(zoomToFit({ width: 1920, height: 1080 }, { width: 0, height: 0 })).toBe(1);
  });
});
