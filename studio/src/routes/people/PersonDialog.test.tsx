import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { ApiError } from '../../api/client';
import { renderInStudio } from '../../test-utils';
import { PersonDialog, type PersonDialogProps } from './PersonDialog';

const translator = { email: 'lena.fischer@basalt-point.example', name: 'Lena Fischer', venueId: null, roles: ['translator' as const], locales: 'fr' };

function dialog(overrides: Partial<PersonDialogProps>) {
  const props: PersonDialogProps = {
    title: 'Invite someone', submitLabel: 'Send invitation', pendingLabel: 'Sending…', initial: translator,
    emailEditable: true, pending: false, error: null, onSubmit: () => undefined, onClose: () => undefined, ...overrides,
  };
  return renderInStudio(<PersonDialog {...props} />);
}

/** The text a screen reader hears as the description of a field. */
function description(label: RegExp): string {
  const ids = screen.getByLabelText(label).getAttribute('aria-describedby')?.split(' ') ?? [];
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').join(' ');
}

describe('person dialog', () => {
  it('puts the server’s locale error next to the locales field', async () => {
    const error = new ApiError(400, { message: 'Validation failed', errors: [{ path: ['locales', 0], message: 'Unknown locale “xx”' }] });
    await dialog({ error });
    expect(description(/Translator locales/)).toContain('Unknown locale “xx”');
  });

  it('says at the email field when the address already has an account (409)', async () => {
    await dialog({ error: new ApiError(409, { message: 'Conflict' }) });
    expect(description(/^Email/)).toContain('This address already has an account.');
  });

  it('refuses a locale that is not a BCP 47 tag before asking the server', async () => {
    const onSubmit = vi.fn();
    await dialog({ onSubmit, initial: { ...translator, locales: 'fr, french!' } });
    fireEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(description(/Translator locales/)).toContain('“french!” is not a BCP 47 language tag');
  });

  it('asks for at least one role', async () => {
    const onSubmit = vi.fn();
    await dialog({ onSubmit, initial: { ...translator, roles: [] } });
    fireEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.getByRole('group', { name: 'Roles' }).textContent).toContain('Choose at least one role.');
  });

  it('takes the role message away as soon as a role is ticked', async () => {
    await dialog({ onSubmit: vi.fn(), initial: { ...translator, roles: [] } });
    fireEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    fireEvent.click(screen.getByRole('checkbox', { name: 'Curator' }));
    expect(screen.getByRole('group', { name: 'Roles' }).textContent).not.toContain('Choose at least one role.');
  });
});
