import type { KioskCredential } from '@mantlepiece/shared/kiosk';
import { EventOutbox } from '../outbox/event-outbox';
import { heartbeatBody, sendHeartbeat } from '../outbox/heartbeat';
import type { ReleaseRefusal } from '../storage/kiosk-db';
import type { KioskStore } from '../storage/kiosk-store';
import { syncRelease } from '../sync/release-sync';
import type { KioskConfig } from './config';
import type { KioskApi } from './kiosk-api';
import { wait } from './wait';

/** Runs `task` now and then every `everyMs` until stopped; a failed round waits for the next. */
async function every(everyMs: number, signal: AbortSignal, task: () => Promise<unknown>): Promise<void> {
  while (!signal.aborted) {
    await task().catch(() => undefined);
    await wait(everyMs, signal).catch(() => undefined);
  }
}

export interface RuntimeHooks {
  /** The release on screen now, for the heartbeat. */
  playing: () => number | null;
  /** A release finished downloading and checking. */
  onReleaseReady: () => void;
  /** After each sync round: the release refused for a bad file and not tried again yet, or null. */
  onRefusal: (refusal: ReleaseRefusal | null) => void;
}

/**
 * The paired kiosk's background work: release sync, heartbeats and event uploads, each on its
 * own clock, none of which stops the stories playing when the server is away.
 */
export function startKioskRuntime(api: KioskApi, store: KioskStore, outbox: EventOutbox, credential: KioskCredential, config: KioskConfig, appVersion: string, hooks: RuntimeHooks): () => Promise<void> {
  const controller = new AbortController();
  const startedAt = Date.now();
  const loops = [
    every(config.manifestPollMs, controller.signal, async () => {
      const outcome = await syncRelease(api, store, credential).finally(async () => hooks.onRefusal(await store.meta('refusal')));
      if (outcome.kind === 'ready' || outcome.kind === 'known') hooks.onReleaseReady();
    }),
    every(config.heartbeatMs, controller.signal, async () => sendHeartbeat(api, await heartbeatBody(store, hooks.playing(), appVersion, startedAt, Date.now()))),
    every(config.eventUploadMs, controller.signal, () => outbox.upload(api)),
  ];
  const uploadNow = () => void outbox.upload(api);
  window.addEventListener('online', uploadNow);
  // Resolves once no round is running, so nothing writes to storage after the caller's next step.
  return () => {
    controller.abort();
    window.removeEventListener('online', uploadNow);
    return Promise.all(loops).then(() => undefined);
  };
}
