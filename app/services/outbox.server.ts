import fs from "node:fs/promises";
import path from "node:path";
import { env } from "./env.server";
import { COMPANY_HEADER } from "./mail.server";

export interface OutboxMessage {
  file: string;
  /** The company that sent it (from the header every Tankside mail carries), or null. */
  companyId: number | null;
  receivedAt: string;
  to: string[];
  subject: string;
  text: string;
}

/** Messages the local fake SMTP server kept for one company, newest first; null when the app is using a real provider. */
export async function readOutbox(companyId: number, limit = 50): Promise<OutboxMessage[] | null> {
  const dir = env().MAIL_OUTBOX_DIR;
  if (!dir) return null;
  const files = (await fs.readdir(dir).catch(() => [] as string[]))
    .filter((f) => f.endsWith(".json"))
    .sort()
    .reverse();
  // Only the local fake's outbox needs a mail parser, and only in development: loaded here, not at start.
  const { simpleParser } = await import("mailparser");
  const all = await Promise.all(
    files.map(async (file) => {
      const kept = JSON.parse(await fs.readFile(path.join(dir, file), "utf8")) as { receivedAt: string; to: string[]; raw: string };
      const mail = await simpleParser(kept.raw);
      const company = Number(mail.headers.get(COMPANY_HEADER.toLowerCase()));
      return {
        file,
        companyId: Number.isInteger(company) && company > 0 ? company : null,
        receivedAt: kept.receivedAt,
        to: kept.to,
        subject: mail.subject ?? "(no subject)",
        text: mail.text ?? "",
      };
    }),
  );
  // The fake server holds every company's mail: an admin reads only what their own company sent.
  return all.filter((m) => m.companyId === companyId).slice(0, limit);
}
