import { describe, expect, it } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import type { SubmitRequest } from '@mantlepiece/shared';
import { renderInStudio } from '../../test-utils';
import { SubmitDialog } from './SubmitDialog';

async function dialog(warnings: number) {
  const sent: SubmitRequest[] = [];
  await renderInStudio(<SubmitDialog title="Why the sea floor sinks" warnings={warnings} pending={false} problem={null} onSubmit={(request) => sent.push(request)} onClose={() => undefined} />);
  return sent;
}

// Fluent's first render in jsdom is slow on a busy machine; the limit only bounds a hang.
const RENDER_LIMIT = 20_000;

describe('submit dialog', () => {
  it('sends the note to the educator without the spaces around it', async () => {
    const sent = await dialog(0);
    expect(screen.getByRole('dialog', { name: 'Submit “Why the sea floor sinks” for review?' })).toBeTruthy();
    fireEvent.change(screen.getByRole('textbox', { name: /Note to the educator/ }), { target: { value: '  Panel 2 now says how deep.  ' } });
    fireEvent.click(screen.getByRole('button', { name: 'Submit for review' }));
    expect(sent).toEqual([{ note: 'Panel 2 now says how deep.' }]);
  }, RENDER_LIMIT);

  it('sends no note when none is written, and says that warnings go along', async () => {
    const sent = await dialog(2);
    expect(screen.getByText(/warnings go along with the revision/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Submit for review' }));
    expect(sent).toEqual([{}]);
  }, RENDER_LIMIT);
});
