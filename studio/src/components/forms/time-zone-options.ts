import { canonicalTimeZone, DEFAULT_TIME_ZONE, formatOffset, offsetMinutesAt } from '@mantlepiece/shared';

export interface TimeZoneOption {
  /** IANA name: what the field's value holds. */
  zone: string;
  /** Its offset from UTC now, "UTC+13:00": a zone keeps its name but not its offset through the year. */
  offset: string;
}

/** Every zone the browser's Intl knows, and UTC, which some browsers leave off that list. */
function knownZones(): string[] {
  const zones = new Set(Intl.supportedValuesOf('timeZone'));
  zones.add(DEFAULT_TIME_ZONE);
  return [...zones];
}

/** The options of a time-zone field, by name, with each one's offset at `now`; the current value too if this browser does not list it. */
export function timeZoneOptions(now: Date, current = '', zones: readonly string[] = knownZones()): TimeZoneOption[] {
  const all = new Set(zones);
  const canonical = current ? canonicalTimeZone(current) : null;
  if (canonical) all.add(canonical);
  return [...all].sort().map((zone) => ({ zone, offset: `UTC${formatOffset(offsetMinutesAt(now, zone))}` }));
}

const folded = (text: string) => text.replace(/_/g, ' ').toLowerCase();

/** The options a search finds: by part of the name ("new york", "auckland") or of the offset ("+05:30"). */
export function searchTimeZones(options: readonly TimeZoneOption[], query: string): TimeZoneOption[] {
  const wanted = folded(query.trim());
  if (wanted === '') return [...options];
  return options.filter((option) => folded(option.zone).includes(wanted) || option.offset.toLowerCase().includes(wanted));
}
