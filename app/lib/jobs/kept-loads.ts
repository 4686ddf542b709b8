import type { KeyValueStore } from "../walk/queue";
import type { JobLoadInput } from "./schema";

/**
 * Loads marked sprayed on the load card wait on the phone until the server has them: marked with
 * no signal, they are sent when it returns, each with the phone's own id (a resend is stored once).
 */
export interface KeptLoad extends JobLoadInput {
  jobId: number;
  /** The load's number on the card when it was marked. */
  number: number;
  sent: boolean;
  /** What the server said when it refused it (kept and shown, never dropped). */
  refused?: string;
  /** Taken back after it was sent: the phone asks the server to drop it when there is signal. */
  takeBack?: boolean;
}

const KEY = "tankside:job-loads";
/** A load the server has is forgotten by the phone a week after it was sprayed. */
const KEEP_SENT_MS = 7 * 86_400_000;

export function keptLoads(store: KeyValueStore): KeptLoad[] {
  try {
    const list = JSON.parse(store.getItem(KEY) ?? "[]") as KeptLoad[];
    return Array.isArray(list) ? list : [];
  } catch {
    return [];
  }
}

function save(store: KeyValueStore, list: KeptLoad[], now = Date.now()) {
  store.setItem(KEY, JSON.stringify(list.filter((l) => !l.sent || now - Date.parse(l.sprayedAt) < KEEP_SENT_MS)));
}

/** Keeps a load marked sprayed (a second mark with the same id changes nothing). */
export function keepLoad(store: KeyValueStore, load: Omit<KeptLoad, "sent">): void {
  const list = keptLoads(store);
  if (list.some((l) => l.id === load.id)) return;
  save(store, [...list, { ...load, sent: false }]);
}

export function updateLoad(store: KeyValueStore, id: string, change: Partial<KeptLoad>): void {
  save(
    store,
    keptLoads(store).map((l) => (l.id === id ? { ...l, ...change } : l)),
  );
}

/** Loads still to send (refused ones wait for the person, not for signal). */
export const loadsToSend = (store: KeyValueStore) => keptLoads(store).filter((l) => !l.sent && !l.refused);

/** Loads taken back after they were sent: the server still has them. */
export const loadsToTakeBack = (store: KeyValueStore) => keptLoads(store).filter((l) => l.sent && l.takeBack);

/** A load marked by mistake: one the server never had is forgotten at once; a sent one waits to be taken back there. */
export function takeBackLoad(store: KeyValueStore, id: string): void {
  const load = keptLoads(store).find((l) => l.id === id);
  if (!load) return;
  if (load.sent) updateLoad(store, id, { takeBack: true });
  else forgetLoad(store, id);
}

export function forgetLoad(store: KeyValueStore, id: string): void {
  save(
    store,
    keptLoads(store).filter((l) => l.id !== id),
  );
}
