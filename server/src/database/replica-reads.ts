import { AsyncLocalStorage } from 'node:async_hooks';
import type { NextFunction, Request, Response } from 'express';
import type { SequelizeOptions } from 'sequelize-typescript';

/**
 * Reads from MariaDB replicas (DATABASE_REPLICA_URLS). Only reads that may lag a little go there:
 * those of a GET or HEAD request from a client that has not written lately. Every other read (a
 * request that writes, a background job, a migration) stays on the primary, as do writes and
 * everything inside a transaction (Sequelize's read replication).
 */
const mayLag = new AsyncLocalStorage<boolean>();

/**
 * Set on a client that writes, for as long as a replica may trail the primary: while it lasts, that
 * client's reads come from the primary, so a person always sees what they just wrote, on whichever
 * server instance their next request lands.
 */
export const FRESH_READS_COOKIE = 'mp_fresh_reads';

const READ_ONLY_METHODS = new Set(['GET', 'HEAD']);

/** Express middleware deciding, per request, whether its reads may come from a replica. */
export function routeReads({ lagAllowanceSeconds, secure }: { lagAllowanceSeconds: number; secure: boolean }) {
  return (request: Request, response: Response, next: NextFunction) => {
    const writes = !READ_ONLY_METHODS.has(request.method);
    if (writes) response.cookie(FRESH_READS_COOKIE, '1', { maxAge: lagAllowanceSeconds * 1000, httpOnly: true, sameSite: 'strict', secure, path: '/' });
    mayLag.run(!writes && request.cookies?.[FRESH_READS_COOKIE] === undefined, next);
  };
}

/** A MariaDB URL as the connection fields Sequelize's replication takes. */
function connectionOf(url: string) {
  const parsed = new URL(url);
  return {
    host: parsed.hostname,
    port: Number(parsed.port || 3306),
    username: decodeURIComponent(parsed.username),
    password: decodeURIComponent(parsed.password),
    database: parsed.pathname.slice(1),
  };
}

/**
 * Sequelize options that send reads which may lag to `replicaUrls` (round robin) and keep every other
 * query on `primaryUrl`. No replicas: nothing changes.
 */
export function replicationOptions(primaryUrl: string, replicaUrls: readonly string[]): Partial<SequelizeOptions> {
  if (replicaUrls.length === 0) return {};
  return {
    replication: { write: connectionOf(primaryUrl), read: replicaUrls.map(connectionOf) },
    hooks: {
      // Sequelize sends every SELECT outside a transaction to a replica unless told otherwise.
      beforePoolAcquire: (options?: { useMaster?: boolean }) => {
        if (options && mayLag.getStore() !== true) options.useMaster = true;
      },
    },
  };
}
