import { ConflictException } from '@nestjs/common';
import type { KioskCan, Role } from '@mantlepiece/shared';
import { holdsAny, type Person } from '../auth/policy.js';

/** Who looks after the fleet: pairs kiosks at stations, follows them and revokes them. */
export const FLEET_KEEPERS: readonly Role[] = ['technician', 'admin'];

/** The kiosk policy: a kiosk is revoked once; its device token is gone with that. */
export const kioskCan = (person: Person, kiosk: { revokedAt: Date | null }): KioskCan => ({
  revoke: holdsAny(person, FLEET_KEEPERS) && kiosk.revokedAt === null,
});

/** The revoke service's refusal of a kiosk revoked already (409), the case `can.revoke` leaves out. */
export function refuseIfRevoked(kiosk: { revokedAt: Date | null }): void {
  if (kiosk.revokedAt) throw new ConflictException(`This kiosk was revoked on ${kiosk.revokedAt.toISOString()}; pair the station again to put a kiosk back.`);
}
