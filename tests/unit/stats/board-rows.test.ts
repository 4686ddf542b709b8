import { describe, expect, it } from "vitest";
import { foldMix, foldRigWeeks, type RigWeekRow } from "~/lib/stats/board-rows";

const week = (rigId: number, w: string, cases: number, extra: Partial<RigWeekRow> = {}): RigWeekRow => ({
  rigId,
  week: w,
  cases,
  fixed: cases,
  handoff: 0,
  abandoned: 0,
  closed: cases,
  repairSeconds: cases * 1800,
  minHours: null,
  maxHours: null,
  ...extra,
});

describe("folding the grouped rollup rows", () => {
  it("sums rigs over weeks and weeks over rigs; hours span the lowest to the highest reading", () => {
    const folded = foldRigWeeks(
      [
        week(1, "2026-03-09", 2, { handoff: 1, minHours: 100, maxHours: 112 }),
        week(1, "2026-03-02", 1, { minHours: 96, maxHours: 96 }),
        week(2, "2026-03-09", 3, { minHours: 50, maxHours: 60 }),
      ],
      [
        { id: 1, code: "A-1", hasHourMeter: true },
        { id: 2, code: "B-2", hasHourMeter: false },
        { id: 3, code: "C-3", hasHourMeter: true },
      ],
    );
    expect(folded.weeks).toEqual([
      { weekStart: "2026-03-02", cases: 1, handoffs: 0 },
      { weekStart: "2026-03-09", cases: 5, handoffs: 1 },
    ]);
    expect(folded.rigs[0]).toMatchObject({ rigCode: "A-1", cases: 3, handoff: 1, operatingHours: 16, repairHours: 1.5, closedCases: 3 });
    // No hour meter, or no readings: no operating hours rather than zero.
    expect(folded.rigs[1]).toMatchObject({ rigCode: "B-2", cases: 3, operatingHours: null });
    expect(folded.rigs[2]).toMatchObject({ rigCode: "C-3", cases: 0, operatingHours: null });
  });

  it("counts causes for everyone, people only while they exist, and keeps each person's top five", () => {
    const row = (personId: number, personName: string | null, guideTitle: string, cause: string | null, cases: number, handoffs = 0) => ({
      personId,
      personName,
      guideTitle,
      cause,
      cases,
      handoffs,
      repairSeconds: cases * 3600,
    });
    const folded = foldMix([
      row(1, "Ana", "Lost prime", "suction-air-leak", 4),
      row(1, "Ana", "Lost prime", null, 2, 2),
      row(2, "Ben", "Foaming", "foam-over-agitation", 6),
      row(0, null, "Lost prime", "suction-air-leak", 3, 1),
      ...["a", "b", "c", "d", "e", "f"].map((c, i) => row(3, "Cy", "Leaks", `cause-${c}`, i + 1)),
    ]);
    // One of the seven was handed off with the cause suspected, not found.
    expect(folded.causes.find((c) => c.cause === "suction-air-leak")).toEqual({ cause: "suction-air-leak", count: 7, suspected: 1, downtimeHours: 7 });
    expect(folded.people.map((p) => [p.name, p.cases, p.handoffs])).toEqual([
      ["Cy", 21, 0],
      ["Ana", 6, 2],
      ["Ben", 6, 0],
    ]);
    expect(folded.people[1].guides).toEqual([{ title: "Lost prime", count: 6 }]);
    expect(folded.people[0].causes.map((c) => c.cause)).toEqual(["cause-f", "cause-e", "cause-d", "cause-c", "cause-b"]);
  });
});
