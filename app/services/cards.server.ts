import { Op } from "sequelize";
import { startOfTodayIn } from "~/lib/format";
import type { DayCheck } from "~/lib/guides/kinds";
import type { Guide } from "~/lib/guides/schema";
import { dayFacts, type DayFacts } from "~/lib/walk/day-facts";
import type { Outcome } from "~/lib/vocabulary";
import { guideVersion } from "./case-detail.server";
import { Case, CaseEvent, GuideRecord, GuideVersion, User } from "./db.server";
import type { SessionUser } from "./guards.server";
import { ownedBy } from "./tenancy.server";

/** A rig card as its rig's pages list it. */
export interface CardDone {
  id: string;
  title: string;
  outcome: Outcome;
  gaps: number | null;
  openedAt: string;
  engineHours: number | null;
  by: string | null;
}

type WithVersion = Case & { guideVersion: GuideVersion & { guide: GuideRecord }; opener: User | null };
// The card's title and who walked it; a definition, when needed, comes from the settled-version cache.
const withTitle = [
  { model: GuideVersion, as: "guideVersion", attributes: ["id"], include: [{ model: GuideRecord, as: "guide", attributes: ["title"] }] },
  { model: User, as: "opener", attributes: ["name"] },
];

/** The start of today where the company works. */
export const startOfToday = (user: SessionUser, now = new Date()) => startOfTodayIn(user.timeZone, now);

/** The cards walked on a rig since a time (today, by default), newest first. */
export async function cardsOnRig(user: SessionUser, rigId: number, opts: { since?: Date; limit?: number } = {}): Promise<CardDone[]> {
  const rows = (await Case.findAll({
    where: ownedBy(user, { rigId, kind: "card", ...(opts.since ? { openedAt: { [Op.gte]: opts.since } } : {}) }),
    attributes: ["id", "outcome", "cardGaps", "openedAt", "engineHours"],
    include: withTitle,
    order: [["openedAt", "DESC"]],
    limit: opts.limit ?? 20,
  })) as WithVersion[];
  return rows.map((c) => ({
    id: c.id,
    title: c.guideVersion.guide.title,
    outcome: c.outcome,
    gaps: c.cardGaps,
    openedAt: c.openedAt.toISOString(),
    engineHours: c.engineHours,
    by: c.opener?.name ?? null,
  }));
}

/**
 * What today's cards on a rig say about the facts a guide asks again (lubricator charged, valves
 * free…), read only when the guide asks about any of them.
 */
export async function todaysFacts(user: SessionUser, rigId: number, guide: Guide, now = new Date()): Promise<DayFacts> {
  const asked = new Set(Object.values(guide.states).flatMap((s) => (s.meta.dayCheck ? [s.meta.dayCheck as DayCheck] : [])));
  if (!asked.size) return {};
  const cards = (await Case.findAll({
    where: ownedBy(user, { rigId, kind: "card", openedAt: { [Op.gte]: startOfToday(user, now), [Op.lte]: now } }),
    attributes: ["id", "guideVersionId"],
    include: withTitle,
  })) as WithVersion[];
  if (!cards.length) return {};
  const [events, definitions] = await Promise.all([
    CaseEvent.findAll({ where: { caseId: cards.map((c) => c.id) }, attributes: ["caseId", "stepId", "answer", "at"], order: [["seq", "ASC"]] }),
    Promise.all(cards.map(async (c) => (await guideVersion(c.guideVersionId)).definition)),
  ]);
  const facts = dayFacts(
    cards.map((c, i) => ({
      title: c.guideVersion.guide.title,
      definition: definitions[i],
      by: c.opener?.name ?? null,
      events: events.filter((e) => e.caseId === c.id).map((e) => ({ stepId: e.stepId, answer: e.answer, at: e.at.toISOString() })),
    })),
  );
  return Object.fromEntries(Object.entries(facts).filter(([k]) => asked.has(k as DayCheck)));
}
