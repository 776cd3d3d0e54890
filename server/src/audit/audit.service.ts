import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction, WhereOptions } from 'sequelize';
import { Clock } from '../clock/clock.service.js';
import { PageQuery, pageWindow, toPage } from '../common/page.js';
import { User } from '../users/models/user.model.js';
import { AuditEvent } from './models/audit-event.model.js';
import type { ListAuditEventsQuery } from './dto/list-audit-events.query.js';
import { toAuditEventView } from './audit.presenter.js';

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
  | 'user.deactivated';

export interface AuditEntry {
  actorId: number | null;
  action: AuditAction;
  targetType?: string;
  targetId?: string | number;
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
        detail: entry.detail ?? null,
        clientAddress: entry.clientAddress ?? null,
        createdAt: this.clock.now(),
      },
      { transaction },
    );
  }

  async list(query: ListAuditEventsQuery) {
    const where: WhereOptions<AuditEvent> = query.action ? { action: query.action } : {};
    const { rows, count } = await this.events.findAndCountAll({
      where,
      include: [{ model: User, attributes: ['id', 'name', 'email'] }],
      order: [['createdAt', 'DESC'], ['id', 'DESC']],
      ...pageWindow(query),
    });
    return toPage(rows.map(toAuditEventView), count, query as PageQuery);
  }
}
