import { Op, type ModelStatic, type Order, type Transaction, type WhereOptions } from 'sequelize';
import type { Model, Sequelize } from 'sequelize-typescript';
import type { Clock } from '../clock/clock.service.js';

/** A row of a work table: `claimedBy` and `claimExpiresAt` say which instance holds it, and until when. */
export interface Claimable {
  id: number;
  claimedBy: string | null;
  claimExpiresAt: Date | null;
}

/** Nobody holds it: never claimed, let go, or held by an instance whose claim ran out (it died or hangs). */
export const unclaimedAt = (now: Date): WhereOptions => ({ [Op.or]: [{ claimExpiresAt: null }, { claimExpiresAt: { [Op.lt]: now } }] });

/**
 * Claims rows of one work table for one instance. A claim is a locking read that skips rows
 * another instance is claiming at that moment (`FOR UPDATE SKIP LOCKED`), then marks the rows with
 * the owner and an expiry, in one transaction: two instances never get the same row, and neither
 * waits for the other. Every later write checks the owner, so an instance whose claim ran out and
 * was taken over changes nothing.
 */
export class ClaimQueue<M extends Model & Claimable> {
  constructor(
    private readonly model: ModelStatic<M>,
    private readonly sequelize: Sequelize,
    private readonly clock: Clock,
    readonly owner: string,
    readonly leaseMs: number,
  ) {}

  /** Up to `limit` rows that match `ready` and that nobody holds, now held by this instance. */
  claim(ready: WhereOptions, { order, limit }: { order: Order; limit: number }): Promise<M[]> {
    return this.sequelize.transaction(async (transaction) => {
      const now = this.clock.now();
      const rows = await this.model.findAll({
        where: { [Op.and]: [ready, unclaimedAt(now)] }, order, limit, lock: transaction.LOCK.UPDATE, skipLocked: true, transaction,
      });
      if (rows.length === 0) return [];
      const claim = { claimedBy: this.owner, claimExpiresAt: new Date(now.getTime() + this.leaseMs) };
      await this.model.update(claim as never, { where: { id: rows.map((row): unknown => row.id) } as WhereOptions, transaction, silent: true });
      for (const row of rows) row.set(claim as never, { raw: true });
      return rows;
    });
  }

  /** Pushes the claim on, recording `progress` with it; false when it was lost to another instance. */
  async extend(id: number, progress: Partial<M['_creationAttributes']> = {}, transaction?: Transaction): Promise<boolean> {
    const [held] = await this.model.update(
      { ...progress, claimExpiresAt: this.clock.fromNow(this.leaseMs) } as never,
      { where: { id, claimedBy: this.owner } as WhereOptions, transaction, silent: true },
    );
    return held === 1;
  }

  /** Records the outcome and lets the row go; false, and nothing written, when the claim was lost to another instance. */
  async settle(id: number, outcome: Partial<M['_creationAttributes']>, transaction?: Transaction): Promise<boolean> {
    const [settled] = await this.model.update(
      { ...outcome, claimedBy: null, claimExpiresAt: null } as never,
      { where: { id, claimedBy: this.owner } as WhereOptions, transaction },
    );
    return settled === 1;
  }
}
