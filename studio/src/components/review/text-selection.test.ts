import { describe, expect, it } from 'vitest';
import { anchorInPanelText, selectionRangeIn } from './text-selection';

function panel(html: string): HTMLElement {
  const root = document.createElement('article');
  root.innerHTML = html;
  document.body.replaceChildren(root);
  return root;
}

function select(startNode: Node, startOffset: number, endNode: Node, endOffset: number): Selection {
  const range = document.createRange();
  range.setStart(startNode, startOffset);
  range.setEnd(endNode, endOffset);
  const selection = window.getSelection()!;
  selection.removeAllRanges();
  selection.addRange(range);
  return selection;
}

describe('selectionRangeIn', () => {
  it('counts offsets over every text node before the selection, across paragraphs and marks', () => {
    const root = panel('<h2>Slopes</h2><p>A block <strong>rests</strong> on the slope.</p>');
    const strong = root.querySelector('strong')!.firstChild!;
    const after = strong.parentNode!.nextSibling!;
    const range = selectionRangeIn(root, select(strong, 0, after, 7));
    expect(range).toEqual({ from: 14, to: 26, quote: 'rests on the' });
    expect(root.textContent!.slice(range!.from, range!.to)).toBe(range!.quote);
  });

  it('ignores a collapsed selection, one of spaces only, and one outside the panel', () => {
    const root = panel('<p>Mantle rock flows slowly.</p>');
    const text = root.querySelector('p')!.firstChild!;
    expect(selectionRangeIn(root, select(text, 3, text, 3))).toBeNull();
    expect(selectionRangeIn(root, select(text, 6, text, 7))).toBeNull();
    const outside = document.createElement('p');
    outside.textContent = 'Elsewhere on the page';
    document.body.append(outside);
    expect(selectionRangeIn(root, select(outside.firstChild!, 0, outside.firstChild!, 9))).toBeNull();
  });
});

describe('anchorInPanelText', () => {
  const text = 'Hot rock rises\nDeep under your feet the rock is hot.\nThe rock flows.';

  it('finds the quote in the running text, across a line break, at the occurrence nearest the drawing’s offset', () => {
    // The drawing runs the heading into the paragraph: "…risesDeep…".
    expect(anchorInPanelText(text, { from: 9, to: 18, quote: 'risesDeep' })).toEqual({ from: 9, to: 19, quote: 'rises\nDeep' });
    // "rock" is at 4, 40 and 57 of the running text; the drawing had it near 54.
    expect(anchorInPanelText(text, { from: 54, to: 58, quote: 'rock' })).toEqual({ from: 57, to: 61, quote: 'rock' });
    expect(anchorInPanelText(text, { from: 0, to: 4, quote: 'rock' })).toEqual({ from: 4, to: 8, quote: 'rock' });
  });

  it('gives null for words that are not running text, such as an image credit', () => {
    expect(anchorInPanelText(text, { from: 70, to: 90, quote: 'Illustration: Basalt Point' })).toBeNull();
  });
});
