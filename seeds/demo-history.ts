/**
 * A year of invented walk-throughs for the demo rigs, generated from a fixed seed so the
 * fault board tells the same story on every machine: CF-03 is old and fails far more often
 * (and keeps losing prime through the same suction clamp), CF-11 is new and rarely fails,
 * BM-01 runs hot on foam in the spring. Engine hours climb through the spraying season.
 * Rig cards (demo-cards.ts) go with it: a day without a complete pre-start brings more faults,
 * and a day the lubricator was not charged can end with a dry pump-shaft seal leaking.
 */
import { randomUUID } from "node:crypto";
import type { CreationAttributes } from "sequelize";
import { simplePaths, type GuidePath } from "../app/lib/guides/graph";
import type { Guide } from "../app/lib/guides/schema";
import { Case, CaseEvent, Company, db, GuideRecord, GuideVersion, Rig, ServiceRecord, ServiceRule, User } from "../db/index";
import { guideKind } from "../app/lib/guides/kinds";
import { CARE_HABITS, saveCard, type DemoCardSink } from "./demo-cards";
import { rebuildBoardRollups } from "../app/services/board-rollups.server";
import { seededRandom } from "./random";

const DAY = 86_400_000;
const SEED = 20_261_202;

/** How each rig behaves: fault chances per working day, and guides it tends to need. */
const PROFILES: Record<string, { perDay: number; hoursPerDay: number; favourites: [string, number][]; repeatEnd?: [string, string, number] }> = {
  "CF-03": {
    perDay: 3.8,
    hoursPerDay: 6.5,
    favourites: [
      ["lost-prime", 5],
      ["leaks", 3],
      ["plugging", 2],
    ],
    repeatEnd: ["lost-prime", "fixed-air-leak", 0.55],
  },
  "CF-07": {
    perDay: 2.2,
    hoursPerDay: 7,
    favourites: [
      ["short-throw", 3],
      ["plugging", 2],
      ["slurry-too-thick", 2],
    ],
  },
  "CF-11": {
    perDay: 1.0,
    hoursPerDay: 7.5,
    favourites: [
      ["foaming", 2],
      ["short-throw", 2],
    ],
  },
  "BM-01": {
    perDay: 2.6,
    hoursPerDay: 6,
    favourites: [
      ["foaming", 4],
      ["agitator-stall", 2],
      ["lost-prime", 2],
    ],
  },
  "BM-02": {
    perDay: 1.6,
    hoursPerDay: 5,
    favourites: [
      ["vibration", 3],
      ["leaks", 2],
    ],
  },
};

const OPENERS: Record<string, [string, number][]> = {
  "cedar-flats": [
    ["dana@cedarflats.example", 8],
    ["ravi@cedarflats.example", 3],
    ["mo@cedarflats.example", 1],
  ],
  "blue-mesa": [
    ["sam@bluemesa.example", 7],
    ["li@bluemesa.example", 2],
  ],
};

/** Spraying season: mid-March to mid-November, Monday to Saturday. */
const isWorkDay = (d: Date) => {
  const day = d.getUTCDay();
  const doy = Math.floor((Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()) - Date.UTC(d.getUTCFullYear(), 0, 1)) / DAY);
  return day !== 0 && doy >= 74 && doy <= 318;
};

