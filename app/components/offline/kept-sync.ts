import { useEffect, useState } from "react";
import { keptCaseIds, waitingToSend } from "~/lib/walk/kept";
import { loadRecord, saveRecord, type WalkRecord } from "~/lib/walk/queue";
import { sendKept } from "./send-kept";
import { sendKeptLoads } from "./send-loads";

const RETRY_MS = 4000;
/** Said on the window after each round of sending: screens that show what waits read it again. */
export const KEPT_CHANGED = "tankside:kept-changed";
const CHANGED = KEPT_CHANGED;
/** A walk fully sent is dropped from the phone this long after it closed. */
const KEEP_SENT_MS = 7 * 24 * 3600 * 1000;

export interface KeptSummary {
  /** Walks with something still to send. */
  waiting: number;
  signedOut: boolean;
  /** Walks the server refused, with what it said. */
  refused: { caseId: string; message: string }[];
}

const VIEW_PREFIX = "tankside:walk-view:";

function summary(): KeptSummary {
  const records = keptCaseIds(window.localStorage).map((id) => loadRecord(window.localStorage, id));
  return {
    waiting: records.filter((r) => waitingToSend(r) && !r.rejected).length,
    signedOut: window.sessionStorage.getItem("tankside:signed-out") === "yes",
    refused: records.filter((r) => r.rejected).map((r) => ({ caseId: r.caseId, message: r.rejected! })),
  };
}

let running = false;

/**
 * Sends every walk the phone still holds, other than the one open on screen (its own page sends
 * it): a fix finished with no signal goes out from whatever page is open when signal returns.
 */
async function sendAll(skipCaseId: string | null) {
  if (running || !navigator.onLine) return;
  running = true;
  try {
    let signedOut = false;
    for (const caseId of keptCaseIds(window.localStorage)) {
      if (caseId === skipCaseId) continue;
      const record = loadRecord(window.localStorage, caseId);
      if (!waitingToSend(record)) {
        if (record.closeResult && Date.now() - Date.parse(record.close!.at) > KEEP_SENT_MS) {
          window.localStorage.removeItem(`tankside:walk:${caseId}`);
          window.localStorage.removeItem(`${VIEW_PREFIX}${caseId}`);
        }
        continue;
      }
      if (record.rejected) continue;
      const read = () => loadRecord(window.localStorage, caseId);
      const update = (change: (r: WalkRecord) => WalkRecord) => saveRecord(window.localStorage, change(read()));
      const outcome = await sendKept({ read, update });
      if (outcome === "signed-out") signedOut = true;
      if (outcome === "waiting") break; // the connection dropped: try the rest next time
    }
    if ((await sendKeptLoads()) === "signed-out") signedOut = true;
    window.sessionStorage.setItem("tankside:signed-out", signedOut ? "yes" : "no");
  } finally {
    running = false;
    window.dispatchEvent(new Event(CHANGED));
  }
}

/** Runs the background sending while the app is open (used once, in the app's frame). */
export function useKeptSync(openCaseId: string | null) {
  useEffect(() => {
    const go = () => void sendAll(openCaseId);
    go();
    window.addEventListener("online", go);
    const timer = window.setInterval(go, RETRY_MS);
    return () => {
      window.removeEventListener("online", go);
      window.clearInterval(timer);
    };
  }, [openCaseId]);
}

/** What waits on this phone, for the home screen. */
export function useKeptSummary(): KeptSummary | null {
  const [state, setState] = useState<KeptSummary | null>(null);
  useEffect(() => {
    const read = () => setState(summary());
    read();
    window.addEventListener(CHANGED, read);
    return () => window.removeEventListener(CHANGED, read);
  }, []);
  return state;
}
