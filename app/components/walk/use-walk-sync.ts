import { useCallback, useEffect, useRef, useState } from "react";
import { closePending, markSynced, unsynced, type WalkRecord } from "~/lib/walk/queue";

const RETRY_MS = 4000;

/**
 * Sends the answers the phone holds, in batches, whenever there is a connection: on a timer,
 * when the browser comes back online, and when the page is hidden. Answering itself never
 * waits for the network. A 4xx answer (other than sign-in) stops the retries and is shown.
 */
export function useWalkSync(record: WalkRecord, update: (change: (r: WalkRecord) => WalkRecord) => void) {
  const [online, setOnline] = useState(true);
  const [sending, setSending] = useState(false);
  const latest = useRef(record);
  latest.current = record;
  const busy = useRef(false);

  const post = (path: string, body: unknown, keepalive = false) =>
    fetch(path, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify(body), credentials: "same-origin", keepalive });

  const refuse = useCallback(
    async (res: Response) => {
      if (res.status >= 400 && res.status < 500 && ![401, 408, 429].includes(res.status)) {
        const body = (await res.json().catch(() => ({}))) as { error?: string };
        update((r) => ({ ...r, rejected: body.error ?? `The server refused the answers (${res.status}).` }));
      }
    },
    [update],
  );

  const flush = useCallback(
    async (keepalive = false) => {
      if (busy.current || !navigator.onLine || latest.current.rejected) return;
      busy.current = true;
      setSending(true);
      try {
        const caseId = latest.current.caseId;
        const pending = unsynced(latest.current);
        if (pending.length) {
          const res = await post(`/api/cases/${caseId}/events`, { events: pending }, keepalive);
          if (!res.ok) return void (await refuse(res));
          update((r) =>
            markSynced(
              r,
              pending.map((e) => e.id),
            ),
          );
          latest.current = markSynced(
            latest.current,
            pending.map((e) => e.id),
          );
        }
        if (closePending(latest.current) && unsynced(latest.current).length === 0) {
          const res = await post(`/api/cases/${caseId}/close`, latest.current.close, keepalive);
          if (!res.ok) return void (await refuse(res));
          const result = (await res.json()) as { notified: string[]; mailedAt?: string | null; mailFailed?: boolean };
          update((r) => ({ ...r, closeResult: { notified: result.notified ?? [], mailedAt: result.mailedAt ?? null, mailFailed: result.mailFailed } }));
        }
      } catch {
        // No connection after all: the timer tries again.
      } finally {
        busy.current = false;
        setSending(false);
      }
    },
    [refuse, update],
  );

  useEffect(() => {
    setOnline(navigator.onLine);
    const goOnline = () => {
      setOnline(true);
      void flush();
    };
    const goOffline = () => setOnline(false);
    const hidden = () => document.visibilityState === "hidden" && void flush(true);
    window.addEventListener("online", goOnline);
    window.addEventListener("offline", goOffline);
    document.addEventListener("visibilitychange", hidden);
    const timer = window.setInterval(() => void flush(), RETRY_MS);
    return () => {
      window.removeEventListener("online", goOnline);
      window.removeEventListener("offline", goOffline);
      document.removeEventListener("visibilitychange", hidden);
      window.clearInterval(timer);
    };
  }, [flush]);

  const waiting = unsynced(record).length + (closePending(record) ? 1 : 0);
  return { online, sending, waiting, flushNow: () => void flush() };
}