export async function seedDemoHistory(now = new Date(), log: (line: string) => void = console.log): Promise<number> {
  const sequelize = db();
  if ((await Case.count()) > 0) return 0;
  const random = seededRandom(SEED);
  const records = await GuideRecord.findAll({ where: { companyId: null }, attributes: ["id", "slug", "publishedVersion"] });
  const versions = await GuideVersion.findAll({ where: { status: "published" }, attributes: ["id", "guideId", "definition"] });
  const published = records.map((r) => ({ slug: r.slug, version: versions.find((x) => x.guideId === r.id)! }));
  const guides = new Map(
    published
      .filter((g) => guideKind(g.version.definition) === "guide")
      .map(({ slug, version: v }) => [slug, { versionId: v.id, definition: v.definition, paths: simplePaths(v.definition) }] as const),
  );
  const cardsBy = new Map(
    published
      .filter((g) => guideKind(g.version.definition) === "card")
      .map(({ slug, version: v }) => [slug, { versionId: v.id, definition: v.definition }] as const),
  );
  const slugs = [...guides.keys()];
  const sink: DemoCardSink = { cases: [], events: [], services: [] };
  const end = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());
  const start = end - 365 * DAY;

  const cases: CreationAttributes<Case>[] = [];
  const events: CreationAttributes<CaseEvent>[] = [];
  for (const company of await Company.findAll()) {
    const users = await User.findAll({ where: { companyId: company.id }, attributes: ["id", "email"] });
    const openers = OPENERS[company.slug].map(([email, w]) => [users.find((u) => u.email === email)!.id, w] as const);
    for (const rig of await Rig.findAll({ where: { companyId: company.id } })) {
      const profile = PROFILES[rig.code];
      if (!profile) continue;
      const workDays: number[] = [];
      for (let t = start; t < end; t += DAY) if (isWorkDay(new Date(t))) workDays.push(t);
      // Hours run backwards from today's meter, so the last case matches the rig page.
      let hours = Math.max(0, rig.engineHours - workDays.length * profile.hoursPerDay);
      const habits = CARE_HABITS[rig.code];
      const rules = (await ServiceRule.findAll({ where: { rigId: rig.id }, attributes: ["id", "task"] })).map((r) => ({ id: r.id, task: r.task ?? null }));
      const meter = (h: number) => (rig.hasHourMeter ? Math.round(h * 10) / 10 : null);
      for (const day of workDays) {
        const before = hours;
        hours += profile.hoursPerDay * (0.7 + 0.6 * random.next());
        const crew = random.weighted(openers);
        const at = { companyId: company.id, rigId: rig.id, openedBy: crew, rules };
        if (new Date(day).getUTCDay() === 1 && random.next() < habits.weekly)
          saveCard(sink, random, cardsBy.get("weekly-service")!, { ...at, start: day + 12.5 * 3_600_000, hours: meter(before) });
        let complete = false;
        let lubed = false;
        if (random.next() < habits.preStart) {
          const skipGrease = random.next() < habits.greaseSkip;
          const walked = saveCard(
            sink,
            random,
            cardsBy.get("pre-start")!,
            { ...at, start: day + (13 + random.next() * 0.5) * 3_600_000, hours: meter(before) },
            (id) => (id === "grease" && skipGrease ? "CANT" : undefined),
          );
          complete = !skipGrease;
          lubed = walked.answers.some((a) => a.stepId === "lubricator" && a.answer === "DONE");
        }
        // A day with no complete pre-start brings more faults; an uncharged lubricator, a dry shaft seal (invented rates).
        const n = poisson(profile.perDay * (0.5 + random.next()) * (complete ? 0.8 : 1.5), random.next);
        const picks: (string | [string, string])[] = Array.from({ length: n }, () =>
          random.next() < 0.7 ? random.weighted(profile.favourites) : random.pick(slugs),
        );
        if (!lubed && random.next() < 0.3) picks.push(["leaks", random.next() < 0.75 ? "fixed-pump-shaft" : "handoff-lube"]);
        for (const pick of picks) {
          const [slug, forced] = typeof pick === "string" ? [pick, null] : pick;
          const guide = guides.get(slug)!;
          const path = forced
            ? choosePath(guide.paths, guide.definition, random, [slug, forced, 1])
            : choosePath(guide.paths, guide.definition, random, profile.repeatEnd?.[0] === slug ? profile.repeatEnd : undefined);
          const endKind = guide.definition.states[path.steps[path.steps.length - 1]].meta.kind;
          const abandoned = random.next() < 0.04;
          const id = randomUUID();
          let t = day + (14 + random.int(0, 8)) * 3_600_000 + random.int(0, 59) * 60_000;
          const openedAt = new Date(t);
          let ack: Date | null = null;
          const steps = abandoned ? path.steps.slice(0, Math.max(1, Math.floor(path.steps.length / 2))) : path.steps;
          steps.slice(0, -1).forEach((stepId, i) => {
            const minutes = guide.definition.states[stepId].meta.minutes ?? 1;
            t += Math.max(20_000, minutes * 60_000 * (0.5 + random.next()));
            if (path.answers[i] === "ACK" && !ack) ack = new Date(t);
            events.push({ id: randomUUID(), caseId: id, seq: i + 1, stepId, answer: path.answers[i] as "YES", at: new Date(t), note: null });
          });
          const closedAt = new Date(t + (endKind === "handoff" && !abandoned ? 20 : 2) * 60_000 * (0.5 + random.next()));
          const finalStep = abandoned ? null : path.steps[path.steps.length - 1];
          cases.push({
            id,
            companyId: company.id,
            rigId: rig.id,
            guideVersionId: guide.versionId,
            openedBy: random.weighted(openers),
            openedAt,
            closedAt,
            engineHours: rig.hasHourMeter ? Math.round(hours * 10) / 10 : null,
            outcome: abandoned ? "abandoned" : (endKind as "fixed" | "handoff"),
            finalStep,
            causeCode: finalStep ? (guide.definition.states[finalStep].meta.cause ?? null) : null,
            safetyAckAt: ack,
            note: null,
            // Supervisors have dealt with all but the last week's hand-offs.
            handoffResolvedAt: endKind === "handoff" && !abandoned && end - day > 7 * DAY ? new Date(closedAt.getTime() + 86_400_000) : null,
          });
        }
        if (random.next() < habits.shutDown) {
          const cold = [2, 3, 9, 10].includes(new Date(day).getUTCMonth()) && random.next() < 0.4;
          saveCard(
            sink,
            random,
            cardsBy.get("shut-down-clean-out")!,
            { ...at, start: day + (23 + random.next() * 0.5) * 3_600_000, hours: meter(hours) },
            (id) => (id === "frost" ? (cold ? "YES" : "NO") : undefined),
          );
        }
      }
      // The meter as the last card or fix read it: the rig page, service and cards agree.
      if (rig.hasHourMeter) await rig.update({ engineHours: Math.round(hours * 10) / 10 });
    }
  }
  const allCases = [...cases, ...sink.cases];
  const allEvents = [...events, ...sink.events];
  await sequelize.transaction(async (transaction) => {
    for (let i = 0; i < allCases.length; i += 1000) await Case.bulkCreate(allCases.slice(i, i + 1000), { transaction });
    for (let i = 0; i < allEvents.length; i += 2000) await CaseEvent.bulkCreate(allEvents.slice(i, i + 2000), { transaction });
    // In time order: the service page reads a rule's latest record.
    const services = [...sink.services].sort((a, b) => +a.doneAt - +b.doneAt);
    for (let i = 0; i < services.length; i += 2000) await ServiceRecord.bulkCreate(services.slice(i, i + 2000), { transaction });
  });
  // The demo's service rules were kept all year, not set up today.
  await sequelize.query("UPDATE service_rules SET created_at = LEAST(created_at, :start)", { replacements: { start: new Date(start - 30 * DAY) } });
  // Bulk inserts skip the per-case upkeep of the board's rollups.
  await rebuildBoardRollups(sequelize);
  log(
    `Seeded demo history: ${cases.length} cases, ${sink.cases.length} rig cards, ${sink.services.length} services recorded by cards, ${events.length + sink.events.length} answers over a year.`,
  );
  return cases.length;
}

/** Early ends are likelier (the guides put the likely causes first); hand-offs are the minority. */
function choosePath(paths: GuidePath[], guide: Guide, random: ReturnType<typeof seededRandom>, repeat?: [string, string, number]): GuidePath {
  if (repeat && random.next() < repeat[2]) {
    const hits = paths.filter((p) => p.steps[p.steps.length - 1] === repeat[1]);
    if (hits.length) return random.pick(hits);
  }
  return random.weighted(
    paths.map((p) => {
      const kind = guide.states[p.steps[p.steps.length - 1]].meta.kind;
      return [p, (kind === "handoff" ? 0.35 : 1) / p.steps.length ** 1.5] as const;
    }),
  );
}

/** Knuth's method: the number of faults on one working day. */
function poisson(lambda: number, next: () => number): number {
  const limit = Math.exp(-lambda);
  let k = 0;
  for (let p = next(); p > limit; p *= next()) k++;
  return k;
}
