import { RouterContextProvider } from "react-router";
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { Case, Company, GuideVersion, Rig, User } from "../../db/index";
import { buildBoard } from "~/lib/stats/board";
import { byWeight, findRepeats, summariseChain } from "~/lib/stats/repeats";
import { rigFigures, type RigAggregate } from "~/lib/stats/reliability";
import { loader as boardApi } from "~/routes/api.board";
import { boardAggregates } from "~/services/board.server";
import { rebuildRollups, resetDatabase } from "../helpers/db";
import { caseRow } from "../helpers/cases";
import { requestAs, run } from "../helpers/requests";

const DAY = 86_400_000;
const start = Date.UTC(2026, 3, 1);
interface Row {
  rig: string;
  day: number;
  outcome: "fixed" | "handoff" | "abandoned";
  cause: string | null;
  hours: number | null;
  minutes: number;
}

// Hand-built fixture: CF-03 fails often with repeated air leaks; CF-07 rarely; BM-01 belongs to the other company.
const FIXTURE: Row[] = [
  ...[0, 10, 25, 33, 60, 70, 75, 80, 90, 100].map((d, i) => ({
    rig: "CF-03",
    day: d,
    outcome: i % 4 === 3 ? ("handoff" as const) : ("fixed" as const),
    cause: i < 4 ? "suction-air-leak" : "plug-sump",
    hours: 1000 + d * 6,
    minutes: 20 + i,
  })),
  ...[5, 50, 95].map((d) => ({ rig: "CF-07", day: d, outcome: "fixed" as const, cause: "low-engine-speed", hours: 2000 + d * 7, minutes: 15 })),
  { rig: "CF-07", day: 96, outcome: "abandoned", cause: null, hours: 2672, minutes: 5 },
  ...[1, 2, 3].map((d) => ({ rig: "BM-01", day: d, outcome: "fixed" as const, cause: "suction-air-leak", hours: 500 + d, minutes: 10 })),
];
const ids = new Map<Row, string>();

beforeAll(async () => {
  await resetDatabase();
  const version = await GuideVersion.findOne();
  for (const row of FIXTURE) {
    const rig = (await Rig.findOne({ where: { code: row.rig } }))!;
    const opener = await User.findOne({ where: { companyId: rig.companyId, role: "crew" } });
    const id = randomUUID();
    ids.set(row, id);
    const openedAt = new Date(start + row.day * DAY + 15 * 3_600_000);
    await Case.create(
      caseRow({
        id,
        companyId: rig.companyId,
        rigId: rig.id,
        guideVersionId: version!.id,
        openedBy: opener!.id,
        openedAt,
        closedAt: new Date(openedAt.getTime() + row.minutes * 60_000),
        engineHours: row.hours,
        outcome: row.outcome,
        causeCode: row.cause,
      }),
    );
  }
  await rebuildRollups();
});

const window = { from: new Date(start), to: new Date(start + 200 * DAY) };

