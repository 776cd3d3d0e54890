import { lazy, Suspense, useCallback, useEffect, useRef, useState } from 'react';
import type { KioskCredential } from '@mantlepiece/shared/kiosk';
import { EventOutbox, type VisitorEvent } from '../outbox/event-outbox';
import { pairKiosk, type PairingStatus } from '../pairing/pairing';
import { PairingScreen } from '../pairing/PairingScreen';
import type { PlayerScreen } from '../player/Player';
import { WaitingScreen } from '../screens/WaitingScreen';
import type { ReleaseRefusal } from '../storage/kiosk-db';
import type { KioskStore } from '../storage/kiosk-store';
import { bootRelease, type PlayableRelease } from '../sync/playable-release';
import { forgetCachedContent } from './app-cache';
import type { KioskConfig } from './config';
import type { KioskApi, KioskVenue } from './kiosk-api';
import { startKioskRuntime } from './kiosk-runtime';

type Phase =
  | { kind: 'starting' }
  | { kind: 'pairing'; status: PairingStatus | null; unpairedAt: string | null }
  | { kind: 'waiting' }
  | { kind: 'playing'; release: PlayableRelease };

export interface KioskAppProps {
  api: KioskApi;
  store: KioskStore;
  config: KioskConfig;
  appVersion: string;
}

/**
 * The player (stories, panels, widget drawings) is a chunk of its own: a kiosk that pairs or waits
 * never loads it, and the first chunk stays small (see the kiosk bench). The service worker keeps
 * it on the device with everything else, so it loads offline too.
 */
const Player = lazy(() => import('../player/Player').then((module) => ({ default: module.Player })));

/**
 * The whole kiosk: pairs when it has no credential, boots into the last good release from storage
 * (the server need not answer), and switches to a newly synced release only on the attract loop.
 * Once the server refuses its device token (a technician revoked it), it lets the visitor on
 * screen finish, forgets its pairing and everything it stored, and shows a new pairing code.
 */
export function KioskApp({ api, store, config, appVersion }: KioskAppProps) {
  const [phase, setPhase] = useState<Phase>({ kind: 'starting' });
  const [venue, setVenue] = useState<KioskVenue>({ name: '', locales: ['en'] });
  const [releaseWaiting, setReleaseWaiting] = useState(0);
  const [onAttract, setOnAttract] = useState(true);
  const [refusal, setRefusal] = useState<ReleaseRefusal | null>(null);
  /** The server refused the device token; carried out once no visitor is mid-story. */
  const [revoked, setRevoked] = useState(false);
  /** Counts pairings: an unpairing starts the boot again, now without a credential. */
  const [pairing, setPairing] = useState(0);
  const credential = useRef<KioskCredential | null>(null);
  const playing = useRef<PlayableRelease | null>(null);
  const stopRuntime = useRef<(() => Promise<void>) | null>(null);
  const unpairing = useRef(false);
  const [outbox] = useState(() => new EventOutbox(store.db));

  useEffect(() => {
    const controller = new AbortController();
    // Unknown (several venues, none named) or unreachable: the neutral screens stay.
    const showVenue = (answer: Promise<KioskVenue | null>) => {
      answer.then((found) => found && setVenue(found), () => undefined);
    };
    const boot = async () => {
      let paired = await store.credential();
      if (!paired) {
        const unpairedAt = await store.meta('unpairedAt');
        setPhase({ kind: 'pairing', status: null, unpairedAt });
        showVenue(api.venue(config.venueSlug));
        paired = await pairKiosk(api, store, (status) => setPhase({ kind: 'pairing', status, unpairedAt }), controller.signal);
      }
      credential.current = paired;
      api.useDeviceToken(paired.deviceToken);
      api.whenUnpaired(() => setRevoked(true));
      // Paired, the kiosk belongs to its station's venue, whatever the install URL named.
      showVenue(api.venue());
      const release = await bootRelease(store, paired.publicKey);
      if (controller.signal.aborted) return release?.dispose();
      playing.current = release;
      setPhase(release ? { kind: 'playing', release } : { kind: 'waiting' });
      setRefusal(await store.meta('refusal'));
      stopRuntime.current = startKioskRuntime(api, store, outbox, paired, config, appVersion, {
        playing: () => playing.current?.releaseId ?? null,
        onReleaseReady: () => setReleaseWaiting((count) => count + 1),
        onRefusal: setRefusal,
      });
    };
    boot().catch(() => undefined);
    return () => {
      controller.abort();
      void stopRuntime.current?.();
      stopRuntime.current = null;
      api.whenUnpaired(null);
      playing.current?.dispose();
      playing.current = null;
    };
  }, [api, store, config, appVersion, outbox, pairing]);

  // No more calls the server will refuse, and no events piling up, while the visitor finishes.
  useEffect(() => {
    if (revoked) void stopRuntime.current?.();
  }, [revoked]);

  useEffect(() => {
    if (!revoked || !onAttract || unpairing.current) return;
    unpairing.current = true;
    const unpair = async () => {
      // Every round still running ends first, so none writes to storage after it is emptied.
      await stopRuntime.current?.();
      api.useDeviceToken(null);
      credential.current = null;
      await store.forgetPairing(new Date());
      await forgetCachedContent();
      setRevoked(false);
      setRefusal(null);
      setPairing((count) => count + 1);
    };
    unpair().catch(() => undefined).finally(() => {
      unpairing.current = false;
    });
  }, [revoked, onAttract, api, store]);

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
      return <PairingScreen status={phase.status} venue={venue} unpairedAt={phase.unpairedAt} />;
    case 'waiting':
      return <WaitingScreen venueLocales={venue.locales} refusal={refusal} />;
    case 'playing':
      return (
        <Suspense fallback={<div className="blank" aria-busy="true" />}>
          <Player key={phase.release.releaseId} release={phase.release} config={config} record={record} onScreen={onScreen} />
        </Suspense>
      );
  }
}
