import { handoffMail } from "~/lib/mail/handoff";
import { ownedBy } from "./tenancy.server";
import { caseDetail } from "./case-detail.server";
import { Case } from "./db.server";
import { env } from "./env.server";
import type { SessionUser } from "./guards.server";
import { deliver, supervisorsOf } from "./mail.server";

/** What the phone is told about a hand-off's mail: only what has happened. */
export interface HandoffMailResult {
  notified: string[];
  mailedAt: string | null;
  mailFailed: boolean;
  /** Another request is sending it right now: the phone asks again later rather than settle for "not confirmed". */
  mailPending?: boolean;
}

export const NO_MAIL: HandoffMailResult = { notified: [], mailedAt: null, mailFailed: false };

/** How long a close waits for another request that is sending the same mail, and how often it looks. */
const WAIT_FOR_OTHER_MS = 8000;
const LOOK_EVERY_MS = 200;

/** Mails the company's supervisors (its admins if it has none) about a handed-off case; returns who was told, or null if the mail failed. */
async function notifyHandoff(user: SessionUser, caseId: string): Promise<string[] | null> {
  const detail = await caseDetail(user, caseId);
  const people = await supervisorsOf(user.companyId);
  const base = env().APP_URL;
  const mail = handoffMail({
    rig: detail.rig,
    guide: detail.guide,
    openedBy: detail.openedBy,
    openedAt: detail.openedAt,
    finalStep: detail.finalStep,
    events: detail.events,
    note: detail.note,
    caseUrl: `${base}/cases/${caseId}`,
    timeZone: user.timeZone,
    photoUrls: detail.photos.map((p) => `${base}/cases/${caseId}/photos/${p.id}`),
  });
  const sent = await deliver({ companyId: user.companyId, to: people.map((p) => p.email), ...mail }, `Hand-off mail for case ${caseId}`);
  return sent ? people.map((p) => p.name) : null;
}

/**
 * Sends a case's hand-off mail at most once, however many closes arrive (a resend, two phones):
 * the first to claim the case's mail slot sends; the others wait for it and report what the case
 * records. A failed send frees the slot, so a waiting close (or the next resend) tries again.
 */
export async function mailHandoffOnce(user: SessionUser, caseId: string): Promise<HandoffMailResult> {
  const where = ownedBy(user, { id: caseId });
  const deadline = Date.now() + WAIT_FOR_OTHER_MS;
  for (;;) {
    const [claimed] = await Case.update({ handoffMailedAt: new Date() }, { where: { ...where, handoffMailedAt: null } });
    if (claimed) return sendClaimed(user, caseId, where);
    const c = await Case.findOne({ where, attributes: ["handoffMailedAt", "handoffMailedTo"] });
    if (c?.handoffMailedTo) return { notified: c.handoffMailedTo.split(", "), mailedAt: c.handoffMailedAt?.toISOString() ?? null, mailFailed: false };
    // Another request holds the slot and is still sending (or it failed and freed the slot: claim it next time round).
    if (Date.now() > deadline) return { ...NO_MAIL, mailPending: true };
    await new Promise((r) => setTimeout(r, LOOK_EVERY_MS));
  }
}

async function sendClaimed(user: SessionUser, caseId: string, where: { id: string; companyId: number }): Promise<HandoffMailResult> {
  const names = await notifyHandoff(user, caseId).catch(async (error) => {
    await Case.update({ handoffMailedAt: null }, { where });
    throw error;
  });
  if (!names) {
    await Case.update({ handoffMailedAt: null }, { where });
    return { notified: [], mailedAt: null, mailFailed: true };
  }
  const mailedAt = new Date();
  await Case.update({ handoffMailedAt: mailedAt, handoffMailedTo: names.join(", ") }, { where });
  return { notified: names, mailedAt: mailedAt.toISOString(), mailFailed: false };
}
