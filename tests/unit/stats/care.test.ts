import { describe, expect, it } from "vitest";
import { careFigures, hoursByDay, overdueAt, weekOf, type RuleRow } from "~/lib/stats/care";

const Z = "America/Denver";

describe("engine hours per rig and day", () => {
  it("is the day's last reading less the last reading of an earlier day; a misread or backwards meter leaves the day unmeasured", () => {
    const hours = hoursByDay(
      [
        { rigId: 1, at: "2026-06-01T23:00:00Z", hours: 100 },
        { rigId: 1, at: "2026-06-02T14:00:00Z", hours: 100 },
        { rigId: 1, at: "2026-06-02T23:00:00Z", hours: 108 },
        // No reading on the 3rd: the 4th's reading carries both days.
        { rigId: 1, at: "2026-06-04T23:00:00Z", hours: 121 },
        { rigId: 1, at: "2026-06-05T23:00:00Z", hours: 150 }, // 29 h in a day: a misread
        { rigId: 1, at: "2026-06-06T23:00:00Z", hours: 149 }, // backwards
        { rigId: 1, at: "2026-06-08T23:00:00Z", hours: 157 }, // two days on (Sunday off): measured
        { rigId: 1, at: "2026-06-20T23:00:00Z", hours: 163 }, // twelve days on: which day ran is unknown
        { rigId: 2, at: "2026-06-02T23:00:00Z", hours: 5 },
      ],
      Z,
    );
    expect(Object.fromEntries(hours)).toEqual({ "1:2026-06-02": 8, "1:2026-06-04": 13, "1:2026-06-08": 8 });
  });

  it("names days in the company's zone: 01:00 UTC on the 3rd is the evening of the 2nd in Denver", () => {
    const hours = hoursByDay(
      [
        { rigId: 1, at: "2026-06-01T20:00:00Z", hours: 10 },
        { rigId: 1, at: "2026-06-03T01:00:00Z", hours: 16 },
      ],
      Z,
    );
    expect([...hours.keys()]).toEqual(["1:2026-06-02"]);
  });
});

describe("services overdue at a fault", () => {
  const grease: RuleRow = { id: 1, rigId: 1, name: "Grease points", everyHours: 50, everyDays: 7, since: "2026-01-01T00:00:00Z" };
  const lube: RuleRow = { id: 2, rigId: 1, name: "Lubricator", everyHours: null, everyDays: 1, since: "2026-01-01T00:00:00Z" };
  const done = new Map([
    [1, [{ ruleId: 1, at: "2026-06-01T15:00:00Z", hours: 60 }]],
    [2, [{ ruleId: 2, at: "2026-06-02T13:50:00Z", hours: 100 }]],
  ]);
  const over = (at: string, hours: number) => overdueAt([grease, lube], done, at, hours, true, Z);

  it("is not overdue at exactly the interval, and is one tenth of an hour past it", () => {
    expect(over("2026-06-02T18:00:00Z", 110)).toEqual([]); // 50.0 h since: due, not over
    expect(over("2026-06-02T18:00:00Z", 110.1)).toEqual(["Grease points"]);
  });

  it("counts calendar days in the company's zone: the day after is due, two days after is overdue", () => {
    expect(over("2026-06-03T19:00:00Z", 101)).toEqual([]);
    expect(over("2026-06-04T19:00:00Z", 102)).toEqual(["Lubricator"]);
    // 05:00 UTC on the 4th is still the 3rd in Denver.
    expect(over("2026-06-04T05:00:00Z", 102)).toEqual([]);
  });

  it("does not count a service never recorded as overdue (it may have been done before it was kept)", () => {
    expect(overdueAt([{ ...grease, id: 9 }], done, "2026-06-20T19:00:00Z", 500, true, Z)).toEqual([]);
  });

  it("ignores a rule that did not exist yet, and reads only what was done before the fault", () => {
    expect(overdueAt([{ ...lube, since: "2026-07-01T00:00:00Z" }], done, "2026-06-20T19:00:00Z", 150, true, Z)).toEqual([]);
    const later = new Map([[1, [...done.get(1)!, { ruleId: 1, at: "2026-06-10T15:00:00Z", hours: 140 }]]]);
    expect(overdueAt([grease], later, "2026-06-05T19:00:00Z", 120, true, Z)).toEqual(["Grease points"]);
  });
});

describe("weeks and empty windows", () => {
  it("starts weeks on Monday", () => {
    expect(weekOf("2026-06-07")).toBe("2026-06-01"); // a Sunday
    expect(weekOf("2026-06-01")).toBe("2026-06-01");
  });

  it("says no rate, not zero, when a kind of day has no engine hours", () => {
    const care = careFigures({
      rigs: [{ id: 1, code: "CF-11", hasHourMeter: false }],
      readings: [],
      cards: [{ rigId: 1, slug: "pre-start", at: "2026-06-02T14:00:00Z", complete: true }],
      faults: [{ rigId: 1, at: "2026-06-02T18:00:00Z", hours: null }],
      rules: [],
      done: [],
      zone: Z,
      fromDay: "2026-06-01",
      toDay: "2026-06-08",
      today: "2026-06-07",
    });
    expect(care.withPreStart.ratePer100h).toBeNull();
    expect(care.withoutPreStart.ratePer100h).toBeNull();
    expect(care.faults).toBe(1);
    expect(care.weeks[0]).toBe("2026-06-01"); // newest first
    expect(care.cardWeeks[0].cells[0]).toEqual({ week: "2026-06-01", workedDays: 1, preStartDays: 1, otherCards: 0 });
  });
});
