/** Links on a panel may only leave for the web or open a mail client: never script, data or files. */
export const PANEL_LINK_PROTOCOLS = ['http:', 'https:', 'mailto:'] as const;

const MAX_HREF_LENGTH = 2048;

/**
 * Parsed with the WHATWG URL parser, the one browsers use, so tricks such as tabs inside
 * "java\tscript:" or leading spaces are read exactly as a browser would read them.
 */
export function isPanelHref(href: unknown): href is string {
  if (typeof href !== 'string' || href.length === 0 || href.length > MAX_HREF_LENGTH) return false;
  if (!URL.canParse(href)) return false;
  return (PANEL_LINK_PROTOCOLS as readonly string[]).includes(new URL(href).protocol);
}

export const panelHrefMessage = 'A link must start with http://, https:// or mailto:.';

export function assertPanelHref(href: unknown): void {
  if (!isPanelHref(href)) throw new RangeError(panelHrefMessage);
}
