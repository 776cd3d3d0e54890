import { ConnectionAcquireTimeoutError, ConnectionRefusedError, DatabaseError, ForeignKeyConstraintError } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { isDatabaseUnavailable } from './database-unavailable.js';

/** A driver error as mysql2 hands it to Sequelize. */
const driverError = (fields: { errno?: number; code?: string }) => Object.assign(new Error('from the driver'), fields);
const statementError = (fields: { errno?: number; code?: string }) => new DatabaseError(driverError(fields) as never);

describe('isDatabaseUnavailable', () => {
  it('takes a connection that cannot be had, or not in time, for an outage', () => {
    expect(isDatabaseUnavailable(new ConnectionAcquireTimeoutError(new Error('Operation timeout')))).toBe(true);
    expect(isDatabaseUnavailable(new ConnectionRefusedError(driverError({ code: 'ECONNREFUSED' })))).toBe(true);
  });

  it('takes a statement out of time or cut off for an outage', () => {
    // MariaDB's ER_STATEMENT_TIMEOUT (max_statement_time), InnoDB's lock wait timeout and deadlock, mysql2 giving up.
    for (const fields of [{ errno: 1969 }, { errno: 1205 }, { errno: 1213 }, { code: 'PROTOCOL_SEQUENCE_TIMEOUT' }, { code: 'PROTOCOL_CONNECTION_LOST' }]) {
      expect(isDatabaseUnavailable(statementError(fields)), JSON.stringify(fields)).toBe(true);
    }
  });

  it('leaves the database refusing a statement for its content, and any other error, alone', () => {
    expect(isDatabaseUnavailable(statementError({ errno: 1064, code: 'ER_PARSE_ERROR' }))).toBe(false);
    expect(isDatabaseUnavailable(new ForeignKeyConstraintError({ fields: { gallery_id: '1' } }))).toBe(false);
    expect(isDatabaseUnavailable(new Error('connect ETIMEDOUT'))).toBe(false);
  });
});
