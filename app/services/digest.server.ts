import { digestMail } from "~/lib/mail/digest";
import { buildBoard } from "~/lib/stats/board";
import { boardAggregates } from "./board.server";
import { Company } from "./db.server";
import { env } from "./env.server";
import { causeList } from "./guides.server";
import { deliver, supervisorsOf } from "./mail.server";

const DIGEST_DAYS = 30;

export interface DigestResult {
  /** Who the mail was addressed to. */
  sentTo: string[];
  /** The mail server refused it: nobody got it. */
  mailFailed: boolean;
}

/** Sends one company's digest to its supervisors (its admins if it has none); says who got it, or that the mail failed. */
export async function sendDigest(companyId: number, now = new Date()): Promise<DigestResult> {
  const company = await Company.findByPk(companyId, { attributes: ["name", "timeZone"] });
  if (!company) return { sentTo: [], mailFailed: false };
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
  const sent = await deliver({ companyId, to: people.map((p) => p.email), ...mail }, `Digest for company ${companyId}`);
  return sent ? { sentTo: people.map((p) => p.name), mailFailed: false } : { sentTo: [], mailFailed: true };
}

/** Every company's digest; one refused mail does not keep the next company's from going. */
export async function sendAllDigests(now = new Date()): Promise<({ company: string } & DigestResult)[]> {
  const companies = await Company.findAll({ attributes: ["id", "name"], order: [["id", "ASC"]] });
  const out = [];
  for (const c of companies) out.push({ company: c.name, ...(await sendDigest(c.id, now)) });
  return out;
}
