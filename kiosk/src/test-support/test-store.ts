import { openKioskDb } from '../storage/kiosk-db';
import { KioskStore } from '../storage/kiosk-store';

let opened = 0;

/** A kiosk store in a database of its own, so tests never see each other's releases. */
export async function testStore(): Promise<KioskStore> {
  opened += 1;
  return new KioskStore(await openKioskDb(`kiosk-test-${opened}-${crypto.randomUUID()}`));
}
