/**
 * What a new password must be (NIST SP 800-63B, 5.1.1.2: length, not a common password, no
 * composition rules), written once for the server that enforces it and the studio that shows it.
 */
export const MIN_PASSWORD_LENGTH = 12;
export const MAX_PASSWORD_LENGTH = 256;

export type PasswordProblem = 'tooShort' | 'tooLong' | 'onlySpaces' | 'common';

/** Why a password is refused, in the words of the API's 400; the studio says the same in each UI language. */
export const PASSWORD_PROBLEMS: Record<PasswordProblem, string> = {
  tooShort: `Use at least ${MIN_PASSWORD_LENGTH} characters.`,
  tooLong: `Use at most ${MAX_PASSWORD_LENGTH} characters.`,
  onlySpaces: 'Use something other than spaces.',
  common: 'This password is on a list of commonly used passwords. Choose another.',
};

/**
 * The first problem with a new password, or null. Length counts characters as people see them
 * (code points), not UTF-16 units. `isCommon` is the server's list lookup; the studio leaves it out.
 */
export function passwordProblem(password: string, isCommon: (password: string) => boolean = () => false): PasswordProblem | null {
  const length = [...password].length;
  if (length < MIN_PASSWORD_LENGTH) return 'tooShort';
  if (length > MAX_PASSWORD_LENGTH) return 'tooLong';
  if (password.trim() === '') return 'onlySpaces';
  if (isCommon(password)) return 'common';
  return null;
}
