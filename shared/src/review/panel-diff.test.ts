import { describe, expect, it } from 'vitest';
import type { PanelDocJSON, PanelNodeJSON } from '../panel/panel-json.js';
import { diffRevisions } from './panel-diff.js';
import { buildRevisionSnapshot, type SnapshotPanelInput } from './revision-snapshot.js';

const paragraph = (text: string): PanelNodeJSON => ({ type: 'paragraph', content: [{ type: 'text', text }] });
const widget = (widgetId: string, widgetType: string, params: Record<string, unknown>): PanelNodeJSON => ({ type: 'widget', attrs: { widgetType, widgetId, params } });
const doc = (...content: PanelNodeJSON[]): PanelDocJSON => ({ type: 'doc', content });
const slope = (angleDeg: number) => widget('ridge-slope', 'slope-force', { massKg: 10, angleDeg, staticFriction: 0.85, kineticFriction: 0.6 });

const revision = (...panels: { id: number; en: PanelDocJSON; fr?: PanelDocJSON }[]) =>
  buildRevisionSnapshot({
    id: 1,
    title: 'The slope of a ridge',
    audience: 'family',
    sourceLocale: 'en',
    panels: panels.map(({ id, en, fr }, index): SnapshotPanelInput => ({ id, position: index + 1, wordBudget: 60, docs: fr ? { en, fr } : { en } })),
  });

describe('diffRevisions', () => {
  it('shows a changed paragraph word by word', () => {
    const before = revision({ id: 1, en: doc(paragraph('Hot rock rises slowly.')) });
    const after = revision({ id: 1, en: doc(paragraph('Hot rock rises very slowly.')) });
    const [panel] = diffRevisions(before, after);
    expect(panel).toMatchObject({ panelId: 1, status: 'changed', numberBefore: 1, numberAfter: 1, widgets: [] });
    expect(panel?.text).toEqual([
      { kind: 'same', text: 'Hot rock rises ' },
      { kind: 'added', text: 'very ' },
      { kind: 'same', text: 'slowly.' },
    ]);
  });

  it('shows a replaced word as removed then added', () => {
    const before = revision({ id: 1, en: doc(paragraph('The plate moves north.')) });
    const after = revision({ id: 1, en: doc(paragraph('The plate moves south.')) });
    const pieces = diffRevisions(before, after)[0]?.text.filter((piece) => piece.kind !== 'same');
    expect(pieces).toEqual([
      { kind: 'removed', text: 'north' },
      { kind: 'added', text: 'south' },
    ]);
  });

  it('shows a changed widget param with its before and after values', () => {
    const before = revision({ id: 1, en: doc(paragraph('Tilt it.'), slope(30)) });
    const after = revision({ id: 1, en: doc(paragraph('Tilt it.'), slope(35)) });
    expect(diffRevisions(before, after)[0]?.widgets).toEqual([
      { kind: 'changed', widgetId: 'ridge-slope', widgetType: 'slope-force', params: [{ path: ['angleDeg'], before: 30, after: 35 }] },
    ]);
  });

  it('walks into nested params and reports a setting that appears or disappears', () => {
    const physical = { depthM: 2.9e6, densityKgM3: 3300 };
    const before = revision({ id: 1, en: doc(widget('cell', 'convection-cell', { nx: 64, physical, label: 'Mantle' })) });
    const after = revision({ id: 1, en: doc(widget('cell', 'convection-cell', { nx: 128, physical: { ...physical, depthM: 6.6e5 } })) });
    const [change] = diffRevisions(before, after)[0]!.widgets;
    expect(change?.kind === 'changed' && change.params).toEqual([
      { path: ['label'], before: 'Mantle' },
      { path: ['nx'], before: 64, after: 128 },
      { path: ['physical', 'depthM'], before: 2.9e6, after: 6.6e5 },
    ]);
  });

  it('reports widgets added and removed, and a widget whose type changed under the same id as both', () => {
    const before = revision({ id: 1, en: doc(slope(30), widget('cell', 'convection-cell', { rayleigh: 1e4 })) });
    const after = revision({ id: 1, en: doc(widget('ridge-slope', 'convection-cell', { rayleigh: 1e5 }), widget('cell-2', 'convection-cell', { rayleigh: 1e4 })) });
    expect(diffRevisions(before, after)[0]?.widgets.map((change) => `${change.kind} ${change.widgetId} ${change.widgetType}`)).toEqual([
      'removed ridge-slope slope-force',
      'removed cell convection-cell',
      'added ridge-slope convection-cell',
      'added cell-2 convection-cell',
    ]);
  });

  it('lists every panel as added when there is no approved revision yet, and marks removed and unchanged panels', () => {
    const first = revision({ id: 1, en: doc(paragraph('One.')) }, { id: 2, en: doc(paragraph('Two.')) });
    expect(diffRevisions(null, first).map((panel) => [panel.panelId, panel.status, panel.text])).toEqual([
      [1, 'added', [{ kind: 'added', text: 'One.' }]],
      [2, 'added', [{ kind: 'added', text: 'Two.' }]],
    ]);
    const second = revision({ id: 2, en: doc(paragraph('Two.')) });
    expect(diffRevisions(first, second).map((panel) => [panel.panelId, panel.status, panel.numberBefore, panel.numberAfter])).toEqual([
      [2, 'unchanged', 2, 1],
      [1, 'removed', 1, undefined],
    ]);
  });

  it('reports an image swapped on a panel whose text stayed the same', () => {
    const image = (mediaId: string): PanelNodeJSON => ({ type: 'panelImage', attrs: { mediaId } });
    const before = revision({ id: 1, en: doc(paragraph('Look.'), image('31')) });
    const after = revision({ id: 1, en: doc(paragraph('Look.'), image('32')) });
    expect(diffRevisions(before, after)[0]).toMatchObject({ status: 'changed', media: { added: ['32'], removed: ['31'] } });
  });

  it('diffs the locale asked for', () => {
    const before = revision({ id: 1, en: doc(paragraph('Hot rock rises.')), fr: doc(paragraph('La roche chaude monte.')) });
    const after = revision({ id: 1, en: doc(paragraph('Hot rock rises.')), fr: doc(paragraph('La roche chaude remonte.')) });
    expect(diffRevisions(before, after)[0]?.status).toBe('unchanged');
    expect(diffRevisions(before, after, 'fr')[0]?.text.filter((piece) => piece.kind !== 'same')).toEqual([
      { kind: 'removed', text: 'monte' },
      { kind: 'added', text: 'remonte' },
    ]);
  });
});
