import { digestMail } from "~/lib/mail/digest";
import { buildBoard } from "~/lib/stats/board";
import { boardAggregates } from "./board.server";
import { Company } from "./db.server";
import { supervisorsOf } from "./recipients.server";
import { env } from "./env.server";
import { causeList } from "./guides.server";
import { sendMail } from "./mail.server";

const DIGEST_DAYS = 30;

/** Sends one company's digest to its supervisors (its admins if it has none); returns who got it. */
export async function sendDigest(companyId: number, now = new Date()): Promise<string[]> {
  const company = await Company.findByPk(companyId, { attributes: ["name", "timeZone"] });
  if (!company) return [];
  const to = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()) + 86_400_000);
  const from = new Date(to.getTime() - DIGEST_DAYS * 86_400_000);
  const board = buildBoard(await boardAggregates(companyId, { from, to }));
  const people = await supervisorsOf(companyId);
  const names = new Map(causeList().map((c) => [c.code, c.name]));
  const mail = digestMail(
    company.name,
    board,
    { from: from.toISOString().slice(0, 10), to: new Date(to.getTime() - 86_400_000).toISOString().slice(0, 10) },
    (c) => names.get(c) ?? c,
    env().APP_URL,
    company.timeZone,
  );
  await sendMail({ companyId, to: people.map((p) => p.email), ...mail });
  return people.map((p) => p.name);
}

export async function sendAllDigests(now = new Date()): Promise<{ company: string; sentTo: string[] }[]> {
  const companies = await Company.findAll({ attributes: ["id", "name"], order: [["id", "ASC"]] });
  const out = [];
  for (const c of companies) out.push({ company: c.name, sentTo: await sendDigest(c.id, now) });
  return out;
}
