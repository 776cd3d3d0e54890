import { describe, expect, it } from 'vitest';
import { jsonBodyOptions, jsonDepth, MAX_JSON_DEPTH } from './json-body.js';

const verify = (text: string, encoding = 'utf-8') =>
  jsonBodyOptions.verify({} as never, {} as never, Buffer.from(text, encoding === 'utf-16le' ? 'utf16le' : 'utf8'), encoding);

describe('jsonDepth', () => {
  it('counts arrays and objects, and nothing inside strings', () => {
    expect(jsonDepth('1')).toBe(0);
    expect(jsonDepth('{"a":[1,{"b":[]}]}')).toBe(4);
    expect(jsonDepth('{"a":"[[[{{{","b":"\\"[[["}')).toBe(1);
  });

  it('stops counting once past the bound', () => {
    expect(jsonDepth('['.repeat(10_000), 5)).toBe(6);
  });
});

describe('the JSON body check', () => {
  it(`takes ${MAX_JSON_DEPTH} levels and refuses one more with a 400 the error filter names`, () => {
    expect(() => verify('['.repeat(MAX_JSON_DEPTH) + ']'.repeat(MAX_JSON_DEPTH))).not.toThrow();
    expect(() => verify('['.repeat(MAX_JSON_DEPTH + 1) + ']'.repeat(MAX_JSON_DEPTH + 1))).toThrow(expect.objectContaining({ status: 400, type: 'entity.too.deep' }));
  });

  it('counts the characters of a UTF-16 body, not its bytes', () => {
    // U+225B's UTF-16 bytes are 5B 22: an opening bracket and a quote, were they read as bytes.
    expect(() => verify(`{"a":"${'\u225b'.repeat(200)}"}`, 'utf-16le')).not.toThrow();
    expect(() => verify('['.repeat(MAX_JSON_DEPTH + 1), 'utf-16le')).toThrow(expect.objectContaining({ type: 'entity.too.deep' }));
  });

  it('refuses a character set it cannot read with 415', () => {
    expect(() => verify('{}', 'utf-32')).toThrow(expect.objectContaining({ status: 415, type: 'charset.unsupported' }));
  });
});
