import { closePending, markSynced, unsynced, type WalkRecord } from "~/lib/walk/queue";
import { dropPhotoBytes, keptPhotoBytes } from "./photo-store";

/** How a send ended: all sent, or why something still waits on the phone. */
export type SendOutcome = "sent" | "waiting" | "signed-out" | "refused";

export interface SendOptions {
  /** The record as it is now (it may change while a send is under way). */
  read: () => WalkRecord;
  /** Changes the kept record (and whatever shows it). */
  update: (change: (r: WalkRecord) => WalkRecord) => void;
  /** For the last send as the page is hidden: the browser finishes it after the page goes. */
  keepalive?: boolean;
  onPhotoProgress?: (photoId: string, percent: number) => void;
}

type Answered = { ok: true; res: Response } | { ok: false; outcome: Exclude<SendOutcome, "sent"> };

/**
 * Sends what the phone holds for one walk-through, in the order the server needs it: the start
 * (for a fix begun with no signal), the answers, the photos, then the close. Every part carries
 * the phone's own id, so a resend after a dropped connection is stored once. A refusal the
 * person must act on stops the sending and is kept on the record to be shown; nothing is dropped.
 */
export async function sendKept({ read, update, keepalive = false, onPhotoProgress }: SendOptions): Promise<SendOutcome> {
  if (read().rejected) return "refused";
  const caseId = read().caseId;
  try {
    const start = read().start;
    if (start && !read().startSent) {
      const sent = await answered(await post("/api/cases", { id: caseId, ...start }, keepalive), update, "The server did not take this fix");
      if (!sent.ok) return sent.outcome;
      update((r) => ({ ...r, startSent: true }));
    }

    const pending = unsynced(read());
    if (pending.length) {
      const sent = await answered(await post(`/api/cases/${caseId}/events`, { events: pending }, keepalive), update, "The server did not take the answers");
      if (!sent.ok) return sent.outcome;
      update((r) =>
        markSynced(
          r,
          pending.map((e) => e.id),
        ),
      );
    }

    for (const photo of (read().photos ?? []).filter((p) => !p.sentAs && !p.error)) {
      const bytes = await keptPhotoBytes(photo.id);
      if (!bytes) {
        update((r) => withPhoto(r, photo.id, { error: "This photo is no longer on the phone (the browser cleared its storage)." }));
        continue;
      }
      const result = await uploadPhoto(caseId, photo.id, photo.stepId, photo.name, bytes, (pct) => onPhotoProgress?.(photo.id, pct));
      if (result.kind === "no-signal") return "waiting";
      if (result.kind === "signed-out") return "signed-out";
      if (result.kind === "refused") update((r) => withPhoto(r, photo.id, { error: result.error }));
      else {
        update((r) => withPhoto(r, photo.id, { sentAs: result.id }));
        await dropPhotoBytes(photo.id);
      }
    }

    const record = read();
    if (closePending(record) && unsynced(record).length === 0) {
      const sent = await answered(await post(`/api/cases/${caseId}/close`, record.close, keepalive), update, "The server did not take the end of this fix");
      if (!sent.ok) return sent.outcome;
      const result = (await sent.res.json()) as { notified?: string[]; mailedAt?: string | null; mailFailed?: boolean; mailPending?: boolean };
      update((r) => ({
        ...r,
        closeResult: { notified: result.notified ?? [], mailedAt: result.mailedAt ?? null, mailFailed: result.mailFailed, mailPending: result.mailPending },
      }));
    }
    return "sent";
  } catch {
    // No connection after all: the next try sends it.
    return "waiting";
  }
}

const post = (path: string, body: unknown, keepalive: boolean) =>
  fetch(path, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify(body), credentials: "same-origin", keepalive });

/** A refusal that waiting will not cure (not sign-in, not a timeout or a busy server) is kept on the record. */
async function answered(res: Response, update: SendOptions["update"], what: string): Promise<Answered> {
  if (res.ok) return { ok: true, res };
  if (res.status === 401) return { ok: false, outcome: "signed-out" };
  if (res.status >= 400 && res.status < 500 && ![408, 429].includes(res.status)) {
    const body = (await res.json().catch(() => ({}))) as { error?: string };
    update((r) => ({ ...r, rejected: `${what}: ${body.error ?? `refused (${res.status}).`}` }));
    return { ok: false, outcome: "refused" };
  }
  return { ok: false, outcome: "waiting" };
}

const withPhoto = (r: WalkRecord, id: string, change: { sentAs?: number; error?: string }): WalkRecord => ({
  ...r,
  photos: (r.photos ?? []).map((p) => (p.id === id ? { ...p, ...change } : p)),
});

type Upload = { kind: "stored"; id: number } | { kind: "refused"; error: string } | { kind: "no-signal" } | { kind: "signed-out" };

/** XMLHttpRequest rather than fetch, because only it reports upload progress, which matters on a weak signal. */
function uploadPhoto(caseId: string, phoneId: string, stepId: string, name: string, bytes: Blob, progress: (pct: number) => void): Promise<Upload> {
  return new Promise((resolve) => {
    const form = new FormData();
    form.set("stepId", stepId);
    form.set("phoneId", phoneId);
    form.set("photo", bytes, name);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/cases/${caseId}/photos`);
    xhr.upload.onprogress = (e) => e.lengthComputable && progress(Math.round((e.loaded / e.total) * 100));
    xhr.onload = () => {
      const body = (() => {
        try {
          return JSON.parse(xhr.responseText) as { id?: number; error?: string };
        } catch {
          return {};
        }
      })();
      if (xhr.status >= 200 && xhr.status < 300 && typeof body.id === "number") resolve({ kind: "stored", id: body.id });
      else if (xhr.status === 401) resolve({ kind: "signed-out" });
      else if (xhr.status >= 400 && xhr.status < 500 && ![408, 429].includes(xhr.status))
        resolve({ kind: "refused", error: body.error ?? `Upload refused (${xhr.status}).` });
      else resolve({ kind: "no-signal" });
    };
    xhr.onerror = () => resolve({ kind: "no-signal" });
    xhr.send(form);
  });
}
