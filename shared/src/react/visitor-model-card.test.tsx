// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { PanelDocJSON } from '../panel/panel-json.js';
import { PanelView } from './panel/PanelView.js';

afterEach(cleanup);

const panelWith = (visitorModelCard: boolean): PanelDocJSON => ({
  type: 'doc',
  content: [{ type: 'widget', attrs: { widgetType: 'sea-floor-depth', widgetId: 'floor', params: { ageMyr: 50, model: 'plate' }, visitorModelCard } }],
});

const noMedia = () => null;

describe('"How do we know?" on a kiosk panel', () => {
  it('opens the widget’s model card in the visitor’s language where the curator allowed it', () => {
    render(<PanelView doc={panelWith(true)} locale="fr" resolveMedia={noMedia} widgetInput="touch" />);
    const open = screen.getByText('Comment le sait-on ?');
    const card = open.closest('details')!;
    expect(card.open).toBe(false);
    fireEvent.click(open);
    expect(card.open).toBe(true);
    // The plate model's source as published: Stein, C. A. and Stein, S. (1992), Nature 359, 123–129,
    // whose DOI is 10.1038/359123a0 (from memory, and as doi.org resolves it).
    expect(card.querySelector('[data-model-card="sources"]')?.textContent).toContain('doi:10.1038/359123a0');
    expect(card.querySelector('[data-model-card="equations"] li')).not.toBeNull();
  });

  it('is not there unless the curator chose it', () => {
    render(<PanelView doc={panelWith(false)} locale="fr" resolveMedia={noMedia} widgetInput="touch" />);
    expect(screen.queryByText('Comment le sait-on ?')).toBeNull();
  });
});
