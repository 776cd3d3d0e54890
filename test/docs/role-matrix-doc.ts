import { ROLES } from '@mantlepiece/shared';
import { ROLE_MATRIX, venueReach, type Access, type VenueReach } from '../../server/test/role-matrix.js';

const MARK = { start: '<!-- role-matrix:start -->', end: '<!-- role-matrix:end -->' };

function cell(access: Access, column: 'nobody' | (typeof ROLES)[number]): string {
  if (access === 'public') return '✓';
  if (access === 'kiosk') return column === 'nobody' ? '401' : '403';
  if (column === 'nobody') return '401';
  if (access === 'signed-in') return '✓';
  return access.includes(column) ? '✓' : '403';
}

/** What a member of one venue meets at another venue's end of the route. */
function otherVenueCell(reach: VenueReach): string {
  if (reach === 'any venue') return '—';
  if (reach === 'own venues') return 'own rows';
  if (reach === 'organisation') return 'org admin only';
  return `404 (${reach})`;
}

/** The role matrix as the markdown table DEVELOPERS.md shows (kiosk routes take a device token). */
export function roleMatrixTable(): string {
  const columns = ['nobody', ...ROLES] as const;
  const rows = Object.entries(ROLE_MATRIX).map(([route, access]) => {
    const name = access === 'kiosk' ? `\`${route}\` (device token)` : `\`${route}\``;
    return `| ${name} | ${columns.map((column) => cell(access, column)).join(' | ')} | ${otherVenueCell(venueReach(route))} |`;
  });
  return [`| route | ${columns.join(' | ')} | another venue |`, `| --- | ${columns.map(() => '---').join(' | ')} | --- |`, ...rows].join('\n');
}

/** The table between the markers in a document, or null when the markers are missing. */
export function documentedTable(markdown: string): string | null {
  const start = markdown.indexOf(MARK.start);
  const end = markdown.indexOf(MARK.end);
  if (start < 0 || end < start) return null;
  return markdown.slice(start + MARK.start.length, end).trim();
}

export function withTable(markdown: string, table: string): string {
  const start = markdown.indexOf(MARK.start);
  const end = markdown.indexOf(MARK.end);
  return `${markdown.slice(0, start + MARK.start.length)}\n${table}\n${markdown.slice(end)}`;
}
