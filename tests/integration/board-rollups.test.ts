import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { changeCase } from "~/services/board-rollups.server";
import { Case, Company, db, GuideRecord, GuideVersion, Rig, User } from "../../db/index";
import type { BoardAggregates } from "~/lib/stats/board";
import { findRepeats, summariseChain } from "~/lib/stats/repeats";
import { boardAggregates, jobBoardRows } from "~/services/board.server";
import { Op } from "sequelize";
import { closeCase } from "~/services/cases.server";
import type { SessionUser } from "~/services/guards.server";
import { seededRandom } from "../../seeds/random";
import { rebuildRollups, resetDatabase } from "../helpers/db";
import { caseRow } from "../helpers/cases";
import { makeJob } from "../helpers/jobs";

/*
 * The board reads rollups kept as cases open and close. Two checks keep them honest:
 * the upkeep after each close leaves exactly the rows a full rebuild makes, in any order
 * of closing; and the board read from them equals the same figures worked out here in
 * plain code from the cases themselves, for windows that start and end mid-month.
 */

const DAY = 86_400_000;
const start = Date.UTC(2026, 0, 1);
const sequelize = db();
let cedar: Company;
let crew: SessionUser[];
const opened: { id: string; at: Date; rigId: number }[] = [];
/** Two jobs the fixture's cases fall on by day (a third of days on neither). */
let jobIds: number[] = [];
const jobOfDay = (at: Date) => [...jobIds, null][Math.floor(at.getTime() / DAY) % 3] ?? null;

const snapshot = async () => {
  const out: Record<string, unknown[]> = {};
  for (const table of ["board_rig_days", "board_mix", "board_chains", "board_job_mix"]) {
    const [rows] = await sequelize.query(`SELECT * FROM ${table} ORDER BY 1, 2, 3, 4, 5, 6`);
    out[table] = rows;
  }
  const [marks] = await sequelize.query("SELECT id, repeat_chain_at FROM cases ORDER BY id");
  out.marks = marks;
  return out;
};

beforeAll(async () => {
  await resetDatabase();
  cedar = (await Company.findOne({ where: { slug: "cedar-flats" } }))!;
  const people = await User.findAll({ where: { companyId: cedar.id, role: ["crew", "supervisor"] }, order: [["id", "ASC"]] });
  crew = people.map((u) => ({
    id: u.id,
    name: u.name,
    email: u.email,
    role: u.role,
    companyId: cedar.id,
    companyName: cedar.name,
    timeZone: "America/Denver",
  }));
  const rigs = await Rig.findAll({ where: { companyId: cedar.id }, order: [["code", "ASC"]] });
  const version = (await GuideVersion.findOne({ include: [{ model: GuideRecord, as: "guide", where: { slug: "lost-prime" } }] }))!;
  jobIds = [(await makeJob(cedar.id, { name: "North" })).id, (await makeJob(cedar.id, { name: "South" })).id];
  const random = seededRandom(2026);
  // 120 cases over ten months on two rigs: dense spells (chains) and quiet gaps (new chains).
  for (let i = 0; i < 120; i++) {
    const day = random.next() < 0.5 ? random.int(0, 90) : random.int(150, 300);
    const at = new Date(start + day * DAY + random.int(6, 17) * 3_600_000 + random.int(0, 59) * 60_000);
    const rig = rigs[random.int(0, 1)];
    opened.push({ id: await openAt(at, rig.id, random.pick(crew).id, version.id), at, rigId: rig.id });
  }
  // Two more at the very same millisecond as earlier ones: their order in time is a tie.
  for (const twin of opened.slice(0, 2)) opened.push({ id: await openAt(twin.at, twin.rigId, crew[0].id, version.id), at: twin.at, rigId: twin.rigId });
});

/** As startCase does, but at a chosen time in the past. */
async function openAt(at: Date, rigId: number, openedBy: number, guideVersionId: number): Promise<string> {
  const id = randomUUID();
  await changeCase(sequelize, cedar.id, async (transaction) => {
    await Case.create(caseRow({ id, companyId: cedar.id, rigId, guideVersionId, openedBy, openedAt: at, jobId: jobOfDay(at) }), { transaction });
    return { id, companyId: cedar.id, rigId, causeCode: null, openedAt: at };
  });
  return id;
}

