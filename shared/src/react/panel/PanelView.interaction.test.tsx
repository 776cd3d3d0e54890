// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { PanelDocJSON } from '../../panel/panel-json.js';
import { PanelView } from './PanelView.js';

afterEach(cleanup);

// Shear S = m·g·sin θ with g0 = 9.80665 m/s² (3rd CGPM, 1901): 10 kg at 30° gives 49.03 N, at 40° 63.04 N.
const doc: PanelDocJSON = {
  type: 'doc',
  content: [
    {
      type: 'paragraph',
      content: [
        { type: 'text', text: 'Pull down the slope: ' },
        { type: 'liveValue', attrs: { widgetId: 'slope', output: 'shearN', format: { digits: 4, unit: 'N' } } },
      ],
    },
    { type: 'widget', attrs: { widgetType: 'slope-force', widgetId: 'slope', params: { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 } } },
  ],
};

describe('PanelView under touch', () => {
  it('updates a live value when the visitor changes its widget', () => {
    const { container } = render(<PanelView doc={doc} locale="en" resolveMedia={() => null} reducedMotion />);
    const live = () => container.querySelector('.mp-live-value')?.textContent;
    expect(live()).toBe('49.03\u00a0N');
    fireEvent.keyDown(screen.getByRole('slider'), { key: 'PageUp' });
    expect(live()).toBe('63.04\u00a0N');
  });

  it('starts a new panel from its own params, not from what the last visitor set', () => {
    const { container, rerender } = render(<PanelView doc={doc} locale="en" resolveMedia={() => null} reducedMotion />);
    fireEvent.keyDown(screen.getByRole('slider'), { key: 'PageUp' });
    rerender(<PanelView doc={structuredClone(doc)} locale="en" resolveMedia={() => null} reducedMotion />);
    expect(container.querySelector('.mp-live-value')?.textContent).toBe('49.03\u00a0N');
  });

  it('shows the running solver’s Nu in a live value, matching the cell’s own readout, once it reports', async () => {
    const convection: PanelDocJSON = {
      type: 'doc',
      content: [
        { type: 'paragraph', content: [{ type: 'text', text: 'Heat carried: ' }, { type: 'liveValue', attrs: { widgetId: 'cell', output: 'nusselt', format: { digits: 3, unit: '' } } }] },
        { type: 'widget', attrs: { widgetType: 'convection-cell', widgetId: 'cell', params: { rayleigh: 1e4, aspectRatio: 1, nx: 32, nz: 32, playbackSpeed: 1, colourRamp: 'mantle-heat', overlay: 'none', units: 'non-dimensional' } } },
      ],
    };
    const { container } = render(<PanelView doc={convection} locale="en" resolveMedia={() => null} reducedMotion />);
    const liveValue = () => container.querySelector('.mp-live-value')!.textContent;
    await waitFor(() => expect(liveValue()).not.toBe('—'));
    expect(liveValue()).toBe(container.querySelector('[data-readout="nusselt"]')!.textContent);
    fireEvent.click(screen.getByRole('button', { name: 'Step forward' }));
    await waitFor(() => expect(Number(liveValue())).toBeGreaterThan(1));
    expect(liveValue()).toBe(container.querySelector('[data-readout="nusselt"]')!.textContent);
  });
});
