import { formatDateTime } from "./format";
import { ROLE_LABELS, type Role } from "./roles";

const WHAT_THEY_DO: Record<Role, string> = {
  crew: "start a fix on a rig, walk through a guide and use the field math",
  trainer: "also write and edit guides on the guide desk",
  supervisor: "also see the fault board and every case, and publish guides",
  admin: "also invite people, set their roles and look after the rigs",
};

/** The invitation e-mail: who asked, what the role lets them do, the link and when it stops working. */
export function inviteMail(f: { name: string; company: string; invitedBy: string; role: Role; link: string; expiresAt: Date; timeZone: string }): {
  subject: string;
  text: string;
} {
  return {
    subject: `${f.invitedBy} added you to ${f.company} on Tankside`,
    text: [
      `Hello ${f.name},`,
      "",
      `${f.invitedBy} has added you to ${f.company} on Tankside as ${ROLE_LABELS[f.role].toLowerCase()}: you can ${WHAT_THEY_DO[f.role]}.`,
      "",
      "Choose your password here (the link works once):",
      f.link,
      "",
      `It stops working on ${formatDateTime(f.expiresAt, f.timeZone)}. If it has, ask ${f.invitedBy} for a new one.`,
      "If you did not expect this, ignore it: nothing happens until the link is used.",
    ].join("\n"),
  };
}
