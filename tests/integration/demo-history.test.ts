import { beforeAll, describe, expect, it } from "vitest";
import { QueryTypes } from "sequelize";
import { Case, db, GuideRecord, User } from "../../db/index";
import { learnFromCases } from "~/services/desk.server";
import { seedDemoHistory } from "../../seeds/demo-history";
import { resetDatabase } from "../helpers/db";

const now = new Date(Date.UTC(2026, 11, 1));
let count = 0;

beforeAll(async () => {
  await resetDatabase();
  count = await seedDemoHistory(now, () => {});
});

const perRig = () =>
  db().query<{ code: string; n: number; hours: number }>(
    "SELECT r.code, COUNT(*) AS n, MAX(c.engine_hours) - MIN(c.engine_hours) AS hours FROM cases c JOIN rigs r ON r.id = c.rig_id WHERE c.kind = 'fix' GROUP BY r.code ORDER BY r.code",
    { type: QueryTypes.SELECT },
  );

describe("demo history", () => {
  it("holds at least 2,000 cases over the year, for both companies", async () => {
    expect(count).toBeGreaterThanOrEqual(2000);
    const oldest = await Case.min<Date, Case>("openedAt");
    expect(now.getTime() - new Date(oldest).getTime()).toBeGreaterThan(200 * 86_400_000);
    const companies = await db().query("SELECT DISTINCT company_id FROM cases", { type: QueryTypes.SELECT });
    expect(companies).toHaveLength(2);
  });

  it("makes CF-03 clearly worse than CF-11, with engine hours rising", async () => {
    const rows = Object.fromEntries((await perRig()).map((r) => [r.code, r]));
    expect(Number(rows["CF-03"].n)).toBeGreaterThan(3 * Number(rows["CF-11"].n));
    expect(Number(rows["CF-07"].hours)).toBeGreaterThan(500);
  });

  it("contains repeats: the same cause on the same rig within 30 days", async () => {
    const [row] = await db().query<{ repeats: number }>(
      `SELECT COUNT(*) AS repeats FROM cases a JOIN cases b ON a.rig_id = b.rig_id AND a.cause_code = b.cause_code
       AND b.opened_at > a.opened_at AND b.opened_at <= a.opened_at + INTERVAL 30 DAY WHERE a.cause_code = 'suction-air-leak'`,
      { type: QueryTypes.SELECT },
    );
    expect(Number(row.repeats)).toBeGreaterThan(10);
  });

  it("feeds the guide desk: how crews went through lost-prime, and a check order no slower than the guide's", async () => {
    const mo = (await User.findOne({ where: { email: "mo@cedarflats.example" } }))!;
    const user = { id: mo.id, name: mo.name, email: mo.email, role: mo.role, companyId: mo.companyId, companyName: "", timeZone: "America/Denver" };
    const guide = (await GuideRecord.findOne({ where: { scope: "builtin", slug: "lost-prime" } }))!;
    const learned = (await learnFromCases(user, guide.id))!;
    const companyCases = await Case.count({
      where: {
        companyId: mo.companyId,
        guideVersionId: (
          (await db().query("SELECT id FROM guide_versions WHERE guide_id = ? AND status = 'published'", {
            replacements: [guide.id],
            type: QueryTypes.SELECT,
          })) as { id: number }[]
        )[0].id,
      },
    });
    expect(learned.cases).toBe(companyCases);
    const first = learned.flow.find((f) => f.stepId === "water-level")!;
    expect(first.reached).toBe(companyCases);
    expect(first.medianSeconds).toBeGreaterThan(0);
    expect(learned.advisor.suggestedMinutes).toBeLessThanOrEqual(learned.advisor.currentMinutes + 1e-9);
    expect(learned.advisor.foundCases).toBeGreaterThan(0);
  });

  it("holds a year of rig cards with a pattern to find: CF-03 skips the pre-start and leaks at the pump shaft", async () => {
    const rows = await db().query<{ code: string; prestarts: number; complete: number; days: number; shaft: number; fixes: number }>(
      `SELECT r.code,
          (SELECT COUNT(*) FROM cases c JOIN guide_versions v ON v.id = c.guide_version_id JOIN guides g ON g.id = v.guide_id
            WHERE c.rig_id = r.id AND c.kind = 'card' AND g.slug = 'pre-start') AS prestarts,
          (SELECT COUNT(*) FROM cases c JOIN guide_versions v ON v.id = c.guide_version_id JOIN guides g ON g.id = v.guide_id
            WHERE c.rig_id = r.id AND c.kind = 'card' AND g.slug = 'pre-start' AND c.outcome = 'fixed' AND c.card_gaps = 0) AS complete,
          (SELECT COUNT(DISTINCT DATE(c.opened_at)) FROM cases c WHERE c.rig_id = r.id AND c.kind = 'card') AS days,
          (SELECT COUNT(*) FROM cases c WHERE c.rig_id = r.id AND c.kind = 'fix' AND c.cause_code = 'leak-pump-shaft-seal') AS shaft,
          (SELECT COUNT(*) FROM cases c WHERE c.rig_id = r.id AND c.kind = 'fix') AS fixes
        FROM rigs r ORDER BY r.code`,
      { type: QueryTypes.SELECT },
    );
    const by = Object.fromEntries(rows.map((r) => [r.code, { ...r, prestarts: Number(r.prestarts), complete: Number(r.complete), shaft: Number(r.shaft) }]));
    for (const r of rows) expect(Number(r.prestarts), r.code).toBeGreaterThan(100);
    expect(by["CF-03"].complete / Number(by["CF-03"].days)).toBeLessThan(0.6);
    expect(by["CF-11"].complete / Number(by["CF-11"].days)).toBeGreaterThan(0.85);
    expect(by["CF-03"].shaft).toBeGreaterThan(3 * by["CF-11"].shaft);
    // Cards record the lubricator and grease services with the card's hours.
    const [svc] = await db().query<{ n: number; hours: number }>(
      "SELECT COUNT(*) AS n, SUM(engine_hours IS NOT NULL) AS hours FROM service_records WHERE case_id IS NOT NULL",
      { type: QueryTypes.SELECT },
    );
    expect(Number(svc.n)).toBeGreaterThan(1000);
  });

  it("is the same every time from its fixed seed", async () => {
    const first = await perRig();
    await resetDatabase();
    await seedDemoHistory(now, () => {});
    expect(await perRig()).toEqual(first);
  });
});
