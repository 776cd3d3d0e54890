import { describe, expect, it } from 'vitest';
import { auditFileName, readAuditFilter } from './list-params';

describe('audit filter in the URL', () => {
  it('keeps a whole actor id, an action and ISO dates, and drops anything else', () => {
    const search = new URLSearchParams('actorId=7&action=%20story.submitted%20&from=2026-03-01&to=yesterday');
    expect(readAuditFilter(search)).toEqual({ actorId: 7, action: 'story.submitted', from: '2026-03-01', to: undefined });
    expect(readAuditFilter(new URLSearchParams('actorId=-2'))).toEqual({ actorId: undefined, action: undefined, from: undefined, to: undefined });
  });

  it('names the CSV after the dates it covers', () => {
    expect(auditFileName({}, '2026-04-02')).toBe('audit-trail-2026-04-02.csv');
    expect(auditFileName({ from: '2026-03-01' }, '2026-04-02')).toBe('audit-trail-2026-03-01_to_2026-04-02.csv');
    expect(auditFileName({ to: '2026-03-31' }, '2026-04-02')).toBe('audit-trail-start_to_2026-03-31.csv');
  });
});
