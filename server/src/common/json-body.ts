import type { IncomingMessage, ServerResponse } from 'node:http';

/**
 * How deep a JSON body may nest. A panel document nests about two levels per node and its own
 * check stops at 32 nodes, so 100 leaves it room; deeper input would only exhaust the stack of the
 * code that copies and validates it.
 */
export const MAX_JSON_DEPTH = 100;

const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const OPEN_BRACKET = 0x5b;
const OPEN_BRACE = 0x7b;
const CLOSE_BRACKET = 0x5d;
const CLOSE_BRACE = 0x7d;

/** The deepest nesting of arrays and objects in JSON text, brackets inside strings aside; counting stops above `stopAbove`. */
export function jsonDepth(text: string, stopAbove = Infinity): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < text.length; i += 1) {
    const code = text.charCodeAt(i);
    if (inString) {
      if (code === BACKSLASH) i += 1;
      else if (code === QUOTE) inString = false;
    } else if (code === QUOTE) {
      inString = true;
    } else if (code === OPEN_BRACKET || code === OPEN_BRACE) {
      depth += 1;
      if (depth > deepest) deepest = depth;
      if (deepest > stopAbove) break;
    } else if (code === CLOSE_BRACKET || code === CLOSE_BRACE) {
      depth -= 1;
    }
  }
  return deepest;
}

const refusal = (message: string, status: number, type: string) => Object.assign(new Error(message), { status, type });

/** The JSON body parser's options: a body nested deeper than MAX_JSON_DEPTH is refused before it is parsed. */
export const jsonBodyOptions = {
  verify(_req: IncomingMessage, _res: ServerResponse, buffer: Buffer, encoding: string): void {
    let text: string;
    try {
      // The parser takes any utf-* charset; the count must see characters, not the bytes of UTF-16.
      text = new TextDecoder(encoding || 'utf-8').decode(buffer);
    } catch {
      throw refusal(`unsupported charset "${encoding}"`, 415, 'charset.unsupported');
    }
    if (jsonDepth(text, MAX_JSON_DEPTH) > MAX_JSON_DEPTH) throw refusal(`JSON nested more than ${MAX_JSON_DEPTH} levels deep`, 400, 'entity.too.deep');
  },
};
