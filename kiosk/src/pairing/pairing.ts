import type { KioskCredential, PairStartResponse } from '@mantlepiece/shared/kiosk';
import type { KioskApi } from '../app/kiosk-api';
import { wait } from '../app/wait';
import type { KioskStore } from '../storage/kiosk-store';

/**
 * How often to ask whether a technician has entered the code: soon at first (they are usually
 * standing at the screen), then less often, never more than every 10 s.
 */
export const PAIR_POLL = { firstMs: 2_000, factor: 1.5, maxMs: 10_000 } as const;
/** Waits after the server could not be reached, growing to half a minute. */
export const PAIR_RETRY = { firstMs: 5_000, factor: 2, maxMs: 30_000 } as const;

const grow = (ms: number, policy: { factor: number; maxMs: number }) => Math.min(ms * policy.factor, policy.maxMs);

export type PairingStatus = { kind: 'code'; code: PairStartResponse } | { kind: 'unreachable' };

/**
 * Pairs a kiosk that has no credential: shows a pairing code, polls until a technician enters it
 * on the station's page, takes a new code when one expires, and keeps the credential it gets.
 */
export async function pairKiosk(api: KioskApi, store: KioskStore, onStatus: (status: PairingStatus) => void, signal: AbortSignal, now: () => number = Date.now): Promise<KioskCredential> {
  let retryMs: number = PAIR_RETRY.firstMs;
  for (;;) {
    let code: PairStartResponse;
    try {
      code = await api.startPairing();
    } catch {
      onStatus({ kind: 'unreachable' });
      await wait(retryMs, signal);
      retryMs = grow(retryMs, PAIR_RETRY);
      continue;
    }
    retryMs = PAIR_RETRY.firstMs;
    onStatus({ kind: 'code', code });
    let pollMs: number = PAIR_POLL.firstMs;
    while (now() < Date.parse(code.expiresAt)) {
      await wait(pollMs, signal);
      pollMs = grow(pollMs, PAIR_POLL);
      const answer = await api.completePairing(code.pollToken).catch(() => ({ status: 'waiting' as const }));
      if (answer.status === 'expired') break;
      if (answer.status === 'paired') {
        await store.saveCredential(answer.credential);
        return answer.credential;
      }
    }
  }
}
