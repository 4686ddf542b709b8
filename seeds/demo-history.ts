/**
 * Two seasons of invented work for the demo fleet, generated from a fixed seed so the board tells
 * the same story on every machine:
 *
 * - Rigs work on busy days in spring and fall, less in midsummer; Cedar Flats does a little winter
 *   work, Blue Mesa none (activity by month, invented). The second season is busier (×1.12).
 * - Each worked day is on a job: a rig stays on its job until the job's rig-days are used up,
 *   sometimes joining another rig's job; crews are planned with it and change over the seasons.
 * - Faults come at each rig's rate per engine hour (demo-fleet.ts: a few per 100 h, CF-03 clearly
 *   worse and losing prime through the same suction clamp, BM-01 foaming), more on a day without a
 *   complete pre-start, more on a site that is hard on rigs (demo-jobs.ts).
 * - Each job's loads come from its rig-days (a load's area = tank ÷ water per acre), so its progress
 *   is what was sprayed. Rig cards (demo-cards.ts) go with each worked day.
 */
import { randomUUID } from "node:crypto";
import type { CreationAttributes } from "sequelize";
import { simplePaths, type GuidePath } from "../app/lib/guides/graph";
import type { Guide } from "../app/lib/guides/schema";
import { guideKind } from "../app/lib/guides/kinds";
import { SQFT_PER_ACRE } from "../app/lib/field-math/units";
import { isoInZone } from "../app/lib/format";
import { Case, CaseEvent, Company, db, GuideRecord, GuideVersion, Job, JobDay, JobLoad, Rig, ServiceRecord, ServiceRule, User } from "../db/index";
import { hashPassword } from "../app/services/password.server";
import { rebuildBoardRollups } from "../app/services/board-rollups.server";
import { saveCard, type DemoCardSink } from "./demo-cards";
import { behaviourOf, type CompanySlug, type RigBehaviour } from "./demo-fleet";
import { SEASONAL_CREW, SIGN_IN_WEIGHTS, SITES, SPECS, type DemoSite } from "./demo-jobs";
import { DEMO_PASSWORD } from "./demo-people";
import { seededRandom } from "./random";

const DAY = 86_400_000;
const HOUR = 3_600_000;
const SEED = 20_261_203;

/** Share of a rig's usual work done on a day of each month (invented): spring and fall peaks, a midsummer lull. */
const BUSY: Record<CompanySlug, number[]> = {
  //              Jan   Feb   Mar   Apr   May   Jun   Jul   Aug   Sep   Oct   Nov   Dec
  "cedar-flats": [0.06, 0.06, 0.35, 0.8, 0.85, 0.6, 0.4, 0.45, 0.8, 0.8, 0.35, 0.06],
  "blue-mesa": [0, 0, 0, 0.55, 0.85, 0.7, 0.45, 0.5, 0.8, 0.6, 0, 0],
};
/** The second season is busier: the business grew (invented). */
const GROWTH = 1.12;
/** A day without a complete pre-start brings more faults, a complete one fewer (invented, so the board's care section has a pattern). */
const CARE_FACTOR = { complete: 0.8, missing: 1.5 };
/** On a day the lubricator was not charged, the chance the pump-shaft seal runs dry and leaks (invented). */
const DRY_SEAL_CHANCE = 0.1;

type Random = ReturnType<typeof seededRandom>;

/** The season a day belongs to: its calendar year. The history holds the last two seasons that have begun (mid-March). */
export function demoSeasons(now: Date): [number, number] {
  const y = now.getUTCFullYear();
  const begun = now.getTime() >= Date.UTC(y, 2, 15);
  return begun ? [y - 1, y] : [y - 2, y - 1];
}

interface SimJob {
  key: number;
  site: DemoSite;
  left: number;
  maxRigs: number;
  rigs: Set<number>;
  firstDay: number;
  lastDay: number;
  rigDays: number;
  sprayedSqFt: number;
}

