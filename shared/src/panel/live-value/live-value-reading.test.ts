import { describe, expect, it } from 'vitest';
import { computeSlopeForce, convectionCell } from '../../widgets/index.js';
import { examplePanelDoc } from '../example-panel.js';
import type { PanelNodeJSON } from '../panel-json.js';
import { widgetsIn } from '../panel-queries.js';
import { danglingLiveValues, liveValueText, readLiveValue, readPanelWidgets } from './live-value-reading.js';
import { DEFAULT_LIVE_VALUE_FORMAT, formatLiveValue } from './live-value-format.js';

const slopeParams = { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 };

describe('live values', () => {
  it('read the output their widget computes', () => {
    const readings = readPanelWidgets(widgetsIn(examplePanelDoc()));
    const reading = readLiveValue({ widgetId: 'ridge-slope', output: 'criticalAngleDeg' }, readings);
    expect(reading).toEqual({ ok: true, value: computeSlopeForce(slopeParams).criticalAngleDeg });
  });

  it('follow params a visitor has set in place of the stored ones', () => {
    const readings = readPanelWidgets(widgetsIn(examplePanelDoc()), new Map([['ridge-slope', { ...slopeParams, staticFriction: 1 }]]));
    const reading = readLiveValue({ widgetId: 'ridge-slope', output: 'criticalAngleDeg' }, readings);
    // θc = arctan μs, and arctan 1 = 45° exactly.
    expect(reading.ok && 'value' in reading && reading.value).toBeCloseTo(45, 12);
  });

  it('show a state in the visitor’s language, worded to sit inside a sentence', () => {
    const readings = readPanelWidgets(widgetsIn(examplePanelDoc()), new Map([['ridge-slope', { ...slopeParams, angleDeg: 45 }]]));
    const reading = readLiveValue({ widgetId: 'ridge-slope', output: 'state' }, readings);
    expect(reading).toEqual({ ok: true, state: 'slides' });
    expect(liveValueText(reading, DEFAULT_LIVE_VALUE_FORMAT, 'en')).toBe('slides');
    expect(liveValueText(reading, DEFAULT_LIVE_VALUE_FORMAT, 'fr')).toBe('glisse');
  });

  it('follow what a running simulation reports, and show a dash until it has', () => {
    const widgets = [{ widgetId: 'overturn', widgetType: 'convection-cell', params: { ...convectionCell.defaults }, path: [], visitorModelCard: false }];
    const before = readLiveValue({ widgetId: 'overturn', output: 'nusselt' }, readPanelWidgets(widgets));
    expect(before).toEqual({ ok: false, reason: 'not-reported' });
    expect(liveValueText(before, DEFAULT_LIVE_VALUE_FORMAT, 'en')).toBe('—');
    const reports = new Map([['overturn', { time: 0.3, nusselt: 4.884409, vrms: 42.864947 }]]);
    expect(readLiveValue({ widgetId: 'overturn', output: 'nusselt' }, readPanelWidgets(widgets, new Map(), reports))).toEqual({ ok: true, value: 4.884409 });
  });

  it('show a dash, never a number, when they cannot be computed', () => {
    expect(liveValueText({ ok: false, reason: 'no-widget' }, { digits: 2, unit: '°' }, 'en')).toBe('—');
  });

  it('are formatted for the locale with the unit symbol', () => {
    expect(formatLiveValue(40.36, { digits: 3, unit: '°' }, 'en')).toBe('40.4°');
    expect(formatLiveValue(98.0665, { digits: 3, unit: 'N' }, 'fr')).toBe('98,1\u00a0N');
    expect(formatLiveValue(1e21, { digits: 2, unit: 'Pa·s' }, 'en')).toBe('1\u00a0×\u00a010²¹\u00a0Pa·s');
    expect(formatLiveValue(2.5e-4, { digits: 2, unit: '' }, 'en')).toBe('2.5\u00a0×\u00a010⁻⁴');
  });
});

describe('danglingLiveValues', () => {
  it('finds none on a panel whose live values all point at its widgets', () => {
    expect(danglingLiveValues(examplePanelDoc())).toEqual([]);
  });

  it('finds a live value whose widget was deleted, with its path', () => {
    const doc = examplePanelDoc();
    doc.content?.splice(2, 1);
    expect(danglingLiveValues(doc)).toEqual([
      {
        path: ['content', 1, 'content', 5],
        widgetId: 'ridge-slope',
        output: 'criticalAngleDeg',
        reason: 'no-widget',
        message: 'This live value shows "criticalAngleDeg" of widget ridge-slope, which is no longer on this panel.',
      },
    ]);
  });

  it('finds a live value asking for an output its widget does not compute', () => {
    const doc = examplePanelDoc();
    const paragraph = doc.content?.[1] as PanelNodeJSON;
    (paragraph.content as PanelNodeJSON[])[5] = { type: 'liveValue', attrs: { widgetId: 'ridge-slope', output: 'rayleigh', format: { digits: 2, unit: '' } } };
    expect(danglingLiveValues(doc).map(({ reason, path }) => ({ reason, path }))).toEqual([{ reason: 'no-output', path: ['content', 1, 'content', 5] }]);
  });

  it('leaves out a simulation output that has not been reported yet: it exists, it only waits for the solver', () => {
    const doc = { type: 'doc', content: [
      { type: 'widget', attrs: { widgetId: 'overturn', widgetType: 'convection-cell', params: convectionCell.defaults } },
      { type: 'paragraph', content: [{ type: 'liveValue', attrs: { widgetId: 'overturn', output: 'vrms', format: { digits: 3, unit: '' } } }] },
    ] };
    expect(danglingLiveValues(doc)).toEqual([]);
  });

  it('finds a speed in cm/yr on a convection cell that has no physical properties to give it', () => {
    const doc = { type: 'doc', content: [
      { type: 'widget', attrs: { widgetId: 'overturn', widgetType: 'convection-cell', params: convectionCell.defaults } },
      { type: 'paragraph', content: [{ type: 'liveValue', attrs: { widgetId: 'overturn', output: 'speedCmYr', format: { digits: 3, unit: 'cm/yr' } } }] },
    ] };
    expect(danglingLiveValues(doc).map(({ reason }) => reason)).toEqual(['no-output']);
  });

  it('leaves a widget with invalid params to the params check', () => {
    const doc = examplePanelDoc();
    const widget = doc.content?.[2] as PanelNodeJSON;
    widget.attrs = { ...widget.attrs, params: { ...slopeParams, angleDeg: 400 } };
    expect(danglingLiveValues(doc)).toEqual([]);
  });
});
