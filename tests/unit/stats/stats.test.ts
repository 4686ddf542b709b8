import jStat from "jstat";
import { describe, expect, it } from "vitest";
import { chiSquareQuantile, poissonInterval } from "~/lib/stats/chi-square";
import { pareto } from "~/lib/stats/pareto";
import { findRepeats } from "~/lib/stats/repeats";
import { availability, mtbf, mttr, rigFigures, type RigAggregate } from "~/lib/stats/reliability";

describe("MTBF, MTTR, availability (ISO 14224 / ISO 20815 definitions)", () => {
  it("10,000 h with 10 failures → MTBF 1,000 h; MTTR 5 h → A ≈ 0.995 (example from secondary sources, references.md)", () => {
    const m = mtbf(10_000, 10)!;
    expect(m).toBe(1000);
    expect(mttr(50, 10)).toBe(5);
    expect(availability(m, 5)).toBeCloseTo(0.995, 3);
  });

  it("has no MTBF without failures or hours", () => {
    expect(mtbf(100, 0)).toBeNull();
    expect(availability(null, 3)).toBeNull();
  });
});

describe("exact Poisson interval (Garwood, chi-square form)", () => {
  it("matches a general-purpose statistics package's chi-square quantiles (jStat as the oracle)", () => {
    for (const k of [1, 2, 5, 10, 37, 200]) {
      for (const p of [0.025, 0.05, 0.5, 0.95, 0.975]) {
        const ours = chiSquareQuantile(p, k);
        expect(Math.abs(ours - jStat.chisquare.inv(p, k)) / ours).toBeLessThan(1e-6);
      }
    }
  });

  it("gives the textbook interval for k = 10: about 4.795 to 18.39", () => {
    const { lower, upper } = poissonInterval(10);
    expect(lower).toBeCloseTo(jStat.chisquare.inv(0.025, 20) / 2, 6);
    expect(upper).toBeCloseTo(jStat.chisquare.inv(0.975, 22) / 2, 6);
    expect(lower).toBeCloseTo(4.795, 2);
    expect(upper).toBeCloseTo(18.39, 1);
    expect(poissonInterval(0).lower).toBe(0);
  });
});

describe("rigs out of line with the fleet", () => {
  const rig = (rigCode: string, failures: number, hours: number | null): RigAggregate => ({
    rigCode,
    cases: failures,
    fixed: failures,
    handoff: 0,
    abandoned: 0,
    operatingHours: hours,
    repairHours: failures * 0.5,
    closedCases: failures,
  });

  it("flags a rig whose whole interval lies above the rest of the fleet's rate, and no other", () => {
    const figures = rigFigures([rig("A", 60, 1000), rig("B", 10, 1000), rig("C", 12, 1000), rig("D", 3, null)]);
    const a = figures.find((f) => f.rigCode === "A")!;
    expect(a.ratePer100h).toBe(6);
    expect(a.fleetRatePer100h).toBeCloseTo(((10 + 12) / 2000) * 100, 10);
    expect(a.outOfLine).toBe(true);
    expect(figures.filter((f) => f.outOfLine).map((f) => f.rigCode)).toEqual(["A"]);
    expect(figures.find((f) => f.rigCode === "D")).toMatchObject({ ratePer100h: null, outOfLine: false, mtbfHours: null });
  });

  it("does not flag a higher rate that chance could explain", () => {
    const figures = rigFigures([rig("A", 4, 100), rig("B", 2, 100)]);
    expect(figures[0].ratePer100h).toBeGreaterThan(figures[1].ratePer100h!);
    expect(figures[0].outOfLine).toBe(false);
  });
});

describe("Pareto of causes", () => {
  it("sorts by count, and its shares sum to 100 %", () => {
    const rows = pareto([
      { cause: "b", count: 3, downtimeHours: 1 },
      { cause: "a", count: 10, downtimeHours: 5 },
      { cause: "c", count: 7, downtimeHours: 4 },
    ]);
    expect(rows.map((r) => r.cause)).toEqual(["a", "c", "b"]);
    expect(rows.reduce((s, r) => s + r.share, 0)).toBeCloseTo(1, 12);
    expect(rows.reduce((s, r) => s + r.downtimeShare, 0)).toBeCloseTo(1, 12);
    expect(rows.map((r) => r.cumulativeShare)).toEqual([0.5, 0.85, 1]);
  });
});

describe("repeats", () => {
  const at = (day: number) => new Date(Date.UTC(2026, 5, 1) + day * 86_400_000).toISOString();
  // Hand-built fixture: CF-03 air leaks on days 0, 20, 45 (chain 0–20–45), 100; CF-07 air leak day 10; CF-03 plug day 5.
  const hits = [
    { caseId: "1", rigCode: "CF-03", cause: "suction-air-leak", openedAt: at(0) },
    { caseId: "2", rigCode: "CF-03", cause: "suction-air-leak", openedAt: at(20) },
    { caseId: "3", rigCode: "CF-03", cause: "suction-air-leak", openedAt: at(45) },
    { caseId: "4", rigCode: "CF-03", cause: "suction-air-leak", openedAt: at(100) },
    { caseId: "5", rigCode: "CF-07", cause: "suction-air-leak", openedAt: at(10) },
    { caseId: "6", rigCode: "CF-03", cause: "plug-sump", openedAt: at(5) },
    { caseId: "7", rigCode: "CF-03", cause: "plug-sump", openedAt: at(36) },
  ];

  it("finds exactly the chains within 30 days on the same rig and cause", () => {
    const groups = findRepeats(hits);
    expect(groups.map((g) => [g.rigCode, g.cause, g.cases.map((c) => c.caseId)])).toEqual([["CF-03", "suction-air-leak", ["1", "2", "3"]]]);
  });

  it("uses the window it is given", () => {
    expect(findRepeats(hits, 31).map((g) => g.cases.map((c) => c.caseId))).toEqual([
      ["1", "2", "3"],
      ["6", "7"],
    ]);
    expect(findRepeats(hits, 10)).toEqual([]);
  });
});
