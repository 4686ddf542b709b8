/** Talks to the service worker (app/sw): registers it and asks it to keep or forget pages. */

let registering: Promise<ServiceWorker | null> | null = null;

/** The active worker, registering it once per page; null where the browser has none. */
export function activeWorker(): Promise<ServiceWorker | null> {
  if (typeof navigator === "undefined" || !("serviceWorker" in navigator)) return Promise.resolve(null);
  registering ??= navigator.serviceWorker
    .register("/sw.js")
    .then(async () => (await navigator.serviceWorker.ready).active)
    .catch(() => null);
  return registering;
}

type Reply = { kept?: number; failed?: number; forgotten?: boolean };

export async function askWorker(message: { type: "keep"; urls: string[] } | { type: "forget" }): Promise<Reply | null> {
  const worker = await activeWorker();
  if (!worker) return null;
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    channel.port1.onmessage = (e) => resolve(e.data as Reply);
    worker.postMessage(message, [channel.port2]);
  });
}
