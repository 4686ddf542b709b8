import fs from "node:fs";
import path from "node:path";
import { simpleParser } from "mailparser";

export interface KeptMail {
  to: string[];
  subject: string;
  text: string;
}

/** Every message the fake SMTP server has kept during this test run, parsed. */
export async function outbox(): Promise<KeptMail[]> {
  const dir = process.env.MAIL_OUTBOX_DIR!;
  if (!fs.existsSync(dir)) return [];
  const files = fs.readdirSync(dir).sort();
  return Promise.all(
    files.map(async (f) => {
      const kept = JSON.parse(fs.readFileSync(path.join(dir, f), "utf8")) as { to: string[]; raw: string };
      const parsed = await simpleParser(kept.raw);
      return { to: kept.to, subject: parsed.subject ?? "", text: parsed.text ?? "" };
    }),
  );
}
