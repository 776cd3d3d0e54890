/**
 * Calendar days in a venue's time zone (an IANA name such as `Pacific/Auckland`), with `Intl` and
 * nothing else. A day is `YYYY-MM-DD`; its start is the first instant whose local date is that day
 * (local midnight, or the moment after a gap where a zone skips midnight), its end the next day's
 * start, so a day across a daylight-saving change lasts 23 or 25 hours.
 */

export const DEFAULT_TIME_ZONE = 'UTC';

const MINUTE_MS = 60_000;
const DAY_MS = 86_400_000;
/** Local time lies between UTC−12 and UTC+14; an hour's margin either side. */
const EARLIEST_OFFSET_MS = -13 * 3_600_000;
const LATEST_OFFSET_MS = 15 * 3_600_000;
const DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

const formatters = new Map<string, Intl.DateTimeFormat>();

/** One formatter per zone: building one is the expensive part of every call here. */
function wallClockOf(timeZone: string): Intl.DateTimeFormat {
  let formatter = formatters.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat('en-US', {
      timeZone, calendar: 'gregory', numberingSystem: 'latn', hourCycle: 'h23',
      year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit',
    });
    formatters.set(timeZone, formatter);
  }
  return formatter;
}

interface WallClock {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
}

function wallClock(instant: Date, timeZone: string): WallClock {
  const parts: Record<string, number> = {};
  for (const part of wallClockOf(timeZone).formatToParts(instant)) {
    if (part.type !== 'literal') parts[part.type] = Number(part.value);
  }
  return { year: parts.year!, month: parts.month!, day: parts.day!, hour: parts.hour!, minute: parts.minute!, second: parts.second! };
}

const pad = (value: number, width = 2) => String(Math.abs(value)).padStart(width, '0');
const dayText = ({ year, month, day }: Pick<WallClock, 'year' | 'month' | 'day'>) => `${pad(year, 4)}-${pad(month)}-${pad(day)}`;

/**
 * The zone's canonical name as `Intl` resolves it (`europe/london` → `Europe/London`), or null
 * when `Intl` knows no such zone. Offsets (`+05:00`) are not zone names and are refused.
 */
export function canonicalTimeZone(name: string): string | null {
  if (!/^[A-Za-z][A-Za-z0-9_+\-/]*$/.test(name) || name.length > 64) return null;
  try {
    return new Intl.DateTimeFormat('en-US', { timeZone: name }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
}

/** The local date in `timeZone` at `instant`, `YYYY-MM-DD`. */
export function dayIn(instant: Date, timeZone: string): string {
  return dayText(wallClock(instant, timeZone));
}

/** How far local time in `timeZone` is ahead of UTC at `instant`, in minutes (−300 for New York in winter). */
export function offsetMinutesAt(instant: Date, timeZone: string): number {
  const wall = wallClock(instant, timeZone);
  const wallAsUtc = Date.UTC(wall.year, wall.month - 1, wall.day, wall.hour, wall.minute, wall.second);
  return Math.round((wallAsUtc - Math.floor(instant.getTime() / 1000) * 1000) / MINUTE_MS);
}

/** An offset as ISO 8601 writes it: `+14:00`, `-03:30`, `+00:00`. */
export function formatOffset(minutes: number): string {
  return `${minutes < 0 ? '-' : '+'}${pad(Math.trunc(minutes / 60))}:${pad(minutes % 60)}`;
}

/** `instant` in ISO 8601 with the zone's offset at that moment: `2026-03-29T02:30:00+01:00`. */
export function isoInZone(instant: Date, timeZone: string): string {
  const wall = wallClock(instant, timeZone);
  return `${dayText(wall)}T${pad(wall.hour)}:${pad(wall.minute)}:${pad(wall.second)}${formatOffset(offsetMinutesAt(instant, timeZone))}`;
}

/** The day `days` after `day` (before it when negative), by the calendar. */
export function addDays(day: string, days: number): string {
  const [, year, month, date] = parseDay(day);
  return new Date(Date.UTC(year, month - 1, date) + days * DAY_MS).toISOString().slice(0, 10);
}

/**
 * The first instant of `day` in `timeZone`. Found by halving the window where it can lie: local
 * dates only move forward with time (a zone going back across midnight repeats the day's first
 * hour, and its first start is taken). Zones have changed offsets on whole minutes since 1972.
 */
export function dayStartIn(day: string, timeZone: string): Date {
  const [, year, month, date] = parseDay(day);
  const midnightAsUtc = Date.UTC(year, month - 1, date);
  // In minutes from the window's start: the first minute whose local date is `day` or later.
  let before = Math.floor((midnightAsUtc - LATEST_OFFSET_MS) / MINUTE_MS);
  let from = Math.floor((midnightAsUtc - EARLIEST_OFFSET_MS) / MINUTE_MS);
  while (from - before > 1) {
    const middle = Math.floor((before + from) / 2);
    if (dayIn(new Date(middle * MINUTE_MS), timeZone) >= day) from = middle;
    else before = middle;
  }
  return new Date(from * MINUTE_MS);
}

/** The first instant after `day` in `timeZone`: the end of a half-open range `[start, end)`. */
export function dayEndIn(day: string, timeZone: string): Date {
  return dayStartIn(addDays(day, 1), timeZone);
}

function parseDay(day: string): [string, number, number, number] {
  const match = DAY.exec(day);
  if (!match) throw new RangeError(`A day is written YYYY-MM-DD, not “${day}”.`);
  return [match[0], Number(match[1]), Number(match[2]), Number(match[3])];
}
