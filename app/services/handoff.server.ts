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
}

export const NO_MAIL: HandoffMailResult = { notified: [], mailedAt: null, mailFailed: false };

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
 * the first to claim the case's mail slot sends; the others report what the case records.
 * A failed send frees the slot, so the next resend of the close tries again.
 */
export async function mailHandoffOnce(user: SessionUser, caseId: string): Promise<HandoffMailResult> {
  const where = ownedBy(user, { id: caseId });
  const [claimed] = await Case.update({ handoffMailedAt: new Date() }, { where: { ...where, handoffMailedAt: null } });
  if (!claimed) {
    const c = await Case.findOne({ where, attributes: ["handoffMailedAt", "handoffMailedTo"] });
    // Still being sent by another request: nothing to claim yet, and nothing failed.
    if (!c?.handoffMailedTo) return NO_MAIL;
    return { notified: c.handoffMailedTo.split(", "), mailedAt: c.handoffMailedAt?.toISOString() ?? null, mailFailed: false };
  }
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
