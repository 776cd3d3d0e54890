import type { UserView } from '@mantlepiece/shared';
import { inScope, type VenueScope } from '../auth/policy.js';
import type { User } from './models/user.model.js';
import type { Invitation } from './models/invitation.model.js';

/** A person as the reader sees them; a venue admin (`scope`) sees their own venues' memberships only. */
export function toUserView(user: User, scope: VenueScope = { every: true }): UserView {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    roles: user.roles,
    locales: user.locales,
    memberships: (user.memberships ?? [])
      .filter((grant) => inScope(scope, grant.venueId))
      .map(({ venueId, roles, locales }) => ({ venueId, roles, locales }))
      .sort((a, b) => a.venueId - b.venueId),
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
    venueId: invitation.venueId,
    roles: invitation.roles,
    locales: invitation.locales,
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

/** What the invitation page shows to the person who opened the link. */
export function toInvitationPreview(invitation: Invitation) {
  const { id: _id, venueId: _venueId, ...preview } = toInvitationView(invitation);
  return preview;
}