describe("board aggregates in MariaDB agree with the pure module on the same data", () => {
  it("per rig: counts, hours, repair time → MTBF, MTTR, rate and flag", async () => {
    const cedar = (await Company.findOne({ where: { slug: "cedar-flats" } }))!;
    const all = rigFigures((await boardAggregates(cedar.id, window)).rigs);
    // Every rig of the company is listed; the fixture is about three of them, and the others have no cases.
    const fixtureRigs = ["CF-03", "CF-07", "CF-11"];
    expect(all.filter((f) => !fixtureRigs.includes(f.rigCode)).every((f) => f.cases === 0)).toBe(true);
    const fromSql = all.filter((f) => fixtureRigs.includes(f.rigCode));
    // The same aggregates computed here from the fixture rows, without SQL.
    const byHand: RigAggregate[] = ["CF-03", "CF-07", "CF-11"].map((code) => {
      const rows = FIXTURE.filter((r) => r.rig === code);
      const hours = rows.map((r) => r.hours!).filter((h) => h !== null);
      return {
        rigCode: code,
        cases: rows.length,
        fixed: rows.filter((r) => r.outcome === "fixed").length,
        handoff: rows.filter((r) => r.outcome === "handoff").length,
        abandoned: rows.filter((r) => r.outcome === "abandoned").length,
        operatingHours: hours.length ? Math.max(...hours) - Math.min(...hours) : null,
        repairHours: rows.reduce((s, r) => s + r.minutes / 60, 0),
        closedCases: rows.length,
      };
    });
    const expected = rigFigures(byHand);
    expect(fromSql.map((f) => f.rigCode)).toEqual(["CF-03", "CF-07", "CF-11"]);
    for (let i = 0; i < expected.length; i++) {
      const a = fromSql[i];
      const b = expected[i];
      expect([a.cases, a.fixed, a.handoff, a.abandoned, a.closedCases]).toEqual([b.cases, b.fixed, b.handoff, b.abandoned, b.closedCases]);
      for (const key of ["operatingHours", "repairHours", "mtbfHours", "mttrHours", "ratePer100h"] as const) {
        if (b[key] === null) expect(a[key] ?? null, `${b.rigCode} ${key}`).toBeNull();
        else expect(a[key]!, `${b.rigCode} ${key}`).toBeCloseTo(b[key]!, 6);
      }
      expect(a.outOfLine).toBe(b.outOfLine);
    }
    // CF-11 has no cases in the window, and it has no failures to time between.
    expect(fromSql[2]).toMatchObject({ cases: 0, mtbfHours: null });
  });

  it("causes and repeats", async () => {
    const cedar = (await Company.findOne({ where: { slug: "cedar-flats" } }))!;
    const board = buildBoard(await boardAggregates(cedar.id, window));
    expect(board.pareto.map((p) => [p.cause, p.count])).toEqual([
      ["plug-sump", 6],
      ["suction-air-leak", 4],
      ["low-engine-speed", 3],
    ]);
    expect(board.pareto.at(-1)!.cumulativeShare).toBeCloseTo(1, 12);
    const hits = FIXTURE.filter((r) => r.rig.startsWith("CF") && r.cause).map((r) => ({
      caseId: ids.get(r)!,
      rigCode: r.rig,
      cause: r.cause!,
      openedAt: new Date(start + r.day * DAY + 15 * 3_600_000).toISOString(),
    }));
    // The chains SQL finds (gaps and islands) are exactly the pure module's on the same cases.
    const expected = findRepeats(hits, 30)
      .map((g) => summariseChain(g))
      .sort(byWeight);
    expect(board.repeats).toEqual(expected);
    // Air leaks on days 0, 10, 25, 33 form one chain; sump plugs on days 60–100 form another. BM-01's never show here.
    expect(board.repeats.map((g) => [g.rigCode, g.cause, g.count])).toEqual([
      ["CF-03", "plug-sump", 6],
      ["CF-03", "suction-air-leak", 4],
    ]);
    const shortWindow = buildBoard(await boardAggregates(cedar.id, { ...window, repeatDays: 9 }));
    expect(shortWindow.repeats).toEqual(
      findRepeats(hits, 9)
        .map((g) => summariseChain(g))
        .sort(byWeight),
    );
    expect(board.openHandoffs.length).toBe(2);
  });
});

describe("GET /api/board", () => {
  it("answers supervisors and admins, and crew and trainers get 403", async () => {
    for (const [email, status] of [
      ["mo@cedarflats.example", 200],
      ["june@cedarflats.example", 200],
      ["dana@cedarflats.example", 403],
      ["ravi@cedarflats.example", 403],
    ] as const) {
      expect(
        (
          await run(async () =>
            boardApi({
              request: await requestAs(email, "/api/board?from=2026-04-01&to=2026-10-01"),
              params: {},
              context: new RouterContextProvider(),
            } as never),
          )
        ).status,
        email,
      ).toBe(status);
    }
  });

  it("shows each company only its own rigs, filters by rig, and names a bad window", async () => {
    const res = await run(async () =>
      boardApi({
        request: await requestAs("li@bluemesa.example", "/api/board?from=2026-04-01&to=2026-10-01"),
        params: {},
        context: new RouterContextProvider(),
      } as never),
    );
    expect(res.data.rigs.map((r: { rigCode: string }) => r.rigCode)).toEqual(["BM-01", "BM-02", "BM-03", "BM-04"]);
    expect(res.data.fleet.cases).toBe(3);
    const one = await run(async () =>
      boardApi({
        request: await requestAs("mo@cedarflats.example", "/api/board?from=2026-04-01&to=2026-10-01&rig=cf-07"),
        params: {},
        context: new RouterContextProvider(),
      } as never),
    );
    expect(one.data.rigs.map((r: { rigCode: string }) => r.rigCode)).toEqual(["CF-07"]);
    expect(one.data.pareto.map((p: { cause: string }) => p.cause)).toEqual(["low-engine-speed"]);
    const bad = await run(async () =>
      boardApi({
        request: await requestAs("mo@cedarflats.example", "/api/board?from=2026-13-01&repeatDays=0"),
        params: {},
        context: new RouterContextProvider(),
      } as never),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.data.fields).sort()).toEqual(["from", "repeatDays"]);
  });
});
