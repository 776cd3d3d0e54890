import type { Can, ReleaseCan, ReleaseState, Role } from '@mantlepiece/shared';
import { holdsAny, type Person } from '../auth/policy.js';

/** Who builds a gallery's releases and makes one Live. */
export const PUBLISHERS: readonly Role[] = ['technician', 'admin'];

/** A Ready release goes Live; a Superseded one goes Live again, which is the rollback. */
export const isPublishable = (state: ReleaseState): boolean => state === 'ready' || state === 'superseded';

/** The release policy, the rule the publish service applies. */
export const releaseCan = (person: Person, release: { state: ReleaseState }): ReleaseCan => ({
  publish: holdsAny(person, PUBLISHERS) && isPublishable(release.state),
});

export const releasesCan = (person: Person): Can<'releases'> => ({ build: holdsAny(person, PUBLISHERS) });
