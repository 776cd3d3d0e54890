import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { Editor } from '@tiptap/core';
import { panelExtensions, type PanelDocJSON } from '@mantlepiece/shared';
import { renderInStudio } from '../../test-utils';
import { EditorToolbar } from './EditorToolbar';

// Fluent's first render in jsdom is slow on a busy machine; the limit only bounds a hang.
const RENDER_LIMIT = 20_000;

/** A panel with the two widgets of the slab story: sea floor 100 Myr old (plate model), a 100 Myr plate with 700 km of slab. */
const PANEL: PanelDocJSON = {
  type: 'doc',
  content: [
    { type: 'widget', attrs: { widgetType: 'sea-floor-depth', widgetId: 'floor', params: { ageMyr: 100, model: 'plate' } } },
    { type: 'widget', attrs: { widgetType: 'plate-forces', widgetId: 'slab', params: { ageMyr: 100, slabLengthKm: 700, slabDipDeg: 60 } } },
    { type: 'paragraph', content: [{ type: 'text', text: 'Caption.' }] },
  ],
};

let editor: Editor | undefined;
afterEach(() => {
  cleanup();
  editor?.destroy();
});

async function openMenu(buttonName: string, language = 'en') {
  editor = new Editor({ extensions: panelExtensions, content: PANEL });
  await renderInStudio(<EditorToolbar editor={editor} locale="en" onPickImage={() => undefined} onEditLink={() => undefined} />, { language });
  fireEvent.click(screen.getByRole('button', { name: buttonName }));
  return screen.findByRole('menu');
}

// Intl puts no-break spaces between a number and its unit; they read as spaces here.
const itemTexts = (menu: HTMLElement) => within(menu).getAllByRole('menuitem').map((item) => (item.textContent ?? '').replace(/[\u00a0\u202f]/g, ' '));

describe('the editor toolbar offers the sea-floor and plate-forces widgets’ outputs and states', () => {
  it('lists every output of both widgets as a live value, with its value now and its unit', async () => {
    const items = itemTexts(await openMenu('Live value'));
    // Labels and values: GDH1 at 100 Myr is 5651 − 2473·e^(−2.78) = 5497.6 m (Stein and Stein 1992); the states are worded as the kiosk words them.
    const expected = [
      ['Depth of the sea floor (chosen model)', '5,498 m'],
      // GDH1 heat flow at 100 Myr: 48 + 96·e^(−2.78) = 53.96 mW/m², under a plate 95 km thick (Stein and Stein 1992).
      ['Heat flow out of the sea floor', '53.96 mW/m²'],
      ['Thickness of the cooled lithosphere', '95 km'],
      // Half-space at 100 Myr: 2500 + 354.7·√100 = 6047 m (Turcotte and Schubert; hand computation in sea-floor-depth.test.ts).
      ['Depth by the half-space model', '6,047 m'],
      ['Age of the sea floor', '100 Myr'],
      ['Still sinking or levelling off', 'levelling off'],
      ['Ridge push per metre', 'N/m'],
      ['Slab pull per metre', 'N/m'],
      ['Which force is bigger', 'slab pull is bigger'],
      ['Depth of the slab’s tip', 'km'],
    ];
    for (const [label, shown] of expected) {
      expect(items.some((item) => item.includes(label) && item.includes(shown)), `no live value "${label}" showing "${shown}" in ${JSON.stringify(items)}`).toBe(true);
    }
    // Every output of both widgets, none by its internal key.
    expect(items).toHaveLength(6 + 1 + 5);
    expect(items.filter((item) => /[a-z][A-Z]/.test(item.split(' · ')[0]!))).toEqual([]);
  }, RENDER_LIMIT);

  it('offers both widgets to a live phrase, each with its states worded', async () => {
    const items = itemTexts(await openMenu('Live phrase'));
    expect(items).toEqual(['Sea-floor depth 1still sinking / levelling off', 'Plate forces 2slab pull is bigger / ridge push is bigger']);
  }, RENDER_LIMIT);

  it('words the states in the studio’s language (French)', async () => {
    const items = itemTexts(await openMenu('Phrase vivante', 'fr'));
    expect(items.join(' | ')).toContain('s’enfonce encore / se stabilise');
    expect(items.join(' | ')).toContain('la traction est plus forte / la poussée est plus forte');
  }, RENDER_LIMIT);
});
