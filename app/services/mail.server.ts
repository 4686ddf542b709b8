import nodemailer, { type Transporter } from "nodemailer";
import { lowestRole } from "~/lib/permissions";
import { User } from "./db.server";
import { env } from "./env.server";

let transport: Transporter | undefined;

function transporter(): Transporter {
  const url = env().SMTP_URL;
  if (!url) throw new Error("SMTP_URL is not set: no mail can be sent.");
  // The local fake has no TLS; real providers are reached with smtps:// or STARTTLS as they offer.
  const local = /^smtp:\/\/(127\.0\.0\.1|localhost)[:/]/.test(url);
  return (transport ??= nodemailer.createTransport(local ? ({ url, secure: false, ignoreTLS: true } as never) : url));
}

/** The header each message carries naming the company that sent it (the local outbox shows an admin only their own). */
export const COMPANY_HEADER = "X-Tankside-Company";

export interface Mail {
  /** The company the mail is sent for. */
  companyId: number;
  to: string[];
  subject: string;
  text: string;
  html?: string;
}

/**
 * The one failure policy for mail. The work that asked for a mail (a closed case, an invitation, a reset link)
 * is saved first; a mail server that refuses is logged with what the mail was and answered as `false`,
 * so the caller says "saved, but the mail did not go" — never a 500 and never "they have been told".
 */
export async function deliver(mail: Mail, what: string): Promise<boolean> {
  try {
    await sendMail(mail);
    return true;
  } catch (error) {
    console.warn(`${what} was not sent: ${error instanceof Error ? error.message : error}`);
    return false;
  }
}

/**
 * Who is told about a company's hand-offs and digests: the people whose role first takes hand-offs
 * (supervisors), or the company's admins when it has none. Signed-off people get nothing.
 */
export async function supervisorsOf(companyId: number): Promise<{ name: string; email: string }[]> {
  const find = (role: "supervisor" | "admin") => User.findAll({ where: { companyId, role, accessRemovedAt: null }, attributes: ["name", "email"] });
  const people = await find(lowestRole("resolve-handoffs") as "supervisor");
  return (people.length ? people : await find("admin")).map((p) => ({ name: p.name, email: p.email }));
}

/** Sends one message through the configured SMTP server; throws when it is refused (callers use `deliver`). */
export async function sendMail(mail: Mail): Promise<void> {
  if (mail.to.length === 0) return;
  await transporter().sendMail({
    from: env().MAIL_FROM,
    to: mail.to.join(", "),
    subject: mail.subject,
    text: mail.text,
    html: mail.html,
    headers: { [COMPANY_HEADER]: String(mail.companyId) },
  });
}
