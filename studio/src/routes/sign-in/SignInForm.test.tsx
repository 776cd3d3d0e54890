import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { ApiError } from '../../api/client';
import { renderInStudio } from '../../test-utils';
import { SignInForm } from './SignInForm';

const fill = (label: RegExp, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });

/** The form-level message bar (field messages are alerts too, but sit inside their field). */
const formAlert = () => document.querySelector('.fui-MessageBar');

/** The text a screen reader hears as the description of a field. */
function description(label: RegExp): string {
  const ids = screen.getByLabelText(label).getAttribute('aria-describedby')?.split(' ') ?? [];
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').join(' ');
}

describe('sign-in form', () => {
  it('shows the wrong-credentials message the server answered with 401', async () => {
    const refused = new ApiError(401, { message: 'Email or password is incorrect.' });
    await renderInStudio(<SignInForm onSubmit={() => undefined} pending={false} error={refused} />);
    expect(formAlert()?.textContent).toContain('Email or password is incorrect.');
  });

  it('tells the person to wait after too many attempts (429)', async () => {
    const throttled = new ApiError(429, { message: 'ThrottlerException: Too Many Requests' });
    await renderInStudio(<SignInForm onSubmit={() => undefined} pending={false} error={throttled} />);
    expect(formAlert()?.textContent).toContain('Too many failed attempts');
  });

  it('puts a server validation error next to the field it names', async () => {
    const invalid = new ApiError(400, { message: 'Validation failed', errors: [{ path: ['email'], message: 'Invalid email address' }] });
    await renderInStudio(<SignInForm onSubmit={() => undefined} pending={false} error={invalid} />);
    expect(formAlert()).toBeNull();
    expect(description(/^Email/)).toContain('Invalid email address');
    expect(screen.getByLabelText(/^Email/).getAttribute('aria-invalid')).toBe('true');
  });

  it('does not submit an empty form and says what is missing', async () => {
    const onSubmit = vi.fn();
    await renderInStudio(<SignInForm onSubmit={onSubmit} pending={false} error={null} />);
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(description(/^Email/)).toContain('Required');
    expect(description(/^Password/)).toContain('Required');
  });

  it('submits the trimmed address and the password as typed', async () => {
    const onSubmit = vi.fn();
    await renderInStudio(<SignInForm onSubmit={onSubmit} pending={false} error={null} />);
    fill(/^Email/, '  curator@demo.test ');
    fill(/^Password/, ' secret with spaces ');
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(onSubmit).toHaveBeenCalledWith({ email: 'curator@demo.test', password: ' secret with spaces ' });
  });

  it('speaks French when the studio does', async () => {
    await renderInStudio(<SignInForm onSubmit={() => undefined} pending={false} error={new ApiError(401, { message: 'x' })} />, { language: 'fr' });
    expect(screen.getByRole('button', { name: 'Se connecter' })).toBeTruthy();
    expect(formAlert()?.textContent).toContain('L’adresse ou le mot de passe est incorrect.');
  });
});