export async function seedDemoHistory(now = new Date(), log: (line: string) => void = console.log): Promise<number> {
  const sequelize = db();
  if ((await Case.count()) > 0) return 0;
  const random = seededRandom(SEED);
  const { guides, cards } = await publishedLibrary();
  const slugs = [...guides.keys()];
  const [first] = demoSeasons(now);
  const historyStart = Date.UTC(first, 0, 1);
  const hash = await hashPassword(DEMO_PASSWORD);

  const sink: DemoCardSink = { cases: [], events: [], services: [] };
  const cases: CreationAttributes<Case>[] = [];
  const events: CreationAttributes<CaseEvent>[] = [];
  const loads: CreationAttributes<JobLoad>[] = [];
  const plan: { companyId: number; job: SimJob; day: string; rigId: number | null; userId: number | null }[] = [];
  const jobs: { companyId: number; job: SimJob }[] = [];
  let jobKey = 0;

  for (const company of await Company.findAll({ order: [["id", "ASC"]] })) {
    const slug = company.slug as CompanySlug;
    // The simulation stops before the company's today: today's plan is made below, from the work in hand.
    const todayDay = isoInZone(now, company.timeZone).slice(0, 10);
    const end = Date.parse(`${todayDay}T00:00:00Z`);
    const roster = await seasonalCrew(company.id, slug, first, end, hash);
    const rigs = await Rig.findAll({ where: { companyId: company.id }, order: [["code", "ASC"]] });
    const days: number[] = [];
    for (let t = historyStart; t < end; t += DAY) if (new Date(t).getUTCDay() !== 0) days.push(t);

    // Which days each rig works and how long, first, so its meter can run backwards from today's reading.
    const worked = new Map<number, Map<number, number>>();
    for (const rig of rigs) {
      const b = behaviourOf(rig.code)!;
      const map = new Map<number, number>();
      for (const day of days) {
        const d = new Date(day);
        const second = d.getUTCFullYear() > first;
        if (b.boughtInSecondSeason && (!second || d.getUTCMonth() < 2)) continue;
        if (random.next() < Math.min(0.95, BUSY[slug][d.getUTCMonth()] * b.use * (second ? GROWTH : 1)))
          map.set(day, (5.5 + rig.tankGal / 1500) * (0.7 + 0.6 * random.next()));
      }
      worked.set(rig.id, map);
    }
    const meter = new Map(
      rigs.map((rig) => {
        const total = [...worked.get(rig.id)!.values()].reduce((s, h) => s + h, 0);
        return [rig.id, Math.max(0, rig.engineHours - total)] as const;
      }),
    );
    const rules = new Map(
      await Promise.all(
        rigs.map(
          async (rig) =>
            [
              rig.id,
              (await ServiceRule.findAll({ where: { rigId: rig.id }, attributes: ["id", "task"] })).map((r) => ({ id: r.id, task: r.task ?? null })),
            ] as const,
        ),
      ),
    );

    const open: SimJob[] = [];
    const current = new Map<number, SimJob>();
    // A rig's crew stays with it while it stays on a job and they are free; a new job or a day off brings a new pick.
    const crewOf = new Map<number, { job: SimJob; ids: number[] }>();
    const sites = new Map<number, DemoSite[]>();
    const rounds = new Map<number, number>();
    const newJob = (day: number, rig: Rig): SimJob => {
      // Each season works through the company's sites in its own order; a site met again that season is
      // its next area (a subdivision's next lots, the road's next miles). The hard site is met once.
      const season = new Date(day).getUTCFullYear();
      if (!sites.get(season)?.length) {
        rounds.set(season, (rounds.get(season) ?? 0) + 1);
        sites.set(season, shuffled(rounds.get(season)! > 1 ? SITES[slug].filter((x) => !x.hard) : SITES[slug], random));
      }
      const round = rounds.get(season)!;
      const next = sites.get(season)!.shift()!;
      const site = round > 1 ? { ...next, name: `${next.name}, area ${round}` } : next;
      const big = rig.tankGal >= 1500;
      const job: SimJob = {
        key: ++jobKey,
        site,
        left: site.hard ? random.int(28, 40) : random.int(big ? 8 : 4, big ? 30 : 16),
        maxRigs: site.hard ? 3 : random.int(1, 3),
        rigs: new Set(),
        firstDay: day,
        lastDay: day,
        rigDays: 0,
        sprayedSqFt: 0,
      };
      open.push(job);
      jobs.push({ companyId: company.id, job });
      return job;
    };

    for (const day of days) {
      const busyPeople = new Set<number>();
      for (const rig of rigs) {
        const hours = worked.get(rig.id)!.get(day);
        if (hours === undefined) continue;
        const b = behaviourOf(rig.code)!;
        let job = current.get(rig.id);
        if (!job || job.left <= 0) {
          const joinable = open.filter((j) => j.left > 0 && day - j.lastDay <= 7 * DAY && j.rigs.size < j.maxRigs && !j.rigs.has(rig.id));
          job = joinable.length && random.next() < 0.55 ? random.pick(joinable) : newJob(day, rig);
          current.set(rig.id, job);
        }
        job.left -= 1;
        job.rigDays += 1;
        job.rigs.add(rig.id);
        job.lastDay = day;
        const ymd = new Date(day).toISOString().slice(0, 10);
        plan.push({ companyId: company.id, job, day: ymd, rigId: rig.id, userId: null });
        // Usually two people on the rig (one sprays, one tends the tank and hose), from who was on the books then.
        const onBooks = roster(day);
        const kept = crewOf.get(rig.id);
        const crew =
          kept && kept.job === job && kept.ids.every((id) => !busyPeople.has(id) && onBooks.some(([x]) => x === id))
            ? kept.ids
            : pickCrew(
                onBooks.filter(([id]) => !busyPeople.has(id)),
                random,
                random.next() < 0.75 ? 2 : 1,
              );
        crewOf.set(rig.id, { job, ids: crew });
        for (const id of crew) {
          busyPeople.add(id);
          plan.push({ companyId: company.id, job, day: ymd, rigId: null, userId: id });
        }
        const lead = crew[0] ?? random.weighted(roster(day));

        const before = meter.get(rig.id)!;
        const after = before + hours;
        meter.set(rig.id, after);
        const reading = (h: number) => (rig.hasHourMeter ? Math.round(h * 10) / 10 : null);
        const at = { companyId: company.id, rigId: rig.id, openedBy: lead, rules: rules.get(rig.id)!, jobId: job.key };
        const care = dayOfCare(sink, random, cards, b, day, at, reading(before));

        // Faults at the rig's rate for the hours run, by care and site.
        const lambda = (b.per100h / 100) * hours * (care.complete ? CARE_FACTOR.complete : CARE_FACTOR.missing) * (job.site.hard?.factor ?? 1);
        const picks: [string, string | null][] = Array.from({ length: poisson(lambda, random.next) }, () =>
          job.site.hard && random.next() < 0.6
            ? random.pick(job.site.hard.ends)
            : [random.next() < 0.7 ? random.weighted(b.favourites) : random.pick(slugs), null],
        );
        if (!care.lubed && random.next() < DRY_SEAL_CHANCE) picks.push(["leaks", random.next() < 0.75 ? "fixed-pump-shaft" : "handoff-lube"]);
        for (const [guideSlug, forced] of picks) {
          const guide = guides.get(guideSlug)!;
          const repeat = forced ? ([guideSlug, forced, 1] as [string, string, number]) : b.repeatEnd?.[0] === guideSlug ? b.repeatEnd : undefined;
          const t = day + (14 + random.int(0, 8)) * HOUR + random.int(0, 59) * 60_000;
          const hoursThen = reading(before + ((t - day - 14 * HOUR) / (9 * HOUR)) * hours);
          const walked = walkFault(guide, choosePath(guide.paths, guide.definition, random, repeat), random, t, day < end - 7 * DAY);
          cases.push({
            ...walked.case,
            companyId: company.id,
            rigId: rig.id,
            openedBy: random.next() < 0.8 ? lead : random.weighted(roster(day)),
            engineHours: hoursThen,
            jobId: job.key,
          });
          events.push(...walked.events);
        }

        // The loads sprayed that day: tank ÷ water per acre each; fill, mix and spray take longer on a bigger tank (invented cycle).
        const spec = SPECS[job.site.spec];
        const perAcre = spec.waterGalPerAcre ?? (spec.materials.filter((m) => m.kind === "fiber").reduce((s, m) => s + m.lbPerAcre, 0) / 50) * 100;
        const n = Math.max(1, Math.round((hours * 60) / (25 + rig.tankGal / 60)));
        for (let i = 0; i < n; i++) {
          const areaSqFt = Math.round((rig.tankGal / perAcre) * SQFT_PER_ACRE * (i === n - 1 ? 0.4 + 0.6 * random.next() : 1));
          job.sprayedSqFt += areaSqFt;
          loads.push({
            id: randomUUID(),
            companyId: company.id,
            jobId: job.key,
            rigId: rig.id,
            sprayedBy: lead,
            sprayedAt: new Date(day + 14.5 * HOUR + ((i + 1) / (n + 1)) * hours * HOUR),
            areaSqFt,
            waterGal: rig.tankGal,
          });
        }
        shutDownCard(sink, random, cards, b, day, at, reading(after));
      }
    }
    // The meter as the last card or fix read it: the rig page, service and cards agree.
    for (const rig of rigs) if (rig.hasHourMeter) await rig.update({ engineHours: Math.round(meter.get(rig.id)! * 10) / 10 });
    await planToday(company.id, slug, todayDay, rigs, jobs, plan, current, end);
  }

  // Jobs first (cases, loads and plans name them), then everything else in bulk.
  const keyToId = new Map<number, number>();
  await sequelize.transaction(async (transaction) => {
    for (const { companyId, job } of jobs) {
      const spec = SPECS[job.site.spec];
      const sprayedAcres = job.sprayedSqFt / SQFT_PER_ACRE;
      // A finished job's area is what was sprayed; one under way has the rest of its rig-days to go.
      const still = job.left > 0 && job.lastDay >= historyEndOf(now) - 10 * DAY;
      // The job planned fresh today has sprayed nothing yet: its area is its rig-days' worth.
      const rest = still ? (job.rigDays ? job.left * (sprayedAcres / job.rigDays) : job.left * 1.5) + 1 : 0;
      const created = await Job.create(
        {
          companyId,
          name: job.site.name,
          customer: job.site.customer,
          address: job.site.address,
          latitude: null,
          longitude: null,
          elevationFt: job.site.elevationFt,
          areaAcres: Math.max(0.1, Math.ceil(((sprayedAcres + rest) / spec.passes) * 10) / 10),
          passes: spec.passes,
          waterGalPerAcre: spec.waterGalPerAcre,
          materials: spec.materials,
          startsOn: new Date(job.firstDay).toISOString().slice(0, 10),
          endsOn: still ? null : new Date(job.lastDay).toISOString().slice(0, 10),
          closedAt: still ? null : new Date(job.lastDay + DAY + 17 * HOUR),
          notes: job.site.hard ? "Long hose runs and hard going: check the rig over at the end of each day." : null,
        },
        { transaction },
      );
      keyToId.set(job.key, created.id);
    }
    const idOf = (key: number | null | undefined) => (key == null ? null : keyToId.get(key)!);
    await JobDay.bulkCreate(
      plan.map((p) => ({ companyId: p.companyId, jobId: keyToId.get(p.job.key)!, day: p.day, rigId: p.rigId, userId: p.userId })),
      { transaction },
    );
    for (let i = 0; i < loads.length; i += 2000)
      await JobLoad.bulkCreate(
        loads.slice(i, i + 2000).map((l) => ({ ...l, jobId: idOf(l.jobId)! })),
        { transaction },
      );
    const allCases = [...cases, ...sink.cases].map((c) => ({ ...c, jobId: idOf(c.jobId) }));
    const allEvents = [...events, ...sink.events];
    for (let i = 0; i < allCases.length; i += 1000) await Case.bulkCreate(allCases.slice(i, i + 1000), { transaction });
    for (let i = 0; i < allEvents.length; i += 2000) await CaseEvent.bulkCreate(allEvents.slice(i, i + 2000), { transaction });
    // In time order: the service page reads a rule's latest record.
    const services = [...sink.services].sort((a, b) => +a.doneAt - +b.doneAt);
    for (let i = 0; i < services.length; i += 2000) await ServiceRecord.bulkCreate(services.slice(i, i + 2000), { transaction });
  });
  // The demo's service rules were kept all along, not set up today.
  await sequelize.query("UPDATE service_rules SET created_at = LEAST(created_at, :start)", { replacements: { start: new Date(historyStart - 30 * DAY) } });
  // Bulk inserts skip the per-case upkeep of the board's rollups.
  await rebuildBoardRollups(sequelize);
  log(
    `Seeded demo history: ${cases.length} fixes, ${sink.cases.length} rig cards, ${jobs.length} jobs, ${loads.length} loads, ${sink.services.length} services recorded by cards over two seasons.`,
  );
  return cases.length;
}

