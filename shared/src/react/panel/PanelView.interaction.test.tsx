// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
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
});
