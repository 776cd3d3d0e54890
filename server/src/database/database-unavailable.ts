import { ConnectionError, DatabaseError } from 'sequelize';

/** What a client is told when the database does not answer in time; the outage is not theirs. */
export const DATABASE_UNAVAILABLE_MESSAGE = 'The database is not answering. Try again in a few seconds.';
export const DATABASE_RETRY_AFTER_SECONDS = 5;

/**
 * Statement stopped by MariaDB's max_statement_time (1969; MySQL's own is 3024), lock wait timed
 * out (1205), deadlock (1213: InnoDB rolled the transaction back, so nothing of it stays and the
 * same request may be sent again), connection killed (1927) or server shutting down (1053).
 */
const SERVER_ERRNOS = new Set([1969, 3024, 1205, 1213, 1927, 1053]);
/** mysql2's own: the client gave up on a statement, or the connection went away under it. */
const CLIENT_CODES = new Set(['PROTOCOL_SEQUENCE_TIMEOUT', 'PROTOCOL_CONNECTION_LOST', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT']);

/**
 * True for the errors of a database that is stalled, gone or too busy: no connection to be had
 * (refused, timed out, none free in the pool in time) or a statement that ran out of time. Such a
 * request may well succeed a little later, unlike one the database refused for its content.
 */
export function isDatabaseUnavailable(error: unknown): boolean {
  if (error instanceof ConnectionError) return true;
  if (!(error instanceof DatabaseError)) return false;
  const cause = error.parent as Error & { errno?: number; code?: string };
  return SERVER_ERRNOS.has(cause.errno ?? 0) || CLIENT_CODES.has(cause.code ?? '');
}
