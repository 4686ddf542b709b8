import nodemailer, { type Transporter } from "nodemailer";
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
