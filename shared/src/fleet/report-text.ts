/**
 * What a kiosk may write in a heartbeat's free text (issue 11). The Fleet page and the silent-kiosk
 * mail show it to technicians, so it is held to what reads as text: letters, marks, digits,
 * punctuation, symbols and plain spaces. No control characters (line breaks, escapes), no format
 * characters (bidirectional overrides, zero-width joiners), no private-use or unassigned code
 * points, no lone surrogates.
 */
export const REPORT_TEXT_PATTERN = /^[\p{L}\p{M}\p{N}\p{P}\p{S} ]*$/u;
const NOT_REPORT_TEXT = /[^\p{L}\p{M}\p{N}\p{P}\p{S} ]+/gu;

/** Longest last error a heartbeat carries, in UTF-16 code units (the column holds as many characters). */
export const REPORT_TEXT_MAX = 1000;

/** A build's version: letters, digits and `.+-`, as semantic versions write it. */
export const APP_VERSION_PATTERN = /^[0-9A-Za-z][0-9A-Za-z.+-]{0,39}$/;

export const isReportText = (text: string): boolean => text.length <= REPORT_TEXT_MAX && REPORT_TEXT_PATTERN.test(text);

/**
 * The kiosk's own text made fit to send: anything outside the set becomes a space, and a text too
 * long is cut at the limit, never inside a surrogate pair.
 */
export function toReportText(text: string): string {
  const clean = text.replace(NOT_REPORT_TEXT, ' ').replace(/ {2,}/g, ' ').trim();
  if (clean.length <= REPORT_TEXT_MAX) return clean;
  const cut = clean.slice(0, REPORT_TEXT_MAX);
  return /[\uD800-\uDBFF]$/.test(cut) ? cut.slice(0, -1) : cut;
}
