import { describe, expect, it } from 'vitest';
import type { Placeholder } from '@mantlepiece/shared';
import { insertPlaceholder, meaningOf, placeholderUses, tokenOf } from './placeholders';

const bold: Placeholder = { id: '1', kind: 'paired', mark: { type: 'bold' } };
const liveValue: Placeholder = { id: '2', kind: 'standalone', node: { type: 'liveValue', attrs: { widgetId: 'w1', output: 'criticalAngle' } } };
const unit = { placeholders: [bold, liveValue] };

describe('placeholder uses', () => {
  it('counts each placeholder of the source as placed once, missing or repeated', () => {
    expect(Object.fromEntries(placeholderUses(unit, 'La roche {1}monte{/1} à {2}'))).toEqual({ 1: 'placed', 2: 'placed' });
    expect(Object.fromEntries(placeholderUses(unit, 'La roche monte à {2} et {2}'))).toEqual({ 1: 'missing', 2: 'repeated' });
  });

  it('does not read an escaped brace as a placeholder', () => {
    expect(placeholderUses(unit, '{{1} {1}x{/1}').get('1')).toBe('placed');
    expect(placeholderUses(unit, '{{2}').get('2')).toBe('missing');
  });
});

describe('inserting a placeholder', () => {
  it('wraps the selected words in a paired placeholder and puts the cursor after it', () => {
    expect(insertPlaceholder('La roche monte', { start: 9, end: 14 }, bold)).toEqual({ text: 'La roche {1}monte{/1}', cursor: 21 });
  });

  it('opens an empty pair with the cursor inside it when nothing is selected', () => {
    expect(insertPlaceholder('La roche ', { start: 9, end: 9 }, bold)).toEqual({ text: 'La roche {1}{/1}', cursor: 12 });
  });

  it('puts a single placeholder after the selection without replacing it', () => {
    expect(insertPlaceholder('à  par an', { start: 2, end: 2 }, liveValue)).toEqual({ text: 'à {2} par an', cursor: 5 });
    expect(insertPlaceholder('abc', { start: 0, end: 3 }, liveValue)).toEqual({ text: 'abc{2}', cursor: 6 });
  });
});

describe('placeholder names', () => {
  it('writes a pair with its closing token and names what each stands for', () => {
    expect([tokenOf(bold), tokenOf(liveValue)]).toEqual(['{1}…{/1}', '{2}']);
    expect([meaningOf(bold), meaningOf(liveValue), meaningOf({ id: '3', kind: 'standalone', node: { type: 'panelImage' } })]).toEqual(['bold', 'liveValue', 'other']);
  });
});
