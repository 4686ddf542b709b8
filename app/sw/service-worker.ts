/**
 * Tankside's service worker, built on Workbox. It keeps the app's built files (precached at
 * install, named by content hash) and the pages a crew member may open with no signal (fetched
 * fresh when there is signal, the kept copy when there is not). Nothing else is cached.
 */
import { cleanupOutdatedCaches, precacheAndRoute } from "workbox-precaching";
import { registerRoute } from "workbox-routing";
import { NetworkFirst } from "workbox-strategies";
import precacheManifest from "virtual:precache-manifest";
import { isWalkPage, KEPT_PAGE, ON_PHONE_CASE, PAGES_CACHE } from "../lib/walk/pages";

declare const self: ServiceWorkerGlobalScope;

precacheAndRoute(precacheManifest);
cleanupOutdatedCaches();

self.addEventListener("install", () => void self.skipWaiting());
self.addEventListener("activate", (event) =>
  event.waitUntil(
    (async () => {
      await caches.delete("tankside-walk-v1"); // the hand-written worker's cache, before Workbox
      await self.clients.claim();
    })(),
  ),
);

/** A page worth keeping: a real answer, not a sign-in page the server sent instead. */
const keepable = (res: Response) => res.ok && !res.redirected && (res.headers.get("content-type") ?? "").includes("text/html");

const pages = new NetworkFirst({
  cacheName: PAGES_CACHE,
  // On a weak signal the kept page wins after a few seconds rather than a blank wait.
  networkTimeoutSeconds: 6,
  plugins: [{ cacheWillUpdate: async ({ response }) => (keepable(response) ? response : null) }],
});

registerRoute(
  ({ request, url }) => request.mode === "navigate" && url.origin === self.location.origin && KEPT_PAGE.test(url.pathname),
  async (options) => {
    try {
      return await pages.handle(options);
    } catch {
      // No signal and no copy of this page: a walk started on this phone opens from the walk page
      // kept for that purpose; anything else says plainly what happened.
      const url = new URL(options.request.url);
      if (isWalkPage(url.pathname)) {
        const kept = await caches.open(PAGES_CACHE).then((c) => c.match(`/cases/${ON_PHONE_CASE}/walk`));
        if (kept) return kept;
      }
      return noSignalPage();
    }
  },
);

// Any other page of the app needs signal: with none, say so rather than the browser's own error.
registerRoute(
  ({ request, url }) => request.mode === "navigate" && url.origin === self.location.origin,
  async ({ request }) => {
    try {
      return await fetch(request);
    } catch {
      return noSignalPage();
    }
  },
);

function noSignalPage(): Response {
  const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>No signal · Tankside</title><style>body{font:1.25rem/1.5 system-ui,sans-serif;margin:0;padding:1rem;background:#fffdf5;color:#111}
a{display:inline-block;margin-top:1rem;padding:1rem 1.25rem;border:3px solid #111;border-radius:.5rem;color:#111;font-weight:700;text-decoration:none}</style></head>
<body><h1>No signal</h1><p>This page is not kept on this phone, and there is no signal to fetch it.</p>
<p>Fixes, rigs and field math kept on this phone still open from the home screen.</p><a href="/">Go to the home screen</a>
<div lang="es"><h1>Sin señal</h1><p>Esta página no está guardada en este teléfono, y no hay señal para traerla.</p>
<p>Los arreglos, los equipos y los cálculos guardados en este teléfono se abren desde la pantalla de inicio.</p><a href="/">Ir a la pantalla de inicio</a></div></body></html>`;
  return new Response(html, { status: 503, headers: { "Content-Type": "text/html; charset=utf-8" } });
}

// The page names what to keep (after a fresh offline kit) and what to forget (at sign-out).
self.addEventListener("message", (event) => {
  const data = event.data as { type?: string; urls?: string[] } | null;
  const port = event.ports[0];
  if (data?.type === "keep" && Array.isArray(data.urls)) {
    event.waitUntil(
      keep(data.urls).then(
        (result) => port?.postMessage(result),
        () => port?.postMessage({ kept: 0, failed: data.urls!.length }),
      ),
    );
  } else if (data?.type === "forget") {
    event.waitUntil(caches.delete(PAGES_CACHE).then(() => port?.postMessage({ forgotten: true })));
  }
});

async function keep(urls: string[]): Promise<{ kept: number; failed: number }> {
  const cache = await caches.open(PAGES_CACHE);
  const results = await Promise.allSettled(
    urls.map(async (url) => {
      const res = await fetch(url, { credentials: "same-origin", headers: { Accept: "text/html" } });
      if (!keepable(res)) throw new Error(`${url}: ${res.status}`);
      await cache.put(url, res);
    }),
  );
  const kept = results.filter((r) => r.status === "fulfilled").length;
  return { kept, failed: results.length - kept };
}
