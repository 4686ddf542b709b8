import { describe, expect, it } from "vitest";
import { calendarDaysBetween, dueText, serviceDue } from "~/lib/rigs/service";
import { serviceRuleSchema } from "~/lib/rigs/service-forms";

const DENVER = "America/Denver";
const meter = (engineHours: number) => ({ hasHourMeter: true, engineHours });
const at = (iso: string) => new Date(iso);

describe("service by engine hours (worked by hand at the edges)", () => {
  const grease = { everyHours: 50, everyDays: null };
  const last = { doneAt: at("2026-06-01T15:00:00Z"), engineHours: 1000 };
  const now = at("2026-06-01T16:00:00Z");
  it.each([
    [1040, "ok", 10],
    [1045, "soon", 5], // the last tenth of 50 h
    [1049.9, "soon", 0.1],
    [1050, "due", 0],
    [1050.1, "overdue", -0.1],
    [1093.5, "overdue", -43.5],
  ] as const)("at %s h: %s with %s h left", (hours, status, left) => {
    expect(serviceDue(grease, last, meter(hours), now, DENVER)).toEqual({ status, hoursLeft: left, daysLeft: null });
  });
});

describe("service by calendar days, in the company's zone", () => {
  const daily = { everyHours: null, everyDays: 1 };
  it("is done the day it is done, due the next day, overdue the day after", () => {
    const last = { doneAt: at("2026-06-01T15:00:00Z"), engineHours: null };
    expect(serviceDue(daily, last, meter(0), at("2026-06-01T23:00:00Z"), DENVER)).toMatchObject({ status: "ok", daysLeft: 1 });
    expect(serviceDue(daily, last, meter(0), at("2026-06-02T14:00:00Z"), DENVER)).toMatchObject({ status: "due", daysLeft: 0 });
    expect(serviceDue(daily, last, meter(0), at("2026-06-03T14:00:00Z"), DENVER)).toMatchObject({ status: "overdue", daysLeft: -1 });
  });
  it("counts Denver's midnight, not UTC's: 23:30 one evening to 00:30 the next is a day", () => {
    // 2026-06-01 23:30 MDT = 2026-06-02 05:30 UTC; 2026-06-02 00:30 MDT = 06:30 UTC, the same UTC day.
    expect(calendarDaysBetween(at("2026-06-02T05:30:00Z"), at("2026-06-02T06:30:00Z"), DENVER)).toBe(1);
    expect(calendarDaysBetween(at("2026-06-02T05:30:00Z"), at("2026-06-02T06:30:00Z"), "UTC")).toBe(0);
  });
  it("a 30-day rule is soon in its last 3 days", () => {
    const last = { doneAt: at("2026-06-01T15:00:00Z"), engineHours: null };
    const monthly = { everyHours: null, everyDays: 30 };
    expect(serviceDue(monthly, last, meter(0), at("2026-06-27T15:00:00Z"), DENVER)).toMatchObject({ status: "ok", daysLeft: 4 });
    expect(serviceDue(monthly, last, meter(0), at("2026-06-28T15:00:00Z"), DENVER)).toMatchObject({ status: "soon", daysLeft: 3 });
  });
});

describe("hours or days, whichever comes first", () => {
  const oil = { everyHours: 250, everyDays: 365 };
  const last = { doneAt: at("2025-05-01T15:00:00Z"), engineHours: 1000 };
  it("the worse of the two decides", () => {
    const r = serviceDue(oil, last, meter(1100), at("2026-05-03T15:00:00Z"), DENVER);
    expect(r).toEqual({ status: "overdue", hoursLeft: 150, daysLeft: -2 });
    expect(dueText(r)).toBe("150 engine hours left, over by 2 days");
  });
  it("a rig without an hour meter goes by the days alone, or says it cannot count hours", () => {
    const noMeter = { hasHourMeter: false, engineHours: 0 };
    expect(serviceDue(oil, last, noMeter, at("2026-03-01T15:00:00Z"), DENVER)).toMatchObject({ status: "ok", hoursLeft: null, daysLeft: 61 });
    expect(serviceDue({ everyHours: 50, everyDays: null }, last, noMeter, at("2026-04-01T15:00:00Z"), DENVER).status).toBe("no-meter");
  });
  it("never done is never recorded", () => {
    expect(serviceDue(oil, null, meter(10), at("2026-04-01T15:00:00Z"), DENVER).status).toBe("never");
  });
});

describe("service rules", () => {
  it("need hours, days or both, named in plain words", () => {
    const r = serviceRuleSchema.safeParse({ name: "Grease points" });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].message).toBe("Give the engine hours, the days, or both.");
    expect(serviceRuleSchema.parse({ name: "Lubricator", everyDays: 1 })).toEqual({ name: "Lubricator", everyHours: null, everyDays: 1, task: null });
    expect(serviceRuleSchema.safeParse({ name: "Lubricator", everyDays: 1, task: "oil-change" }).error?.issues[0].message).toBe(
      "Pick a card task from the list, or none.",
    );
  });
});

describe("readings with a service", () => {
  it("need the meter on a rig that has one, no lower than the last, no jump over 1,000 h", async () => {
    const { readingProblem } = await import("~/lib/rigs/service");
    const rig = { hasHourMeter: true, engineHours: 2310.5 };
    expect(readingProblem(2310.5, rig)).toBeNull();
    expect(readingProblem(3310.5, rig)).toBeNull();
    expect(readingProblem(3310.6, rig)).toMatch(/over 1,000 h above/);
    expect(readingProblem(2310.4, rig)).toMatch(/cannot be lower/);
    expect(readingProblem(null, rig)).toMatch(/this rig has one/);
    expect(readingProblem(null, { hasHourMeter: false, engineHours: 0 })).toBeNull();
  });
});