const historyEndOf = (now: Date) => Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());

/** The published built-in guides (with their paths) and rig cards. */
async function publishedLibrary() {
  const records = await GuideRecord.findAll({ where: { companyId: null }, attributes: ["id", "slug", "publishedVersion"] });
  const versions = await GuideVersion.findAll({ where: { status: "published" }, attributes: ["id", "guideId", "definition"] });
  const published = records.map((r) => ({ slug: r.slug, version: versions.find((x) => x.guideId === r.id)! }));
  const guides = new Map(
    published
      .filter((g) => guideKind(g.version.definition) === "guide")
      .map(({ slug, version: v }) => [slug, { versionId: v.id, definition: v.definition, paths: simplePaths(v.definition) }] as const),
  );
  const cards = new Map(
    published
      .filter((g) => guideKind(g.version.definition) === "card")
      .map(({ slug, version: v }) => [slug, { versionId: v.id, definition: v.definition }] as const),
  );
  return { guides, cards };
}
type Cards = Awaited<ReturnType<typeof publishedLibrary>>["cards"];
type CardAt = Omit<Parameters<typeof saveCard>[3], "start" | "hours">;

/**
 * The seasonal crew as sign-ins (those who left have their sign-in turned off), and who was on the
 * books on a day: [person, share of the work].
 */
