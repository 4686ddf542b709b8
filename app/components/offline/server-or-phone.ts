import { loadKit, type KitRig, type OfflineKit } from "~/lib/walk/kept";
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

/** A rig's page: from the server, or with no signal from the kit's copy of that rig (none kept: the "No signal" error). */
export function serverOrPhoneRig<T>(serverLoader: () => Promise<T>, code: string, fromKit: (rig: KitRig, kit: OfflineKit) => T): Promise<T> {
  return serverOrPhone(serverLoader, (kit) => {
    const rig = kit.rigs.find((r) => r.code === code.toUpperCase());
    return rig ? fromKit(rig, kit) : null;
  });
}

/**
 * A form sent to the server, or with no signal done on the phone from its kit (`onPhone`); a phone
 * that has kept no kit answers `noKit`. The request is read before it is sent, for the phone's use.
 */
export async function serverOrPhoneAction<T, U>(
  request: Request,
  serverAction: () => Promise<T>,
  onPhone: (kit: OfflineKit, form: FormData) => U,
  noKit: U,
): Promise<T | U> {
  const form = await request.clone().formData();
  try {
    return await serverAction();
  } catch (error) {
    if (!isNoSignal(error)) throw error;
    const kit = loadKit(window.localStorage);
    return kit ? onPhone(kit, form) : noKit;
  }
}