describe("rollup upkeep", () => {
  it("leaves the same rows as a full rebuild, closing cases in a shuffled order (late closes join chains)", async () => {
    const random = seededRandom(14224);
    const order = [...opened].sort(() => random.next() - 0.5);
    const ends: [string, "fixed" | "abandoned"][] = [
      ["fixed-air-leak", "fixed"],
      ["fixed-air-leak", "fixed"],
      ["fixed-throttle", "fixed"],
      ["fixed-valve", "fixed"],
      ["", "abandoned"],
    ];
    for (const [i, c] of order.entries()) {
      const [finalStep, outcome] = random.pick(ends);
      const closedAt = new Date(c.at.getTime() + random.int(5, 90) * 60_000);
      const hours = 1000 + Math.round((c.at.getTime() - start) / DAY) * 3;
      await closeCase(crew[i % crew.length], c.id, {
        outcome,
        ...(finalStep ? { finalStep } : {}),
        engineHours: hours,
        at: closedAt.toISOString(),
      });
      if (i % 40 === 39) {
        const kept = await snapshot();
        await rebuildRollups();
        expect(await snapshot(), `after ${i + 1} closes`).toEqual(kept);
      }
    }
    const [chains] = await sequelize.query("SELECT COUNT(DISTINCT rig_id, cause_code, repeat_chain_at) AS n FROM cases WHERE cause_code IS NOT NULL");
    // Enough chains to mean something: the gaps split each rig and cause more than once.
    expect(Number((chains as { n: number }[])[0].n)).toBeGreaterThan(6);
  });

  it("stays right when several crews close at the same moment", async () => {
    const rig = (await Rig.findOne({ where: { companyId: cedar.id }, order: [["code", "ASC"]] }))!;
    const version = (await Case.findOne({ where: { companyId: cedar.id } }))!.guideVersionId;
    const at = (k: number) => new Date(start + 40 * DAY + k * 3_600_000);
    const ids = await Promise.all([0, 1, 2, 3, 4, 5].map((k) => openAt(at(k), rig.id, crew[k % crew.length].id, version)));
    const results = await Promise.allSettled(
      ids.map((id, k) =>
        closeCase(crew[k % crew.length], id, { outcome: "fixed", finalStep: "fixed-air-leak", at: new Date(at(k).getTime() + 1_200_000).toISOString() }),
      ),
    );
    expect(results.map((r) => r.status)).toEqual(Array(6).fill("fulfilled"));
    const kept = await snapshot();
    await rebuildRollups();
    expect(await snapshot()).toEqual(kept);
  });
});

/** The board's aggregates worked out from the case rows in plain code, as the oracle. */
async function byHand(from: Date, to: Date): Promise<Omit<BoardAggregates, "openHandoffs">> {
  const rigs = await Rig.findAll({ where: { companyId: cedar.id }, order: [["code", "ASC"]] });
  const users = new Map((await User.findAll({ where: { companyId: cedar.id } })).map((u) => [u.id, u.name]));
  const versions = await GuideVersion.findAll({ include: [{ model: GuideRecord, as: "guide" }] });
  const titleOf = new Map(versions.map((v) => [v.id, (v as GuideVersion & { guide: GuideRecord }).guide.title]));
  const cases = (await Case.findAll({ where: { companyId: cedar.id } })).filter((c) => c.openedAt >= from && c.openedAt < to);
  const seconds = (c: Case) => (c.closedAt ? Math.floor((c.closedAt.getTime() - c.openedAt.getTime()) / 1000) : 0);
  const count = <K>(keys: K[]) => keys.reduce((m, k) => m.set(k, (m.get(k) ?? 0) + 1), new Map<K, number>());
  const top5 = <T extends { count: number }>(xs: T[]) => xs.sort((a, b) => b.count - a.count).slice(0, 5);
  const monday = (t: Date) => {
    const d = new Date(Math.floor(t.getTime() / DAY) * DAY);
    return new Date(d.getTime() - ((d.getUTCDay() + 6) % 7) * DAY).toISOString().slice(0, 10);
  };
  const causes = [...new Set(cases.flatMap((c) => (c.causeCode ? [c.causeCode] : [])))];
  return {
    rigs: rigs.map((rig) => {
      const mine = cases.filter((c) => c.rigId === rig.id);
      const hours = mine.flatMap((c) => (c.engineHours === null ? [] : [Number(c.engineHours)]));
      return {
        rigCode: rig.code,
        cases: mine.length,
        fixed: mine.filter((c) => c.outcome === "fixed").length,
        handoff: mine.filter((c) => c.outcome === "handoff").length,
        abandoned: mine.filter((c) => c.outcome === "abandoned").length,
        operatingHours: rig.hasHourMeter && hours.length ? Math.max(...hours) - Math.min(...hours) : null,
        repairHours: mine.reduce((s, c) => s + seconds(c), 0) / 3600,
        closedCases: mine.filter((c) => c.closedAt).length,
      };
    }),
    causes: causes.map((cause) => {
      const hits = cases.filter((c) => c.causeCode === cause);
      // Hand-offs carry the crew's suspected cause; fixed cases the found one.
      return {
        cause,
        count: hits.length,
        suspected: hits.filter((c) => c.outcome === "handoff").length,
        downtimeHours: hits.reduce((s, c) => s + seconds(c), 0) / 3600,
      };
    }),
    repeatChains: findRepeats(
      cases
        .filter((c) => c.causeCode)
        .map((c) => ({ caseId: c.id, rigCode: rigs.find((r) => r.id === c.rigId)!.code, cause: c.causeCode!, openedAt: c.openedAt.toISOString() })),
    ).map((g) => summariseChain(g)),
    weeks: [...count(cases.map((c) => monday(c.openedAt)))]
      .sort(([a], [b]) => a.localeCompare(b))
      .map(([weekStart, n]) => ({ weekStart, cases: n, handoffs: cases.filter((c) => monday(c.openedAt) === weekStart && c.outcome === "handoff").length })),
    people: [...count(cases.map((c) => c.openedBy!))]
      .map(([uid, n]) => {
        const mine = cases.filter((c) => c.openedBy === uid);
        return {
          name: users.get(uid)!,
          cases: n,
          handoffs: mine.filter((c) => c.outcome === "handoff").length,
          guides: top5([...count(mine.map((c) => titleOf.get(c.guideVersionId)!))].map(([title, k]) => ({ title, count: k }))),
          causes: top5([...count(mine.flatMap((c) => (c.causeCode ? [c.causeCode] : [])))].map(([cause, k]) => ({ cause, count: k }))),
        };
      })
      .sort((a, b) => b.cases - a.cases || a.name.localeCompare(b.name)),
  };
}

