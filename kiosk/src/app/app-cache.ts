/** How often a kiosk that is never reloaded asks whether a newer app was deployed. */
const UPDATE_CHECK_MS = 60 * 60 * 1000;

/** Registers the service worker that keeps the kiosk app itself on the device (see build/service-worker.js). */
export function registerAppCache(): void {
  if (!('serviceWorker' in navigator)) return;
  navigator.serviceWorker.register(`${import.meta.env.BASE_URL}sw.js`, { scope: import.meta.env.BASE_URL }).then(
    (registration) => setInterval(() => void registration.update().catch(() => undefined), UPDATE_CHECK_MS),
    () => undefined,
  );
}

/** Longest wait for the service worker to empty its caches; the kiosk pairs anew either way. */
const FORGET_TIMEOUT_MS = 30_000;

/**
 * Empties Cache Storage after an unpairing. The service worker does it when it controls the page,
 * since it alone knows which files to fetch back for the next offline boot.
 */
export async function forgetCachedContent(): Promise<void> {
  if (typeof caches === 'undefined') return;
  const worker = navigator.serviceWorker?.controller;
  if (!worker) {
    await Promise.all((await caches.keys()).map((name) => caches.delete(name)));
    return;
  }
  await new Promise<void>((resolve) => {
    const channel = new MessageChannel();
    const timer = setTimeout(resolve, FORGET_TIMEOUT_MS);
    channel.port1.onmessage = () => {
      clearTimeout(timer);
      resolve();
    };
    worker.postMessage({ type: 'forget-stored-content' }, [channel.port2]);
  });
}
