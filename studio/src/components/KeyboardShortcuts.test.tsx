import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { renderInStudio } from '../test-utils';
import { KeyboardShortcuts } from './KeyboardShortcuts';

// Fluent's first render in jsdom is slow on a busy machine; the limit only bounds a hang.
const RENDER_LIMIT = 20_000;

describe('keyboard-shortcut sheet', () => {
  it('opens on ? pressed outside text, listing the panel list’s shortcut, and not on ? typed into a field', async () => {
    await renderInStudio(<><input aria-label="Title" /><KeyboardShortcuts /></>);
    fireEvent.keyDown(screen.getByRole('textbox', { name: 'Title' }), { key: '?' });
    expect(screen.queryByRole('dialog', { name: 'Keyboard shortcuts' })).toBeNull();
    fireEvent.keyDown(document.body, { key: '?' });
    const sheet = await screen.findByRole('dialog', { name: 'Keyboard shortcuts' });
    expect(sheet.textContent).toContain('Move the chosen panel earlier or later');
    fireEvent.click(screen.getByRole('button', { name: 'Close' }));
    await waitFor(() => expect(screen.queryByRole('dialog', { name: 'Keyboard shortcuts' })).toBeNull());
  }, RENDER_LIMIT);
});
