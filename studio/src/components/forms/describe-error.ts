import type { TFunction } from 'i18next';
import { ApiError, NETWORK_FAILURE } from '../../api/client';

/**
 * The sentence to show for a failed request. Pages pass their own wording for the statuses that
 * mean something specific to them (401 on sign-in, 429 after too many attempts).
 */
export function describeError(t: TFunction, error: unknown, byStatus: Partial<Record<number, string>> = {}): string {
  if (!(error instanceof ApiError)) return t('common.unexpectedError', { status: '?' });
  const specific = byStatus[error.status];
  if (specific) return specific;
  if (error.status === NETWORK_FAILURE) return t('common.networkError');
  if (error.status >= 500) return t('common.unexpectedError', { status: error.status });
  return error.message;
}

/** The server's message for a field, when the failed request named it. */
export function serverFieldMessage(error: unknown, field: string): string | undefined {
  return error instanceof ApiError ? error.fieldMessage(field) : undefined;
}

/** Whether the failure is already shown next to one of the form's own fields. */
export function shownAtField(error: unknown, fields: readonly string[]): boolean {
  return error instanceof ApiError && fields.some((field) => error.fieldMessage(field) !== undefined);
}
