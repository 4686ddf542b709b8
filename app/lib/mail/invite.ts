import { formatDateTime } from "../format";
import { roleDescription } from "../permissions";
import { ROLE_LABELS, type Role } from "../people/roles";

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
      `${f.invitedBy} has added you to ${f.company} on Tankside as ${ROLE_LABELS[f.role].toLowerCase()}: you can ${roleDescription(f.role)}.`,
      "",
      "Choose your password here (the link works once):",
      f.link,
      "",
      `It stops working on ${formatDateTime(f.expiresAt, f.timeZone)}. If it has, ask ${f.invitedBy} for a new one.`,
      "If you did not expect this, ignore it: nothing happens until the link is used.",
    ].join("\n"),
  };
}
