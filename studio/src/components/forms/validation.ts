import type { TFunction } from 'i18next';
import { canonicalLanguageTag, MIN_PASSWORD_LENGTH, passwordProblem } from '@mantlepiece/shared';

/** The server's own length rule; it also refuses common passwords, and its message shows at the field. */
export { MIN_PASSWORD_LENGTH };

export type FieldProblems<F extends string> = Partial<Record<F, string>>;

// Deliberately loose: one "@" with text around it and a dot in the domain. The server decides.
const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export function emailProblem(t: TFunction, email: string): string | undefined {
  if (!email.trim()) return t('validation.required');
  return EMAIL.test(email.trim()) ? undefined : t('validation.email');
}

export function requiredProblem(t: TFunction, value: string): string | undefined {
  return value.trim() ? undefined : t('validation.required');
}

export function newPasswordProblems(t: TFunction, password: string, confirm: string): FieldProblems<'password' | 'confirm'> {
  const problems: FieldProblems<'password' | 'confirm'> = {};
  if (passwordProblem(password) === 'tooShort') problems.password = t('validation.passwordLength', { min: MIN_PASSWORD_LENGTH });
  if (confirm !== password) problems.confirm = t('validation.passwordMismatch');
  return problems;
}

/** Splits "fr, es-MX" into canonical BCP 47 tags (the shared canonicalLanguageTag); the first tag that is not one is reported. */
export function parseLocales(input: string): { locales: string[]; invalid?: string } {
  const tags = input.split(/[\s,;]+/).filter(Boolean);
  const locales: string[] = [];
  for (const tag of tags) {
    const canonical = canonicalLanguageTag(tag);
    if (canonical === null) return { locales, invalid: tag };
    if (!locales.includes(canonical)) locales.push(canonical);
  }
  return { locales };
}

export const hasProblems = (problems: Record<string, string | undefined>) => Object.values(problems).some(Boolean);
