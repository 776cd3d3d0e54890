import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, QueryTypes } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { Clock } from '../clock/clock.service.js';
import { RateLimitCounter } from './models/rate-limit.model.js';
import { TooManyAttemptsException, waitText } from './too-many-attempts.exception.js';

/** A UTC DATETIME(3) literal: a Date as a replacement would lose its milliseconds. */
const sqlTime = (date: Date) => date.toISOString().slice(0, 23).replace('T', ' ');

/**
 * One limit on one subject: at most `max` takes per window. With `slowDown`, takes past `max`
 * are not refused for the rest of the window but spaced out, each wait doubling from `baseMs`
 * up to `maxMs`.
 */
export interface RateLimit {
  /** What is counted, e.g. `sign-in:account`. */
  scope: string;
  /** Whose: an e-mail address, a client address, a station id. */
  subject: string;
  max: number;
  windowMs: number;
  slowDown?: { baseMs: number; maxMs: number };
}

type Counter = Pick<RateLimitCounter, 'count' | 'windowStartedAt' | 'notBefore'>;

/** How long `limit` makes a take wait now (0: it may go); the same rule as the conditional UPDATE below. */
export function waitMsOf(counter: Counter, limit: RateLimit, now: Date): number {
  if (counter.windowStartedAt.getTime() + limit.windowMs <= now.getTime()) return 0;
  if (limit.slowDown) return Math.max((counter.notBefore?.getTime() ?? 0) - now.getTime(), 0);
  return counter.count >= limit.max ? counter.windowStartedAt.getTime() + limit.windowMs - now.getTime() : 0;
}

/**
 * Takes one from a counter row in a single statement, so MariaDB serialises parallel takes on the
 * row and no request holds a lock or a connection while it waits. The window starts afresh once
 * it has passed; MariaDB assigns left to right, so `count` is set before `window_started_at`
 * changes and `not_before` sees the new `count`.
 */
const TAKE = `
  UPDATE rate_limits SET
    count = IF(window_started_at <= :windowStart, 1, count + 1),
    not_before = IF(:slowDown AND count >= :max,
      DATE_ADD(:now, INTERVAL FLOOR(LEAST(:baseMs * POW(2, count - :max), :maxMs)) * 1000 MICROSECOND), NULL),
    window_started_at = IF(window_started_at <= :windowStart, :now, window_started_at)
  WHERE scope = :scope AND subject = :subject
    AND (window_started_at <= :windowStart
      OR (:slowDown AND (not_before IS NULL OR not_before <= :now))
      OR (NOT :slowDown AND count < :max))`;

/**
 * The one place limits are counted: sign-ins, password reset requests, pairing starts and
 * pairing codes. Counters live in MariaDB, one row per limit and subject, and each take is one
 * conditional UPDATE of that row, so N parallel requests, on however many server instances,
 * get no more than the limit.
 */
@Injectable()
export class RateLimitsService {
  constructor(
    @InjectModel(RateLimitCounter) private readonly counters: typeof RateLimitCounter,
    private readonly sequelize: Sequelize,
    private readonly clock: Clock,
  ) {}

  /**
   * Takes one from every limit, or from none and throws a 429 saying `refusal` and when to try
   * again. Returns the limits this take used up, for the caller to record. Limits are taken in
   * the order given, and one that refuses gives back what the earlier ones took, so a flood that
   * one limit stops never reaches the limits after it (put a slow-down last).
   */
  async take(limits: RateLimit[], refusal: string): Promise<RateLimit[]> {
    const taken: RateLimit[] = [];
    for (const limit of limits) {
      if (!(await this.takeOne(limit))) {
        await this.refund(taken);
        const seconds = Math.max(Math.ceil((await this.waitMs(limit)) / 1000), 1);
        throw new TooManyAttemptsException(`${refusal} Try again in ${waitText(seconds)}.`, seconds);
      }
      taken.push(limit);
    }
    const counters = await this.counters.findAll({ where: { [Op.or]: limits.map(({ scope, subject }) => ({ scope, subject })) } });
    return limits.filter((limit) => counters.some((c) => c.scope === limit.scope && c.subject === limit.subject && c.count === limit.max));
  }

  /**
   * Gives one back: an attempt that turned out well does not count against a limit of failures.
   * A slow-down back under its allowance stops delaying.
   */
  async refund(limits: RateLimit[]): Promise<void> {
    for (const { scope, subject, max } of limits) {
      await this.sequelize.query(
        'UPDATE rate_limits SET count = GREATEST(count - 1, 0), not_before = IF(count < :max, NULL, not_before) WHERE scope = :scope AND subject = :subject',
        { replacements: { scope, subject, max }, type: QueryTypes.BULKUPDATE },
      );
    }
  }

  /** Starts a subject's count afresh, e.g. an account's after it signs in or sets a new password. */
  async clear(scope: string, subject: string | { startsWith: string }): Promise<void> {
    const match = typeof subject === 'string' ? subject : { [Op.like]: `${subject.startsWith.replace(/[\\%_]/g, '\\$&')}%` };
    await this.counters.destroy({ where: { scope, subject: match } });
  }

  private async takeOne(limit: RateLimit): Promise<boolean> {
    const now = this.clock.now();
    const replacements = {
      scope: limit.scope, subject: limit.subject, max: limit.max, now: sqlTime(now), windowStart: sqlTime(new Date(now.getTime() - limit.windowMs)),
      slowDown: Boolean(limit.slowDown), baseMs: limit.slowDown?.baseMs ?? 0, maxMs: limit.slowDown?.maxMs ?? 0,
    };
    const update = async () => (await this.sequelize.query(TAKE, { replacements, type: QueryTypes.BULKUPDATE })) as unknown as number;
    if ((await update()) === 1) return true;
    // Perhaps the subject's first take: the row is made (INSERT IGNORE, as parallel takes may race to it) and the take tried again.
    await this.counters.bulkCreate([{ scope: limit.scope, subject: limit.subject, count: 0, windowStartedAt: now, notBefore: null }], { ignoreDuplicates: true });
    return (await update()) === 1;
  }

  private async waitMs(limit: RateLimit): Promise<number> {
    const counter = await this.counters.findOne({ where: { scope: limit.scope, subject: limit.subject } });
    return counter ? waitMsOf(counter, limit, this.clock.now()) : 0;
  }
}
