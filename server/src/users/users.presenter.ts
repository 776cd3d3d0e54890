import type { UserView } from '@mantlepiece/shared';
import type { User } from './models/user.model.js';
import type { Invitation } from './models/invitation.model.js';

export function toUserView(user: User): UserView {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    roles: user.roles,
    locales: user.locales,
    memberships: (user.memberships ?? []).map(({ venueId, roles, locales }) => ({ venueId, roles, locales })),
    uiLanguage: user.uiLanguage,
    active: user.active,
    createdAt: user.createdAt.toISOString(),
    lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
  };
}

export function toInvitationView(invitation: Invitation) {
  return {
    id: invitation.id,
    email: invitation.email,
    name: invitation.name,
    roles: invitation.roles,
    locales: invitation.locales,
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

/** What the invitation page shows to the person who opened the link. */
export function toInvitationPreview(invitation: Invitation) {
  const { id: _id, ...preview } = toInvitationView(invitation);
  return preview;
}
