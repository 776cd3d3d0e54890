import { describe, expect, it } from 'vitest';
import { APP_VERSION_PATTERN, isReportText, REPORT_TEXT_MAX, toReportText } from './report-text.js';

describe('heartbeat report text', () => {
  it('takes the kiosk’s own messages in any script, with punctuation and symbols', () => {
    expect(isReportText('Release 2 refused: File 0a1b came as 700000 bytes hashing to ff, not the 700000 bytes the manifest names.')).toBe(true);
    expect(isReportText('La publication 4 est plus ancienne que la 5 — refusée « rejouée ».')).toBe(true);
    expect(isReportText('الإصدار ٢ مرفوض')).toBe(true);
    expect(isReportText('')).toBe(true);
  });

  it('refuses line breaks, escapes, bidirectional overrides, zero-width characters and lone surrogates', () => {
    for (const bad of ['two\nlines', 'tab\there', '\u001b[31mred', 'abc\u202Efed', 'zero\u200Bwidth', 'half \uD83D pair', '\uE000 private']) {
      expect(isReportText(bad), JSON.stringify(bad)).toBe(false);
    }
  });

  it(`refuses more than ${REPORT_TEXT_MAX} code units`, () => {
    expect(isReportText('a'.repeat(REPORT_TEXT_MAX))).toBe(true);
    expect(isReportText('a'.repeat(REPORT_TEXT_MAX + 1))).toBe(false);
  });

  it('makes any text fit to send: outside characters become one space, and a long text is cut outside a surrogate pair', () => {
    expect(toReportText('Release 2 refused:\n  a file\u202E did not match.\u0000')).toBe('Release 2 refused: a file did not match.');
    const cut = toReportText(`${'a'.repeat(REPORT_TEXT_MAX - 1)}😀tail`);
    expect(cut).toBe('a'.repeat(REPORT_TEXT_MAX - 1));
    expect(isReportText(cut)).toBe(true);
  });

  it('takes semantic versions as app versions and nothing with spaces or markup', () => {
    expect(APP_VERSION_PATTERN.test('0.1.0')).toBe(true);
    expect(APP_VERSION_PATTERN.test('1.4.0-rc.1+build.7')).toBe(true);
    expect(APP_VERSION_PATTERN.test('0.1.0 <script>')).toBe(false);
    expect(APP_VERSION_PATTERN.test('')).toBe(false);
  });
});