async function seasonalCrew(companyId: number, slug: CompanySlug, first: number, end: number, hash: string) {
  const monthStart = (offset: number) => Date.UTC(first, offset, 1);
  const seasonal = SEASONAL_CREW.filter((p) => p.company === slug && monthStart(p.fromMonth) < end);
  const made = await User.bulkCreate(
    seasonal.map((p) => ({
      companyId,
      email: p.email,
      name: p.name,
      role: "crew" as const,
      passwordHash: hash,
      accessRemovedAt: p.toMonth !== null && monthStart(p.toMonth + 1) < end ? new Date(monthStart(p.toMonth + 1)) : null,
      language: p.language ?? null,
    })),
  );
  const signIns = await User.findAll({ where: { companyId }, attributes: ["id", "email"] });
  const always = signIns.filter((u) => SIGN_IN_WEIGHTS[u.email]).map((u) => [u.id, SIGN_IN_WEIGHTS[u.email]] as const);
  return (day: number): (readonly [number, number])[] => [
    ...always,
    ...seasonal
      .map((p, i) => [made[i].id, p] as const)
      .filter(([, p]) => day >= monthStart(p.fromMonth) && (p.toMonth === null || day < monthStart(p.toMonth + 1)))
      .map(([id, p]) => [id, p.weight] as const),
  ];
}

