import { useEffect, useState } from "react";
import { forgetKit, KIT_BUDGET_BYTES, loadKit, saveKit, type OfflineKit } from "~/lib/walk/kept";
import { isNoSignal } from "~/lib/walk/no-signal";
import { pagesToKeep } from "~/lib/walk/pages";
import { askWorker } from "./worker";

/**
 * Keeps the offline kit (rigs, guides, cause names) and the pages a crew member may open with
 * no signal on the phone, refreshed whenever there is signal, and says how fresh they are.
 */

export interface KitStatus {
  personId: number;
  /** When the server made the kit the phone holds. */
  madeAt: string;
  /** When the pages were last kept, and how many could not be. */
  pagesAt: string | null;
  pagesFailed: number;
  /** Size of the kit as stored (characters of JSON). */
  bytes: number;
}

const STATUS_KEY = "tankside:kit-status";
const CHANGED = "tankside:kit-changed";
/** How often an open app refreshes what it keeps while it has signal. */
const REFRESH_MS = 15 * 60 * 1000;

export function kitStatus(personId: number): KitStatus | null {
  try {
    const status = JSON.parse(window.localStorage.getItem(STATUS_KEY) ?? "null") as KitStatus | null;
    return status?.personId === personId && loadKit(window.localStorage, personId) ? status : null;
  } catch {
    return null;
  }
}

let refreshing: Promise<void> | null = null;

/** Fetches a fresh kit and keeps the pages it names; a failure leaves the kept ones as they were. */
export function refreshKit(personId: number): Promise<void> {
  refreshing ??= (async () => {
    try {
      const res = await fetch("/api/offline-kit", { credentials: "same-origin", headers: { Accept: "application/json" } });
      if (!res.ok) return;
      const text = await res.text();
      const kit = JSON.parse(text) as OfflineKit;
      if (kit.person?.id !== personId || text.length > KIT_BUDGET_BYTES) return;
      saveKit(window.localStorage, kit);
      const reply = await askWorker({ type: "keep", urls: pagesToKeep(kit.rigs.map((r) => r.code)) });
      const status: KitStatus = {
        personId,
        madeAt: kit.madeAt,
        pagesAt: reply ? new Date().toISOString() : null,
        pagesFailed: reply?.failed ?? 0,
        bytes: text.length,
      };
      window.localStorage.setItem(STATUS_KEY, JSON.stringify(status));
      window.dispatchEvent(new Event(CHANGED));
    } catch (error) {
      if (!isNoSignal(error)) console.error("Keeping the offline kit failed", error);
    } finally {
      refreshing = null;
    }
  })();
  return refreshing;
}

/** Refreshes the kit now and then while the app is open with signal (used once, in the app's frame). */
export function useKitRefresh(personId: number) {
  useEffect(() => {
    const maybe = () => {
      if (!navigator.onLine) return;
      const status = kitStatus(personId);
      if (!status || Date.now() - Date.parse(status.madeAt) > REFRESH_MS || !status.pagesAt) void refreshKit(personId);
    };
    maybe();
    window.addEventListener("online", maybe);
    const timer = window.setInterval(maybe, 60_000);
    return () => {
      window.removeEventListener("online", maybe);
      window.clearInterval(timer);
    };
  }, [personId]);
}

/** How fresh the kept kit is, for the home screen; null until read on the phone. */
export function useKitStatus(personId: number): { status: KitStatus | null; read: boolean } {
  const [state, setState] = useState<{ status: KitStatus | null; read: boolean }>({ status: null, read: false });
  useEffect(() => {
    const read = () => setState({ status: kitStatus(personId), read: true });
    read();
    window.addEventListener(CHANGED, read);
    return () => window.removeEventListener(CHANGED, read);
  }, [personId]);
  return state;
}

/** At sign-out: the next person on this phone must not see this company's rigs and pages. Kept answers stay. */
export async function forgetPhoneKit(): Promise<void> {
  forgetKit(window.localStorage);
  window.localStorage.removeItem(STATUS_KEY);
  await askWorker({ type: "forget" }).catch(() => null);
}
