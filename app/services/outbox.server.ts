import fs from "node:fs/promises";
import path from "node:path";
import { simpleParser } from "mailparser";
import { env } from "./env.server";

export interface OutboxMessage {
  file: string;
  receivedAt: string;
  to: string[];
  subject: string;
  text: string;
}

/** Messages the local fake SMTP server kept, newest first; null when the app is using a real provider. */
export async function readOutbox(limit = 50): Promise<OutboxMessage[] | null> {
  const dir = env().MAIL_OUTBOX_DIR;
  if (!dir) return null;
  const files = (await fs.readdir(dir).catch(() => [] as string[]))
    .filter((f) => f.endsWith(".json"))
    .sort()
    .reverse()
    .slice(0, limit);
  return Promise.all(
    files.map(async (file) => {
      const kept = JSON.parse(await fs.readFile(path.join(dir, file), "utf8")) as { receivedAt: string; to: string[]; raw: string };
      const mail = await simpleParser(kept.raw);
      return { file, receivedAt: kept.receivedAt, to: kept.to, subject: mail.subject ?? "(no subject)", text: mail.text ?? "" };
    }),
  );
}