/** Up to `n` different people, by share of the work. */
function pickCrew(pool: (readonly [number, number])[], random: Random, n: number): number[] {
  const picked: number[] = [];
  let left = [...pool];
  while (picked.length < n && left.length) {
    const id = random.weighted(left);
    picked.push(id);
    left = left.filter(([x]) => x !== id);
  }
  return picked;
}

/** The morning's cards on a worked day: the Monday service and the pre-start, by the rig's habits. */
function dayOfCare(sink: DemoCardSink, random: Random, cards: Cards, b: RigBehaviour, day: number, at: CardAt, hours: number | null) {
  if (new Date(day).getUTCDay() === 1 && random.next() < b.care.weekly)
    saveCard(sink, random, cards.get("weekly-service")!, { ...at, start: day + 12.5 * HOUR, hours });
  if (random.next() >= b.care.preStart) return { complete: false, lubed: false };
  const skipGrease = random.next() < b.care.greaseSkip;
  const walked = saveCard(sink, random, cards.get("pre-start")!, { ...at, start: day + (13 + random.next() * 0.5) * HOUR, hours }, (id) =>
    id === "grease" && skipGrease ? "CANT" : undefined,
  );
  return { complete: !skipGrease, lubed: walked.answers.some((a) => a.stepId === "lubricator" && a.answer === "DONE") };
}

