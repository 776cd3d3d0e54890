import { describe, expect, it } from 'vitest';
import { dwellByPanel, median, widgetUse } from './index.js';

describe('median', () => {
  it('takes the middle value of an odd count', () => {
    expect(median([9, 1, 5])).toBe(5);
    expect(median([7])).toBe(7);
  });

  it('takes the mean of the two middle values of an even count', () => {
    expect(median([4000, 1000, 3000, 2000])).toBe(2500);
    expect(median([1, 2])).toBe(1.5);
  });

  it('sorts numbers as numbers, not as text, and leaves the input alone', () => {
    const values = [10, 9, 100];
    expect(median(values)).toBe(10);
    expect(values).toEqual([10, 9, 100]);
  });

  it('has no median for no values', () => {
    expect(median([])).toBeNull();
  });
});

describe('dwellByPanel', () => {
  it('gives each panel its views and exact median dwell, most viewed first', () => {
    const samples = [
      { panelId: 3, dwellMs: 8000 },
      { panelId: 2, dwellMs: 1000 },
      { panelId: 3, dwellMs: 2000 },
      { panelId: 2, dwellMs: 5000 },
      { panelId: 3, dwellMs: 4000 },
      { panelId: 9, dwellMs: 600 },
    ];
    expect(dwellByPanel(samples)).toEqual([
      { panelId: 3, views: 3, medianDwellMs: 4000 },
      { panelId: 2, views: 2, medianDwellMs: 3000 },
      { panelId: 9, views: 1, medianDwellMs: 600 },
    ]);
  });
});

describe('widgetUse', () => {
  it('sums the params of each widget type, orders both levels by touches, and puts a touch that moved nothing after its equals', () => {
    const counts = [
      { widgetType: 'convection-cell', param: 'rayleigh', touches: 2 },
      { widgetType: 'slope-force-box', param: 'angleDeg', touches: 5 },
      { widgetType: 'slope-force-box', param: null, touches: 1 },
      { widgetType: 'slope-force-box', param: 'muStatic', touches: 3 },
      { widgetType: 'convection-cell', param: null, touches: 2 },
    ];
    expect(widgetUse(counts)).toEqual([
      { widgetType: 'slope-force-box', touches: 9, params: [{ param: 'angleDeg', touches: 5 }, { param: 'muStatic', touches: 3 }, { param: null, touches: 1 }] },
      { widgetType: 'convection-cell', touches: 4, params: [{ param: 'rayleigh', touches: 2 }, { param: null, touches: 2 }] },
    ]);
  });
});
