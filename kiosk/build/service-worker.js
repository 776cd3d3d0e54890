/* The kiosk app's service worker: keeps every built file on the device so a reload works with
   the network cut. Release content is not here (it lives in IndexedDB); /api is never cached.
   The build fills in PRECACHE and VERSION (see service-worker-plugin.ts). */
const PRECACHE = self.__KIOSK_PRECACHE__;
const VERSION = self.__KIOSK_VERSION__;
const CACHE = `mantlepiece-kiosk-app-${VERSION}`;
const SCOPE = new URL(self.registration.scope);
const INDEX = new URL('index.html', SCOPE).href;

self.addEventListener('install', (event) => {
  event.waitUntil(caches.open(CACHE).then((cache) => cache.addAll(PRECACHE)).then(() => self.skipWaiting()));
});

self.addEventListener('activate', (event) => {
  event.waitUntil(
    caches.keys()
      .then((names) => Promise.all(names.filter((name) => name.startsWith('mantlepiece-kiosk-app-') && name !== CACHE).map((name) => caches.delete(name))))
      .then(() => self.clients.claim()),
  );
});

// An unpaired kiosk keeps nothing from its pairing: every cache goes, and the app's own files are
// fetched again into a fresh one, so the next restart still boots without the network.
self.addEventListener('message', (event) => {
  if (event.data?.type !== 'forget-stored-content') return;
  const [reply] = event.ports;
  event.waitUntil(
    caches.keys()
      .then((names) => Promise.all(names.map((name) => caches.delete(name))))
      .then(() => caches.open(CACHE))
      .then((cache) => cache.addAll(PRECACHE))
      .then(() => reply?.postMessage({ ok: true }), () => reply?.postMessage({ ok: false })),
  );
});

self.addEventListener('fetch', (event) => {
  const request = event.request;
  const url = new URL(request.url);
  if (request.method !== 'GET' || url.origin !== SCOPE.origin || !url.pathname.startsWith(SCOPE.pathname)) return;
  // Every page URL of the kiosk is its one page; the built files are named by content, so cache first.
  const key = request.mode === 'navigate' ? INDEX : request;
  event.respondWith(
    caches.open(CACHE).then((cache) => cache.match(key, { ignoreSearch: request.mode === 'navigate' }).then((hit) => hit ?? fetch(request))),
  );
});
