import { beforeAll, describe, expect, it } from "vitest";
import { Case, db, GuideRecord, GuideVersion, Rig, ServiceRecord, ServiceRule, User } from "../../db/index";
import { poissonInterval } from "~/lib/stats/chi-square";
import { careFor } from "~/services/care.server";
import type { SessionUser } from "~/services/guards.server";
import { caseRow } from "../helpers/cases";
import { resetDatabase } from "../helpers/db";

// The board's "what skipped care costs" on a small fixture, against the figures worked out by hand
// (and in plain code below) from the same rows. Times are UTC; Cedar Flats works in America/Denver.
let mo: SessionUser;
let cf07: Rig;
const at = (s: string) => new Date(`2026-06-${s}Z`);

beforeAll(async () => {
  await resetDatabase();
  const u = (await User.findOne({ where: { email: "mo@cedarflats.example" } }))!;
  mo = { id: u.id, name: u.name, email: u.email, role: u.role, companyId: u.companyId, companyName: "Cedar Flats", timeZone: "America/Denver" };
  cf07 = (await Rig.findOne({ where: { code: "CF-07" } }))!;
  const version = async (slug: string) =>
    (await GuideVersion.findOne({ where: { status: "published" }, include: [{ model: GuideRecord, as: "guide", where: { slug, companyId: null } }] }))!.id;
  const [preStart, shutDown, lostPrime] = await Promise.all([version("pre-start"), version("shut-down-clean-out"), version("lost-prime")]);
  const base = { companyId: mo.companyId, rigId: cf07.id, openedBy: u.id };
  const card = (guideVersionId: number, when: string, hours: number, gaps = 0) =>
    caseRow({ ...base, kind: "card", guideVersionId, openedAt: at(when), closedAt: at(when), engineHours: hours, outcome: "fixed", cardGaps: gaps });
  const fault = (when: string, hours: number, outcome: "fixed" | "handoff" | "abandoned" = "fixed") =>
    caseRow({ ...base, guideVersionId: lostPrime, openedAt: at(when), closedAt: at(when), engineHours: hours, outcome });
  await Case.bulkCreate([
    card(shutDown, "01T23:00:00", 100), // the evening before the window: its reading measures the first day
    card(preStart, "02T14:00:00", 100),
    fault("02T18:00:00", 104),
    card(shutDown, "02T23:00:00", 108),
    fault("03T19:00:00", 111, "handoff"), // no pre-start on the 3rd
    card(shutDown, "03T23:00:00", 115),
    card(preStart, "04T14:00:00", 115, 1), // grease left undone: incomplete
    card(shutDown, "04T23:00:00", 121),
    card(preStart, "05T14:00:00", 121),
    fault("05T17:00:00", 123),
    fault("05T19:00:00", 125),
    card(shutDown, "05T23:00:00", 128),
    fault("06T18:00:00", 128, "abandoned"), // abandoned: no fault
  ]);
  // The rules existed all along; grease last done at 60 h, the lubricator each pre-start.
  await db().query("UPDATE service_rules SET created_at = '2026-01-01'");
  const rules = await ServiceRule.findAll({ where: { rigId: cf07.id } });
  const rule = (task: string) => rules.find((r) => r.task === task)!.id;
  await ServiceRecord.bulkCreate([
    { companyId: mo.companyId, rigId: cf07.id, ruleId: rule("grease"), doneAt: at("01T15:00:00"), engineHours: 60, doneBy: u.id, note: null },
    { companyId: mo.companyId, rigId: cf07.id, ruleId: rule("lubricator"), doneAt: at("02T13:50:00"), engineHours: 100, doneBy: u.id, note: null },
    { companyId: mo.companyId, rigId: cf07.id, ruleId: rule("lubricator"), doneAt: at("05T13:50:00"), engineHours: 121, doneBy: u.id, note: null },
  ]);
});

describe("what skipped care costs", () => {
  it("splits engine hours and faults by complete pre-start days, with the board's exact interval", async () => {
    const care = await careFor(
      mo,
      { from: new Date("2026-06-02T00:00:00Z"), to: new Date("2026-06-07T00:00:00Z"), rigCode: "CF-07" },
      new Date("2026-12-01T00:00:00Z"),
    );
    // By hand: the 2nd (108 − 100 = 8 h, 1 fault) and the 5th (128 − 121 = 7 h, 2 faults) had a complete pre-start;
    // the 3rd (115 − 108 = 7 h, 1 fault) had none and the 4th (121 − 115 = 6 h, 0 faults) an incomplete one.
    expect(care.withPreStart).toMatchObject({ days: 2, hours: 15, faults: 3 });
    expect(care.withoutPreStart).toMatchObject({ days: 2, hours: 13, faults: 1 });
    // The same in plain code: rate = faults ÷ hours × 100; range = Garwood's exact Poisson limits ÷ hours × 100.
    for (const g of [care.withPreStart, care.withoutPreStart]) {
      expect(g.ratePer100h).toBeCloseTo((g.faults / g.hours) * 100, 10);
      const ci = poissonInterval(g.faults);
      expect(g.interval!.lower).toBeCloseTo((ci.lower / g.hours) * 100, 10);
      expect(g.interval!.upper).toBeCloseTo((ci.upper / g.hours) * 100, 10);
    }
    expect(care.withPreStart.ratePer100h).toBeCloseTo(20, 10);
    expect(care.unmeasuredDays).toBe(0);
  });

  it("counts the faults that happened with a service overdue", async () => {
    const care = await careFor(
      mo,
      { from: new Date("2026-06-02T00:00:00Z"), to: new Date("2026-06-07T00:00:00Z"), rigCode: "CF-07" },
      new Date("2026-12-01T00:00:00Z"),
    );
    // Grease every 50 h, last at 60 h: 104 h leaves 6 (not yet), 111, 123 and 125 h are over. The lubricator
    // (every day) was done each pre-start morning; on the 3rd it was due, not yet overdue.
    // Pump seal and hydraulic oil were never recorded: not counted as overdue.
    expect(care.faults).toBe(4);
    expect(care.faultsWithOverdue).toBe(3);
    expect(care.overdueByService).toEqual([{ name: "Grease points", faults: 3 }]);
    // The rig-days by the day's last reading: the 2nd ends at 108 h (48 h since grease: not yet over);
    // the 3rd (115 h), 4th (121 h) and 5th (128 h) end with grease overdue.
    expect(care.withOverdue).toMatchObject({ days: 3, hours: 20, faults: 3 });
    expect(care.withoutOverdue).toMatchObject({ days: 1, hours: 8, faults: 1 });
  });

  it("counts per rig and week the days worked, those with a complete pre-start, and the other cards", async () => {
    const care = await careFor(
      mo,
      { from: new Date("2026-06-02T00:00:00Z"), to: new Date("2026-06-07T00:00:00Z"), rigCode: "CF-07" },
      new Date("2026-12-01T00:00:00Z"),
    );
    const week = care.cardWeeks.find((r) => r.rigCode === "CF-07")!.cells.find((c) => c.week === "2026-06-01")!;
    // Worked the 1st (a shut-down card) to the 5th; complete pre-starts the 2nd and 5th; five shut-down cards.
    expect(week).toEqual({ week: "2026-06-01", workedDays: 5, preStartDays: 2, otherCards: 5 });
    expect(care.weeks[0]).toBe("2026-06-01");
  });
});
