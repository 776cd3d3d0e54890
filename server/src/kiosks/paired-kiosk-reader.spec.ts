import { describe, expect, it } from 'vitest';
import { hashToken } from '../common/tokens.js';
import type { ConfigService } from '../config/config.service.js';
import type { Kiosk } from './models/kiosk.model.js';
import { PairedKioskReader } from './paired-kiosk-reader.js';

const PAIRED = 'mpk_paired';

/** A stand-in for the database: the paired kiosk of PAIRED, and how many reads were made. */
function readerWith(pairedKioskRecheckMs: number) {
  const reads: string[][] = [];
  const row = { id: 7, stationId: 3, galleryId: 2, publicationId: null, publicationExpiresAt: null, deviceTokenHash: hashToken(PAIRED) };
  const kiosks = {
    sequelize: {
      query: (_sql: string, { replacements }: { replacements: [string[]] }) => {
        reads.push(replacements[0]);
        return Promise.resolve(replacements[0].includes(row.deviceTokenHash) ? [row] : []);
      },
    },
  } as unknown as typeof Kiosk;
  return { reader: new PairedKioskReader(kiosks, { pairedKioskRecheckMs } as ConfigService), reads };
}

describe('PairedKioskReader', () => {
  it('reads the database for every request by default, so a revocation counts at the next one', async () => {
    const { reader, reads } = readerWith(0);
    expect((await reader.read(PAIRED))?.id).toBe(7);
    expect((await reader.read(PAIRED))?.id).toBe(7);
    expect(reads).toHaveLength(2);
  });

  it('with PAIRED_KIOSK_RECHECK_MS, answers a paired kiosk from its read for that long, and reads an unknown token every time', async () => {
    const { reader, reads } = readerWith(60 * 60_000);
    expect((await reader.read(PAIRED))?.id).toBe(7);
    expect((await reader.read(PAIRED))?.id).toBe(7);
    expect(reads).toHaveLength(1);
    expect(await reader.read('mpk_unknown')).toBeUndefined();
    expect(await reader.read('mpk_unknown')).toBeUndefined();
    expect(reads).toHaveLength(3);
  });
});
