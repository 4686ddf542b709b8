/**
 * `npm run digest`: sends each company's weekly digest to its supervisors. Uses DATABASE_URL
 * and SMTP_URL when set (deployments, run from a weekly scheduler); otherwise the local
 * MariaDB under .data/ and a fake SMTP server that keeps the mail in .data/outbox.
 */
import path from "node:path";
import { closeDb } from "../db/index";
import { startLocalMariadb } from "../db/local-mariadb";
import { startFakeSmtp } from "./fakes/smtp";
import { freePort } from "./free-port";

const dataDir = path.resolve(".data");
// A real database with no real mail server would "send" every company's digest into a local folder.
if (process.env.DATABASE_URL && !process.env.SMTP_URL) {
  console.error("DATABASE_URL is set but SMTP_URL is not: set SMTP_URL to your mail provider (the local fake is only for the demo database).");
  process.exit(2);
}
const db = process.env.DATABASE_URL
  ? null
  : await startLocalMariadb({ dir: path.join(dataDir, "mariadb"), port: Number(process.env.DB_PORT ?? 3406), database: "tankside", log: () => {} });
if (db) process.env.DATABASE_URL = db.url;
const smtp = process.env.SMTP_URL ? null : await startFakeSmtp({ port: await freePort(), dir: path.join(dataDir, "outbox") });
if (smtp) {
  process.env.SMTP_URL = smtp.url;
  process.env.MAIL_OUTBOX_DIR = smtp.dir;
}
try {
  const { sendAllDigests } = await import("../app/services/digest.server");
  const results = await sendAllDigests();
  for (const r of results) console.log(`${r.company}: ${r.mailFailed ? "NOT SENT, the mail server refused it" : `sent to ${r.sentTo.join(", ") || "no one"}`}`);
  // A scheduler sees a failed run and can retry it.
  if (results.some((r) => r.mailFailed)) process.exitCode = 1;
} finally {
  await closeDb();
  await smtp?.stop();
  await db?.stop();
}