describe("the board read from the rollups", () => {
  const windows: [string, string, string][] = [
    ["whole months and edge days", "2026-01-13", "2026-09-20"],
    ["inside one month", "2026-03-03", "2026-03-29"],
    ["month to month", "2026-02-01", "2026-06-01"],
    ["across a quiet gap", "2026-03-20", "2026-06-10"],
  ];
  it.each(windows)("equals the figures worked out from the cases: %s", async (_label, a, b) => {
    const from = new Date(`${a}T00:00:00Z`);
    const to = new Date(`${b}T00:00:00Z`);
    const got = await boardAggregates(cedar.id, { from, to });
    const want = await byHand(from, to);
    expect(got.rigs).toEqual(want.rigs.map((r) => ({ ...r, repairHours: expect.closeTo(r.repairHours, 9) })));
    const byCause = (x: { cause: string }, y: { cause: string }) => x.cause.localeCompare(y.cause);
    expect([...got.causes].sort(byCause)).toEqual(want.causes.sort(byCause).map((c) => ({ ...c, downtimeHours: expect.closeTo(c.downtimeHours, 9) })));
    const chainKey = (x: { rigCode: string; cause: string; firstAt: string }) => `${x.rigCode} ${x.cause} ${x.firstAt}`;
    const byChain = (x: { rigCode: string; cause: string; firstAt: string }, y: typeof x) => chainKey(x).localeCompare(chainKey(y));
    expect([...got.repeatChains].sort(byChain)).toEqual(want.repeatChains.sort(byChain));
    expect(got.weeks).toEqual(want.weeks);
    // Ties in a person's top five may come in either order; the counts may not.
    const loose = (p: BoardAggregates["people"][number]) => ({ ...p, guides: p.guides.map((g) => g.count), causes: p.causes.map((c) => c.count) });
    expect(got.people.map(loose)).toEqual(want.people.map(loose));
    expect(got.repeatChains.length + got.causes.length).toBeGreaterThan(0);
    // The job table: faults, downtime, most frequent cause and open hand-offs per job, counted from the cases.
    const cases = await Case.findAll({ where: { companyId: cedar.id, kind: "fix", openedAt: { [Op.gte]: from, [Op.lt]: to } } });
    const jobs = await jobBoardRows(cedar.id, { from, to });
    for (const jobId of jobIds) {
      const onJob = cases.filter((c) => c.jobId === jobId);
      // Faults as the rigs table counts them: fixed or handed off.
      const mine = onJob.filter((c) => c.outcome === "fixed" || c.outcome === "handoff");
      const row = jobs.find((j) => j.jobId === jobId);
      if (!onJob.length) {
        expect(row).toBeUndefined();
        continue;
      }
      const downtime = mine.reduce((s, c) => s + (c.closedAt ? Math.floor((+c.closedAt - +c.openedAt) / 1000) : 0), 0);
      const causes = new Map<string, number>();
      for (const c of mine) if (c.causeCode) causes.set(c.causeCode, (causes.get(c.causeCode) ?? 0) + 1);
      const most = Math.max(0, ...causes.values());
      expect(row).toMatchObject({
        faults: mine.length,
        downtimeSeconds: downtime,
        openHandoffs: mine.filter((c) => c.outcome === "handoff" && !c.handoffResolvedAt).length,
      });
      if (most) expect(causes.get(row!.topCause!.code)).toBe(most);
    }
  });

  it("refuses a window that does not run midnight to midnight UTC", async () => {
    await expect(boardAggregates(cedar.id, { from: new Date("2026-03-03T05:00:00Z"), to: new Date("2026-04-01T00:00:00Z") })).rejects.toThrow(/midnight UTC/);
  });
});
