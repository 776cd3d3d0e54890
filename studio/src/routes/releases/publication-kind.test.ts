import { describe, expect, it } from 'vitest';
import type { ReleaseView } from '@mantlepiece/shared';
import { publicationKind } from './publication-kind';

const release = (number: number, state: ReleaseView['state']) => ({ id: number, number, state }) as ReleaseView;

describe('what making a release Live does', () => {
  it('publishes a Ready release', () => expect(publicationKind(release(3, 'ready'), release(2, 'live'))).toBe('publish'));
  it('rolls back to a Superseded release older than the Live one', () => expect(publicationKind(release(1, 'superseded'), release(2, 'live'))).toBe('rollBack'));
  it('moves forward to a Superseded release newer than the Live one, after an earlier rollback', () => expect(publicationKind(release(3, 'superseded'), release(2, 'live'))).toBe('goForward'));
  it('offers nothing for a release that is building, failed or already Live', () => {
    for (const state of ['building', 'failed', 'live'] as const) expect(publicationKind(release(4, state), release(2, 'live'))).toBeNull();
  });
});
