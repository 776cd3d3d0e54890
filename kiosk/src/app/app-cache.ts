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
