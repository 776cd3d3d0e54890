import type { SequelizeOptions } from 'sequelize-typescript';

const TIME_ZONE = '+00:00';

/** How every connection of ours talks to MariaDB: utf8mb4 both ways, UTC, snake_case columns. */
export function sequelizeOptions(databaseUrl: string): SequelizeOptions & { uri: string } {
  return {
    uri: databaseUrl,
    dialect: 'mysql',
    logging: false,
    timezone: TIME_ZONE,
    dialectOptions: { charset: 'utf8mb4', dateStrings: false },
    define: { underscored: true, charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
    pool: { max: 10, idle: 10_000 },
  };
}

export interface DatabaseWaits {
  connectTimeoutMs: number;
  acquireTimeoutMs: number;
  /** 0: no limit on one statement. */
  statementTimeoutMs: number;
}

/**
 * The server's connection: every wait on the database is bounded, so a stalled MariaDB answers a
 * request with an error in seconds (mapped to 503 by the API's error filter) instead of never.
 * Migrations keep `sequelizeOptions` alone: a long schema change is legitimate there.
 */
export function boundedSequelizeOptions(databaseUrl: string, waits: DatabaseWaits): SequelizeOptions & { uri: string } {
  const options = sequelizeOptions(databaseUrl);
  return {
    ...options,
    dialectOptions: { ...options.dialectOptions, connectTimeout: waits.connectTimeoutMs },
    pool: { ...options.pool, acquire: waits.acquireTimeoutMs },
    // Sequelize's own `SET time_zone` would run before any limit is in place; the hook sets it instead.
    keepDefaultTimezone: true,
    hooks: { afterConnect: (connection) => boundStatements(connection as RawConnection, waits.statementTimeoutMs) },
  } as SequelizeOptions & { uri: string };
}

/**
 * A statement MariaDB is running but that waits (on a lock, say) is stopped by the server after
 * max_statement_time, and the connection stays usable. A server that does not answer at all
 * (stopped, or the network gone) cannot stop anything, so the client also gives up, a little later,
 * with mysql2's per-statement `timeout`, which Sequelize 6 does not pass on (sequelize#2072). Such a
 * connection is closed: its statement may still be queued in the server, and the pool then discards it.
 */
async function boundStatements(connection: RawConnection, statementTimeoutMs: number): Promise<void> {
  if (statementTimeoutMs > 0) {
    const clientTimeoutMs = statementTimeoutMs + CLIENT_GRACE_MS;
    for (const method of ['query', 'execute'] as const) {
      const run = connection[method].bind(connection);
      connection[method] = (sql, ...rest) => run(
        { timeout: clientTimeoutMs, ...(typeof sql === 'string' ? { sql } : (sql as object)) },
        ...rest.map((arg) => (typeof arg === 'function' ? closeOnTimeout(connection, arg as Callback) : arg)),
      );
    }
  }
  await new Promise<void>((resolve, reject) => connection.query(
    `SET time_zone = '${TIME_ZONE}', max_statement_time = ${statementTimeoutMs / 1000}`,
    (error: Error | null) => (error ? reject(error) : resolve()),
  ));
}

/** Room for the server's own limit to fire first while it is alive. */
const CLIENT_GRACE_MS = 1000;

type Callback = (error: (Error & { code?: string }) | null, ...results: unknown[]) => void;

/** The parts of a mysql2 connection used here (its typings do not declare the socket). */
interface RawConnection {
  query(sql: unknown, ...rest: unknown[]): unknown;
  execute(sql: unknown, ...rest: unknown[]): unknown;
  destroy(): void;
  stream: { destroy(): void };
}

function closeOnTimeout(connection: RawConnection, callback: Callback): Callback {
  return (error, ...results) => {
    if (error?.code === 'PROTOCOL_SEQUENCE_TIMEOUT') {
      connection.destroy();
      connection.stream.destroy();
    }
    callback(error, ...results);
  };
}
