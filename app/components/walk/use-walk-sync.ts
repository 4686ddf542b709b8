import { useCallback, useEffect, useRef, useState } from "react";
import { closePending, unsynced, type WalkRecord } from "~/lib/walk/queue";
import { sendKept } from "~/components/offline/send-kept";
import { useOnline } from "~/components/offline/use-online";

const RETRY_MS = 4000;

/**
 * Sends what the phone holds for the open walk-through whenever there is a connection: on a
 * timer, when the browser comes back online, and when the page is hidden. Answering itself
 * never waits for the network.
 */
export function useWalkSync(record: WalkRecord, update: (change: (r: WalkRecord) => WalkRecord) => void) {
  // The one reading of "is there signal" (navigator.onLine, or a failed request when that lies).
  const online = useOnline();
  const [signedOut, setSignedOut] = useState(false);
  const [photoProgress, setPhotoProgress] = useState<Record<string, number>>({});
  const latest = useRef(record);
  latest.current = record;
  const busy = useRef(false);

  const flush = useCallback(
    async (keepalive = false) => {
      if (busy.current || !navigator.onLine) return;
      busy.current = true;
      try {
        const outcome = await sendKept({
          read: () => latest.current,
          update: (change) => {
            latest.current = change(latest.current);
            update(change);
          },
          keepalive,
          onPhotoProgress: (id, pct) => setPhotoProgress((p) => (p[id] === pct ? p : { ...p, [id]: pct })),
        });
        setSignedOut(outcome === "signed-out");
      } finally {
        busy.current = false;
      }
    },
    [update],
  );

  useEffect(() => {
    const goOnline = () => void flush();
    const hidden = () => document.visibilityState === "hidden" && void flush(true);
    window.addEventListener("online", goOnline);
    document.addEventListener("visibilitychange", hidden);
    const timer = window.setInterval(() => void flush(), RETRY_MS);
    void flush();
    return () => {
      window.removeEventListener("online", goOnline);
      document.removeEventListener("visibilitychange", hidden);
      window.clearInterval(timer);
    };
  }, [flush]);

  const waiting = {
    answers: unsynced(record).length,
    photos: (record.photos ?? []).filter((p) => !p.sentAs && !p.error).length,
    close: closePending(record),
  };
  const startWaiting = !!record.start && !record.startSent;
  return { online, signedOut, waiting, startWaiting, photoProgress, flushNow: () => void flush() };
}
