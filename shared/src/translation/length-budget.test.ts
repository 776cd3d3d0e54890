import { describe, expect, it } from 'vitest';
import { lengthBudgetWarning } from './length-budget.js';
import { segmentAltText } from './segment-panel.js';

describe('lengthBudgetWarning', () => {
  it('warns about listening, not fitting, for alt text, which screen readers read and the screen never shows', async () => {
    const unit = await segmentAltText('ridge-photo', 'A ridge of dark basalt under the sea.', { sourceLocale: 'en' });
    const warning = lengthBudgetWarning(unit, [{ type: 'text', text: 'Une dorsale de basalte sombre sous la mer, '.repeat(6) }], { targetLocale: 'fr' });
    expect(warning?.kind).toBe('altText');
    expect(warning?.message).toContain('read aloud by screen readers');
    expect(warning?.message).not.toContain('fit on the screen');
  });
});
