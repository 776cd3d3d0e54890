import type { AuditEvent } from './models/audit-event.model.js';

export function toAuditEventView(event: AuditEvent) {
  return {
    id: Number(event.id),
    action: event.action,
    actor: event.actor ? { id: event.actor.id, name: event.actor.name, email: event.actor.email } : null,
    targetType: event.targetType,
    targetId: event.targetId,
    detail: event.detail,
    clientAddress: event.clientAddress,
    createdAt: event.createdAt.toISOString(),
  };
}