/** The evening's shut-down and clean-out card (frost items answered yes on cold months' nights now and then). */
function shutDownCard(sink: DemoCardSink, random: Random, cards: Cards, b: RigBehaviour, day: number, at: CardAt, hours: number | null) {
  if (random.next() >= b.care.shutDown) return;
  const cold = [0, 1, 2, 3, 9, 10, 11].includes(new Date(day).getUTCMonth()) && random.next() < 0.4;
  saveCard(sink, random, cards.get("shut-down-clean-out")!, { ...at, start: day + (23 + random.next() * 0.5) * HOUR, hours }, (id) =>
    id === "frost" ? (cold ? "YES" : "NO") : undefined,
  );
}

/** One fault walked along a path: the case (without its rig and people) and its answers. */
function walkFault(guide: { versionId: number; definition: Guide }, path: GuidePath, random: Random, start: number, dealtWith: boolean) {
  const endKind = guide.definition.states[path.steps[path.steps.length - 1]].meta.kind;
  const abandoned = random.next() < 0.04;
  const id = randomUUID();
  let t = start;
  let ack: Date | null = null;
  const steps = abandoned ? path.steps.slice(0, Math.max(1, Math.floor(path.steps.length / 2))) : path.steps;
  const events: CreationAttributes<CaseEvent>[] = [];
  steps.slice(0, -1).forEach((stepId, i) => {
    const minutes = guide.definition.states[stepId].meta.minutes ?? 1;
    t += Math.max(20_000, minutes * 60_000 * (0.5 + random.next()));
    if (path.answers[i] === "ACK" && !ack) ack = new Date(t);
    events.push({ id: randomUUID(), caseId: id, seq: i + 1, stepId, answer: path.answers[i] as "YES", at: new Date(t), note: null });
  });
  const closedAt = new Date(t + (endKind === "handoff" && !abandoned ? 20 : 2) * 60_000 * (0.5 + random.next()));
  const finalStep = abandoned ? null : path.steps[path.steps.length - 1];
  return {
    events,
    case: {
      id,
      guideVersionId: guide.versionId,
      openedAt: new Date(start),
      closedAt,
      outcome: abandoned ? ("abandoned" as const) : (endKind as "fixed" | "handoff"),
      finalStep,
      causeCode: finalStep ? (guide.definition.states[finalStep].meta.cause ?? null) : null,
      safetyAckAt: ack,
      note: null,
      // Supervisors have dealt with all but the last week's hand-offs.
      handoffResolvedAt: endKind === "handoff" && !abandoned && dealtWith ? new Date(closedAt.getTime() + DAY) : null,
    },
  };
}

