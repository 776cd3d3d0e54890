import type { Can, MediaCan, Role } from '@mantlepiece/shared';
import { holdsAny, type Person } from '../auth/policy.js';

/** Who keeps the media library: uploads images and changes or deletes them. */
export const MEDIA_KEEPERS: readonly Role[] = ['curator'];

/** The media policy: an image any panel shows cannot be deleted (the service refuses it with 409, naming where). */
export function mediaCan(person: Person, asset: { usedIn: readonly unknown[] }): MediaCan {
  const keeper = holdsAny(person, MEDIA_KEEPERS);
  return { edit: keeper, delete: keeper && asset.usedIn.length === 0 };
}

export const mediaLibraryCan = (person: Person): Can<'mediaLibrary'> => ({ upload: holdsAny(person, MEDIA_KEEPERS) });
