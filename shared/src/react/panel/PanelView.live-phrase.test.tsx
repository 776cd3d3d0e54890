// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { PanelDocJSON } from '../../panel/panel-json.js';
import { PanelView } from './PanelView.js';

afterEach(cleanup);

// μs = 0.6: the block slides above arctan 0.6 ≈ 30.96° (inclined plane with Coulomb friction, the brief's science).
const doc: PanelDocJSON = {
  type: 'doc',
  content: [
    {
      type: 'paragraph',
      content: [
        { type: 'text', text: 'The block ' },
        { type: 'livePhrase', attrs: { phraseId: 'ph-1', widgetId: 'slope', wordings: { holds: 'holds fast', slides: 'starts to slide' } } },
        { type: 'text', text: '.' },
      ],
    },
    { type: 'widget', attrs: { widgetType: 'slope-force', widgetId: 'slope', params: { massKg: 10, angleDeg: 25, staticFriction: 0.6, kineticFriction: 0.5 } } },
  ],
};

describe('PanelView: a live phrase', () => {
  it('switches wording when the visitor tilts the slope past the critical angle, and says so to a screen reader', () => {
    const { container } = render(<PanelView doc={doc} locale="en" resolveMedia={() => null} reducedMotion />);
    const phrase = () => container.querySelector('.mp-live-phrase');
    expect(phrase()?.textContent).toBe('holds fast');
    expect(phrase()?.getAttribute('aria-live')).toBe('polite');
    // PageUp tilts 10° more: 25° → 35°, past 30.96°.
    fireEvent.keyDown(screen.getByRole('slider'), { key: 'PageUp' });
    expect(phrase()?.textContent).toBe('starts to slide');
    expect(phrase()?.getAttribute('data-state')).toBe('slides');
  });
});
