import { isPlainObject } from '../panel-json.js';

/** A live phrase's text per state of its widget, keyed by the state's name (`holds`, `slides`). */
export type LivePhraseWordings = Readonly<Record<string, string>>;

const STATE_PATTERN = /^[a-z][A-Za-z0-9-]{0,31}$/;
/** A phrase is a few words inside a sentence; a longer text belongs in a paragraph of its own. */
export const MAX_WORDING_LENGTH = 160;
const MAX_STATES = 8;

export function isLivePhraseWordings(value: unknown): value is LivePhraseWordings {
  if (!isPlainObject(value)) return false;
  const entries = Object.entries(value);
  return (
    entries.length >= 1 &&
    entries.length <= MAX_STATES &&
    entries.every(([state, text]) => STATE_PATTERN.test(state) && typeof text === 'string' && text.length <= MAX_WORDING_LENGTH && !/[\n\r]/.test(text))
  );
}

export function assertLivePhraseWordings(value: unknown): void {
  if (!isLivePhraseWordings(value)) {
    throw new RangeError(
      `A live phrase's wordings are {state: text} for 1 to ${MAX_STATES} states, each state a lower-case name such as "slides" and each text one line of at most ${MAX_WORDING_LENGTH} characters.`,
    );
  }
}
