import type { Role } from '@mantlepiece/shared';

/** Curators write stories and media (admins may step in); every other staff role only reads. */
export const canWriteStories = (roles: readonly Role[]) => roles.includes('curator') || roles.includes('admin');
