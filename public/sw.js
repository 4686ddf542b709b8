// Tankside's service worker: keeps walk-through pages and the app's scripts on the phone so
// that a reload with no signal still opens the walk-through. Everything else goes to the network.
const CACHE = "tankside-walk-v1";

self.addEventListener("install", () => self.skipWaiting());
self.addEventListener("activate", (event) => event.waitUntil(self.clients.claim()));

// The page names what to keep once the worker is ready (it was loaded before the worker ran),
// and hears back on its port when all of it is kept.
self.addEventListener("message", (event) => {
  if (event.data?.type !== "keep") return;
  const port = event.ports[0];
  event.waitUntil(
    caches
      .open(CACHE)
      .then((cache) =>
        Promise.all(
          event.data.urls.map((url) =>
            fetch(url, { credentials: "same-origin" }).then((res) => {
              if (!res.ok) throw new Error(`${url}: ${res.status}`);
              return cache.put(url, res);
            }),
          ),
        ),
      )
      .then(() => port?.postMessage({ kept: true }))
      .catch(() => port?.postMessage({ kept: false })),
  );
});

const isWalk = (url) => /^\/cases\/[^/]+\/walk(\.data)?$/.test(url.pathname);

self.addEventListener("fetch", (event) => {
  const request = event.request;
  if (request.method !== "GET") return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin) return;
  if (url.pathname.startsWith("/assets/")) {
    // Built assets have content hashes in their names: the cached copy is always right.
    event.respondWith(
      caches.match(request).then(
        (hit) =>
          hit ||
          fetch(request).then((res) => {
            if (res.ok) caches.open(CACHE).then((c) => c.put(request, res.clone()));
            return res;
          }),
      ),
    );
  } else if (isWalk(url)) {
    // Network first, so a fresh page wins when there is signal; the kept copy when there is not.
    event.respondWith(
      fetch(request)
        .then((res) => {
          if (res.ok) caches.open(CACHE).then((c) => c.put(request, res.clone()));
          return res;
        })
        .catch(() => caches.match(request).then((hit) => hit || Response.error())),
    );
  }
});
