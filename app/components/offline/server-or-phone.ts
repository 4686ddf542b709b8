import { loadKit, type OfflineKit } from "~/lib/walk/kept";
import { isNoSignal } from "~/lib/walk/no-signal";

/**
 * A page's data from the server, or with no signal from the kit kept on the phone. `fromKit`
 * answers null when the kit cannot stand in (then the "No signal" error shows as before).
 */
export async function serverOrPhone<T>(serverLoader: () => Promise<T>, fromKit: (kit: OfflineKit) => T | null): Promise<T> {
  try {
    return await serverLoader();
  } catch (error) {
    if (!isNoSignal(error)) throw error;
    const kit = loadKit(window.localStorage);
    const kept = kit ? fromKit(kit) : null;
    if (kept === null) throw error;
    return kept;
  }
}