/**
 * Today and the coming working days: the rigs still on a job carry on with it, with the crew who
 * were on it; in a quiet month a rig with nothing in hand stays in the yard. Cedar Flats' first rig
 * and first sign-in always have a job today (the demo's crew home shows it).
 */
async function planToday(
  companyId: number,
  slug: CompanySlug,
  today: string,
  rigs: Rig[],
  jobs: { companyId: number; job: SimJob }[],
  plan: { companyId: number; job: SimJob; day: string; rigId: number | null; userId: number | null }[],
  current: Map<number, SimJob>,
  end: number,
) {
  const days: string[] = [];
  for (let t = end; days.length < 5; t += DAY) if (new Date(t).getUTCDay() !== 0) days.push(new Date(t).toISOString().slice(0, 10));
  const lastDay = new Map<SimJob, string>();
  for (const p of plan) if (p.rigId === null && p.userId !== null) lastDay.set(p.job, p.day);
  const busy = new Set<number>();
  for (const rig of rigs) {
    const job = current.get(rig.id);
    if (!job || job.left <= 0 || end - job.lastDay > 10 * DAY) continue;
    const crew = plan.filter((p) => p.job === job && p.userId !== null && p.day === lastDay.get(job) && !busy.has(p.userId)).map((p) => p.userId!);
    for (const day of days) {
      plan.push({ companyId, job, day, rigId: rig.id, userId: null });
      for (const id of crew) plan.push({ companyId, job, day, rigId: null, userId: id });
    }
    crew.forEach((id) => busy.add(id));
  }
  if (slug !== "cedar-flats") return;
  // The demo's crew sign-in and CF-07 on a winter erosion-control job, if the history left them idle.
  const dana = (await User.findOne({ where: { companyId, email: "dana@cedarflats.example" }, attributes: ["id"] }))?.id;
  if (!dana) return;
  const rig = rigs.find((r) => r.code === "CF-07")!;
  if (plan.some((p) => p.day === today && p.userId === dana)) return;
  // CF-07 carries on with a job: Dana joins it. Otherwise a short winter erosion-control job for the two.
  const carried = plan.find((p) => p.day === today && p.rigId === rig.id)?.job;
  const job: SimJob = carried ?? {
    key: Math.max(0, ...jobs.map((j) => j.job.key)) + 1,
    site: { name: "Millrace Creek culvert", customer: "Larch County Roads", address: "Millrace Rd at the creek crossing", elevationFt: 3010, spec: "mulch" },
    left: 6,
    maxRigs: 1,
    rigs: new Set([rig.id]),
    firstDay: end,
    lastDay: end,
    rigDays: 0,
    sprayedSqFt: 0,
  };
  if (!carried) jobs.push({ companyId, job });
  for (const day of days) {
    if (!carried) plan.push({ companyId, job, day, rigId: rig.id, userId: null });
    plan.push({ companyId, job, day, rigId: null, userId: dana });
  }
}

function shuffled<T>(xs: readonly T[], random: Random): T[] {
  const a = [...xs];
  for (let i = a.length - 1; i > 0; i--) {
    const j = random.int(0, i);
    [a[i], a[j]] = [a[j], a[i]];
  }
  return a;
}

/** Early ends are likelier (the guides put the likely causes first); hand-offs are the minority. */
function choosePath(paths: GuidePath[], guide: Guide, random: Random, repeat?: [string, string, number]): GuidePath {
  if (repeat && random.next() < repeat[2]) {
    const hits = paths.filter((p) => p.steps[p.steps.length - 1] === repeat[1]);
    if (hits.length) return random.pick(hits);
  }
  return random.weighted(
    paths.map((p) => {
      const kind = guide.states[p.steps[p.steps.length - 1]].meta.kind;
      // A minority of faults go to the shop (invented; the demo test holds it between 5 and 25 %).
      return [p, (kind === "handoff" ? 0.05 : 1) / p.steps.length ** 1.5] as const;
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
