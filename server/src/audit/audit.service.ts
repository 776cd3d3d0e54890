import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type FindOptions, type Includeable, type Transaction, type WhereOptions } from 'sequelize';
import type { AuditEventView, Page, Role } from '@mantlepiece/shared';
import { scopeWhere, venueScope, type Member } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { isDateOnly } from '../common/date-only.js';
import { pageWindow, toPage } from '../common/page.js';
import { User } from '../users/models/user.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { AuditEvent } from './models/audit-event.model.js';
import type { ListAuditEventsQuery } from './dto/list-audit-events.query.js';
import { toAuditCsv, toAuditEventView } from './audit.presenter.js';

/** Who reads the audit trail: the admins, each of the venues where they are one. */
export const AUDIT_READERS: readonly Role[] = ['admin'];

/** Names of the things we record. */
export type AuditAction =
  | 'auth.signed-in'
  | 'auth.sign-in-locked'
  | 'auth.refresh-token-reused'
  | 'auth.password-reset'
  | 'user.invited'
  | 'user.invitation-accepted'
  | 'user.created'
  | 'user.roles-changed'
  | 'user.locales-changed'
  | 'user.activated'
  | 'user.deactivated'
  | 'revision.submitted'
  | 'revision.approved'
  | 'revision.changes-requested'
  | 'revision.withdrawn'
  | 'story.revised'
  | 'story.retired'
  | 'release.requested'
  | 'release.published'
  | 'release.rolled-back'
  | 'kiosk.paired'
  | 'kiosk.revoked';

export interface AuditEntry {
  actorId: number | null;
  action: AuditAction;
  targetType?: string;
  targetId?: string | number;
  /** The venue of what the event is about; left out for an organisation-wide event. */
  venueId?: number;
  detail?: Record<string, unknown>;
  clientAddress?: string;
}

@Injectable()
export class AuditService {
  constructor(
    @InjectModel(AuditEvent) private readonly events: typeof AuditEvent,
    private readonly clock: Clock,
  ) {}

  /** Appends one event; pass the transaction of the change it records, so both land or neither. */
  async record(entry: AuditEntry, transaction?: Transaction): Promise<void> {
    await this.events.create(
      {
        actorId: entry.actorId,
        action: entry.action,
        targetType: entry.targetType ?? null,
        targetId: entry.targetId === undefined ? null : String(entry.targetId),
        venueId: entry.venueId ?? null,
        detail: entry.detail ?? null,
        clientAddress: entry.clientAddress ?? null,
        createdAt: this.clock.now(),
      },
      { transaction },
    );
  }

  async list(query: ListAuditEventsQuery, member: Member): Promise<Page<AuditEventView>> {
    const { rows, count } = await this.events.findAndCountAll({ ...filtered(query, member), ...pageWindow(query) });
    return toPage(rows.map(toAuditEventView), count, query);
  }

  /** Every event the filter matches, oldest first as a trail is read, up to CSV_MAX_ROWS. */
  async exportCsv(query: ListAuditEventsQuery, member: Member): Promise<string> {
    const options = filtered(query, member);
    const include = [...(options.include as Includeable[]), { model: Venue, attributes: ['id', 'timeZone'] }];
    const rows = await this.events.findAll({ ...options, include, order: [['createdAt', 'ASC'], ['id', 'ASC']], limit: CSV_MAX_ROWS });
    return toAuditCsv(rows);
  }
}

/** A bound on one download; a longer trail is exported a date range at a time. */
export const CSV_MAX_ROWS = 100_000;

const DAY_MS = 86_400_000;

/** `to` as a date covers that whole day (UTC); as a moment it is the moment itself. */
const endOf = (to: string) => (isDateOnly(to) ? new Date(new Date(`${to}T00:00:00Z`).getTime() + DAY_MS) : new Date(new Date(to).getTime() + 1));

/**
 * The organisation's admin reads the whole trail; a venue's admin reads the events of their venues
 * only, never organisation-wide ones (sign-ins, accounts), which name no venue.
 */
function filtered(query: ListAuditEventsQuery, member: Member): FindOptions<AuditEvent> {
  const conditions: WhereOptions<AuditEvent>[] = [scopeWhere(venueScope(member, AUDIT_READERS))];
  if (query.venueId) conditions.push({ venueId: query.venueId });
  if (query.action) conditions.push({ action: query.action });
  if (query.actorId) conditions.push({ actorId: query.actorId });
  if (query.from) conditions.push({ createdAt: { [Op.gte]: new Date(query.from) } });
  if (query.to) conditions.push({ createdAt: { [Op.lt]: endOf(query.to) } });
  return {
    where: { [Op.and]: conditions },
    include: [{ model: User, attributes: ['id', 'name'] }],
    order: [['createdAt', 'DESC'], ['id', 'DESC']],
  };
}
