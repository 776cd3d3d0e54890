import { describe, expect, it } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import type { PreflightEntry, RevisionCan } from '@mantlepiece/shared';
import { renderInStudio } from '../../test-utils';
import { VerdictForm } from './VerdictForm';

const missingAlt: PreflightEntry = { check: 'image-alt-text', severity: 'blocker', passed: false, message: 'Panel 1: the image “slab.png” has no alt text in English.', panelId: 4 };

// The server withholds approval while blockers stand (RevisionCan from GET /api/revisions/:id).
const form = (blockers: PreflightEntry[], can: RevisionCan = { approve: blockers.length === 0, requestChanges: true, comment: true }) =>
  renderInStudio(<VerdictForm can={can} revisionId={7} storyId={3} blockers={blockers} onSettled={() => undefined} onRecorded={() => undefined} />);

describe('verdict form', () => {
  it('offers approval when preflight found no blockers', async () => {
    await form([]);
    expect((screen.getByRole('radio', { name: 'Approve' }) as HTMLInputElement).checked).toBe(true);
    expect((screen.getByRole('button', { name: 'Approve this revision' }) as HTMLButtonElement).disabled).toBe(false);
  });

  it('disables approval while preflight has blockers, and lists them', async () => {
    await form([missingAlt]);
    expect((screen.getByRole('radio', { name: 'Approve' }) as HTMLInputElement).disabled).toBe(true);
    expect((screen.getByRole('radio', { name: 'Request changes' }) as HTMLInputElement).checked).toBe(true);
    expect(screen.getAllByRole('listitem').map((item) => item.textContent)).toEqual([missingAlt.message]);
  });

  it('offers only a request for changes when the server withholds approval (the revision is the educator’s own)', async () => {
    await form([], { approve: false, requestChanges: true, comment: true });
    expect((screen.getByRole('radio', { name: 'Approve' }) as HTMLInputElement).disabled).toBe(true);
    expect((screen.getByRole('radio', { name: 'Request changes' }) as HTMLInputElement).checked).toBe(true);
  });

  it('asks for a note before sending a request for changes', async () => {
    await form([missingAlt]);
    fireEvent.click(screen.getByRole('button', { name: 'Send back for changes' }));
    const note = screen.getByRole('textbox', { name: /What should change/ });
    expect(note.getAttribute('aria-invalid')).toBe('true');
    const described = (note.getAttribute('aria-describedby') ?? '').split(' ').map((id) => document.getElementById(id)?.textContent ?? '').join(' ');
    expect(described).toContain('Say what should change: a request for changes needs a note.');
  });
});
