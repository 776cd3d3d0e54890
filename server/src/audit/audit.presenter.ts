import { isoInZone, type AuditEventView } from '@mantlepiece/shared';
import type { AuditEvent } from './models/audit-event.model.js';

export function toAuditEventView(event: AuditEvent): AuditEventView {
  return {
    id: Number(event.id),
    at: event.createdAt.toISOString(),
    actor: event.actor ? { id: event.actor.id, name: event.actor.name } : null,
    action: event.action,
    target: event.targetType ? { type: event.targetType, id: event.targetId ?? '' } : null,
    venueId: event.venueId,
    details: event.detail,
  };
}

/**
 * `at` is ISO 8601 in UTC for every event; an event of one venue also has `at_venue_time`, the same
 * instant in ISO 8601 with the offset of that venue's `venue_time_zone` then. An organisation-wide
 * event has neither.
 */
const CSV_COLUMNS = ['id', 'at', 'actor_id', 'actor_name', 'action', 'target_type', 'target_id', 'venue_id', 'details', 'venue_time_zone', 'at_venue_time'] as const;

/**
 * A spreadsheet would run a cell that starts like a formula, so such text gets a leading
 * apostrophe (OWASP's advice on CSV injection); numbers and dates never start that way.
 */
const defused = (text: string) => (/^[=+\-@\t\r]/.test(text) ? `'${text}` : text);

/** RFC 4180: every field quoted, quotes doubled, CRLF between records. */
const field = (value: string | number | null) => `"${defused(value === null ? '' : String(value)).replace(/"/g, '""')}"`;

/** Events read with their venue's time zone (`venue`). */
export function toAuditCsv(events: readonly AuditEvent[]): string {
  const records = events.map((row) => {
    const event = toAuditEventView(row);
    const timeZone = row.venue?.timeZone ?? null;
    return [
      event.id, event.at, event.actor?.id ?? null, event.actor?.name ?? null, event.action,
      event.target?.type ?? null, event.target?.id ?? null, event.venueId, event.details ? JSON.stringify(event.details) : null,
      timeZone, timeZone && isoInZone(row.createdAt, timeZone),
    ];
  });
  return [CSV_COLUMNS, ...records].map((record) => record.map(field).join(',')).join('\r\n') + '\r\n';
}
