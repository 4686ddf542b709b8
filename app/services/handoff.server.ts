import { handoffMail } from "~/lib/handoff-mail";
import { caseDetail } from "./cases.server";
import { User } from "./db.server";
import { env } from "./env.server";
import type { SessionUser } from "./guards.server";
import { sendMail } from "./mail.server";

/** Mails the company's supervisors (its admins if it has none) about a handed-off case; returns who was told. */
export async function notifyHandoff(user: SessionUser, caseId: string): Promise<string[]> {
  const detail = await caseDetail(user, caseId);
  let people = await User.findAll({ where: { companyId: user.companyId, role: "supervisor" }, attributes: ["name", "email"] });
  if (people.length === 0) people = await User.findAll({ where: { companyId: user.companyId, role: "admin" }, attributes: ["name", "email"] });
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
    photoUrls: detail.photos.map((p) => `${base}/cases/${caseId}/photos/${p.id}`),
  });
  await sendMail({ to: people.map((p) => p.email), ...mail });
  return people.map((p) => p.name);
}
