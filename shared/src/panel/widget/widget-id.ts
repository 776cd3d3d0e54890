const ID_PATTERN = /^[A-Za-z0-9_-]{1,64}$/;

export const isPanelId = (value: unknown): value is string => typeof value === 'string' && ID_PATTERN.test(value);

export function assertPanelId(value: unknown): void {
  if (!isPanelId(value)) throw new RangeError('An id must be 1 to 64 letters, digits, "-" or "_".');
}

const ALPHABET = '0123456789abcdefghijklmnopqrstuvwxyz';

/**
 * Short ids unique within one panel. getRandomValues rather than randomUUID because the studio may
 * be served over plain http on a venue network, where randomUUID does not exist.
 */
export function newPanelId(prefix: string): string {
  const bytes = crypto.getRandomValues(new Uint8Array(10));
  return `${prefix}-${Array.from(bytes, (byte) => ALPHABET[byte % ALPHABET.length]).join('')}`;
}

export const newWidgetId = (): string => newPanelId('w');
