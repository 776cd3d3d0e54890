import { useCallback, useEffect, useRef, useState } from 'react';
import type { KioskCredential } from '@mantlepiece/shared';
import { EventOutbox, type VisitorEvent } from '../outbox/event-outbox';
import { pairKiosk, type PairingStatus } from '../pairing/pairing';
import { PairingScreen } from '../pairing/PairingScreen';
import { Player, type PlayerScreen } from '../player/Player';
import { WaitingScreen } from '../screens/WaitingScreen';
import type { KioskStore } from '../storage/kiosk-store';
import { bootRelease, type PlayableRelease } from '../sync/playable-release';
import type { KioskConfig } from './config';
import type { KioskApi, KioskVenue } from './kiosk-api';
import { startKioskRuntime } from './kiosk-runtime';

type Phase =
  | { kind: 'starting' }
  | { kind: 'pairing'; status: PairingStatus | null }
  | { kind: 'waiting' }
  | { kind: 'playing'; release: PlayableRelease };

export interface KioskAppProps {
  api: KioskApi;
  store: KioskStore;
  config: KioskConfig;
  appVersion: string;
}

/**
 * The whole kiosk: pairs when it has no credential, boots into the last good release from storage
 * (the server need not answer), and switches to a newly synced release only on the attract loop.
 */
export function KioskApp({ api, store, config, appVersion }: KioskAppProps) {
  const [phase, setPhase] = useState<Phase>({ kind: 'starting' });
  const [venue, setVenue] = useState<KioskVenue>({ name: '', locales: ['en'] });
  const [releaseWaiting, setReleaseWaiting] = useState(0);
  const [onAttract, setOnAttract] = useState(true);
  const credential = useRef<KioskCredential | null>(null);
  const playing = useRef<PlayableRelease | null>(null);
  const [outbox] = useState(() => new EventOutbox(store.db));

  useEffect(() => {
    const controller = new AbortController();
    let stopRuntime: (() => void) | undefined;
    const boot = async () => {
      let paired = await store.credential();
      if (!paired) {
        setPhase({ kind: 'pairing', status: null });
        api.venue().then(setVenue, () => undefined);
        paired = await pairKiosk(api, store, (status) => setPhase({ kind: 'pairing', status }), controller.signal);
      }
      credential.current = paired;
      api.useDeviceToken(paired.deviceToken);
      const release = await bootRelease(store, paired.publicKey);
      if (controller.signal.aborted) return release?.dispose();
      playing.current = release;
      setPhase(release ? { kind: 'playing', release } : { kind: 'waiting' });
      stopRuntime = startKioskRuntime(api, store, outbox, paired, config, appVersion, {
        playing: () => playing.current?.releaseId ?? null,
        onReleaseReady: () => setReleaseWaiting((count) => count + 1),
      });
    };
    boot().catch(() => undefined);
    return () => {
      controller.abort();
      stopRuntime?.();
      playing.current?.dispose();
      playing.current = null;
    };
  }, [api, store, config, appVersion, outbox]);

  // The switch to a new release: only while the attract loop shows, when no visitor is mid-story.
  useEffect(() => {
    if (!releaseWaiting || !onAttract || !credential.current) return;
    let cancelled = false;
    void bootRelease(store, credential.current.publicKey).then((next) => {
      if (cancelled || !next || next.releaseId === playing.current?.releaseId) return next?.dispose();
      playing.current?.dispose();
      playing.current = next;
      setPhase({ kind: 'playing', release: next });
    });
    return () => {
      cancelled = true;
    };
  }, [releaseWaiting, onAttract, store]);

  const record = useCallback((event: VisitorEvent) => void outbox.record(event).catch(() => undefined), [outbox]);
  const onScreen = useCallback((screen: PlayerScreen['kind']) => setOnAttract(screen === 'attract'), []);

  switch (phase.kind) {
    case 'starting':
      return <div className="blank" aria-busy="true" />;
    case 'pairing':
      return <PairingScreen status={phase.status} venue={venue} />;
    case 'waiting':
      return <WaitingScreen venueLocales={venue.locales} />;
    case 'playing':
      return <Player key={phase.release.releaseId} release={phase.release} config={config} record={record} onScreen={onScreen} />;
  }
}
