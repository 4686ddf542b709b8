import { QueryTypes } from "sequelize";
import { beforeAll, describe, expect, it } from "vitest";
import { Case, db, Rig, ServiceRecord, ServiceRule, User } from "../../db/index";
import { action as startApi } from "~/routes/api.cases";
import { action as eventsApi } from "~/routes/api.cases.$id.events";
import { loader as walkLoader } from "~/routes/cases.$id.walk";
import { loader as caseLoader } from "~/routes/cases.$id";
import { loader as casesPage } from "~/routes/cases";
import { caseDetail } from "~/services/case-detail.server";
import { todaysFacts } from "~/services/cards.server";
import type { SessionUser } from "~/services/guards.server";
import { PRE_START_ANSWERS, preStartWalk, walkThroughApi } from "../helpers/cases";
import { resetDatabase } from "../helpers/db";
import { args, requestAs, run } from "../helpers/requests";

const DANA = "dana@cedarflats.example";
const SAM = "sam@bluemesa.example";
const post = async (email: string, path: string, body: unknown) =>
  requestAs(email, path, { method: "POST", body: JSON.stringify(body), headers: { "Content-Type": "application/json" } });

let cf07: Rig;
let dana: SessionUser;
beforeAll(async () => {
  await resetDatabase();
  cf07 = (await Rig.findOne({ where: { code: "CF-07" } }))!;
  const u = (await User.findOne({ where: { email: DANA } }))!;
  dana = { id: u.id, name: u.name, email: u.email, role: u.role, companyId: u.companyId, companyName: "Cedar Flats", timeZone: "America/Denver" };
  // The demo's rules name the card tasks that record them.
  expect(await ServiceRule.count({ where: { rigId: cf07.id, task: "grease" } })).toBe(1);
});

describe("a rig card", () => {
  it("needs the hour meter as it starts on a rig that has one, and refuses it with the field named", async () => {
    const res = await run(async () => startApi(args(await post(DANA, "/api/cases", { rigCode: "CF-07", guideSlug: "pre-start" }))));
    expect(res.status).toBe(422);
    expect(res.data.fields).toEqual({ engineHours: "required for a card on this rig" });
    expect(await Case.count({ where: { kind: "card" } })).toBe(0);
  });

  it("is saved as a card with its reading, raises the rig's hours, records its services once, and counts as no fault", async () => {
    const before = cf07.engineHours;
    const faultsOnBoard = () => db().query<{ n: number }>("SELECT COALESCE(SUM(cases), 0) AS n FROM board_rig_days", { type: QueryTypes.SELECT });
    const boardFaults = await faultsOnBoard();
    const id = await walkThroughApi(DANA, preStartWalk(before + 4.5));
    const card = (await Case.findByPk(id))!;
    expect(card.kind).toBe("card");
    expect(card.engineHours).toBe(before + 4.5);
    expect(card.cardGaps).toBe(0);
    expect(card.outcome).toBe("fixed");
    expect((await Rig.findByPk(cf07.id))!.engineHours).toBe(before + 4.5);
    const records = await ServiceRecord.findAll({ where: { caseId: id }, include: [] });
    const rules = new Map((await ServiceRule.findAll({ where: { rigId: cf07.id } })).map((r) => [r.id, r.task]));
    expect(records.map((r) => rules.get(r.ruleId)).sort()).toEqual(["grease", "lubricator"]);
    expect(records.every((r) => r.engineHours === before + 4.5)).toBe(true);
    // Not a fault: no fault on the board (its reading measures the rig's day), not in the cases table.
    expect(await faultsOnBoard()).toEqual(boardFaults);
    const [day] = await db().query<{ max_hours: string }>("SELECT max_hours FROM board_rig_days WHERE rig_id = :rig AND day = DATE(:at)", {
      replacements: { rig: cf07.id, at: card.openedAt },
      type: QueryTypes.SELECT,
    });
    expect(Number(day.max_hours)).toBe(before + 4.5);
    const table = await run(async () => casesPage(args(await requestAs("mo@cedarflats.example", "/cases"))));
    expect(table.data.rows.map((r: { id: string }) => r.id)).not.toContain(id);
    // Asked for, the cards are a list of their own, with their own words.
    const cards = await run(async () => casesPage(args(await requestAs("mo@cedarflats.example", "/cases?kind=card&rig=CF-07"))));
    expect(cards.data.rows.map((r: { id: string }) => r.id)).toEqual([id]);
    expect(cards.data.rows[0]).toMatchObject({ kind: "card", cardGaps: 0, guideTitle: "Pre-start" });
  });

  it("counts an item answered can't-do-it as a gap, and records no service for it", async () => {
    const id = await walkThroughApi(DANA, preStartWalk(cf07.engineHours + 9, { skipGrease: true }));
    expect((await Case.findByPk(id))!.cardGaps).toBe(1);
    const rules = new Map((await ServiceRule.findAll({ where: { rigId: cf07.id } })).map((r) => [r.id, r.task]));
    expect((await ServiceRecord.findAll({ where: { caseId: id } })).map((r) => rules.get(r.ruleId))).toEqual(["lubricator"]);
  });

  it("a closed card takes no answers", async () => {
    const id = await walkThroughApi(DANA, preStartWalk(cf07.engineHours + 10));
    const event = { id: crypto.randomUUID(), seq: 50, stepId: "stop", answer: "ACK", at: new Date().toISOString() };
    const res = await run(async () => eventsApi(args(await post(DANA, `/api/cases/${id}/events`, { events: [event] }), { id })));
    expect(res.status).toBe(409);
  });
});

describe("a card item that opens a guide", () => {
  it("starts the fix linked to the card; both case pages show the link", async () => {
    const cardId = await walkThroughApi(DANA, {
      ...preStartWalk(cf07.engineHours + 11),
      // Valves that do not move: the valve guide, then carry on.
      answers: PRE_START_ANSWERS.flatMap(([step, a]): [string, string][] =>
        step === "valves"
          ? [
              ["valves", "NO"],
              ["valve-guide", "DONE"],
            ]
          : [[step, a]],
      ),
    });
    // Answering "no" to the valves item offers the valve guide; the fix it starts names the card.
    const linked = await startLinked(cardId);
    const fix = await caseDetail(dana, linked);
    expect(fix.fromCard).toEqual({ caseId: cardId, title: "Pre-start" });
    const card = await caseDetail(dana, cardId);
    expect(card.fixesOpened.map((f) => f.caseId)).toContain(linked);
    const page = await run(async () => caseLoader(args(await requestAs("mo@cedarflats.example", `/cases/${cardId}`), { id: cardId })));
    expect(page.status).toBe(200);
  });

  it("refuses a link to another company's card (404) or to a fix, and keeps one to a card not sent yet", async () => {
    const bm01 = (await Rig.findOne({ where: { code: "BM-01" } }))!;
    const theirs = await walkThroughApi(SAM, { ...preStartWalk(bm01.engineHours + 1), rigCode: "BM-01" });
    const start = (fromCaseId: string) => run(async () => startApi(args(await post(DANA, "/api/cases", { rigCode: "CF-07", guideSlug: "leaks", fromCaseId }))));
    const aFix = (await Case.findOne({ where: { kind: "fix", rigId: cf07.id } }))!;
    const before = await Case.count();
    expect((await start(theirs)).status).toBe(404);
    expect((await start(aFix.id)).status).toBe(404);
    expect(await Case.count()).toBe(before);
    const later = crypto.randomUUID();
    const ok = (await startApi(args(await post(DANA, "/api/cases", { rigCode: "CF-07", guideSlug: "leaks", fromCaseId: later })))) as Response;
    expect(ok.status).toBe(201);
    const { id } = await ok.json();
    expect((await Case.findByPk(id))!.fromCaseId).toBe(later);
  });
});

describe("guides read today's cards", () => {
  it("the walk of a leaks fix carries today's lubricator answer; yesterday's card does not count", async () => {
    const fix = (await startApi(args(await post(DANA, "/api/cases", { rigCode: "CF-07", guideSlug: "leaks" })))) as Response;
    const { id } = await fix.json();
    const walk = await run(async () => walkLoader(args(await requestAs(DANA, `/cases/${id}/walk`), { id })));
    const fact = walk.data.dayFacts["lubricator-charged"];
    expect(fact.value).toBe(true);
    expect(fact.card).toBe("Pre-start");
    expect(fact.by).toBe("Dana Whitlock");
    // On CF-11 the only pre-start was yesterday's: nothing is offered today.
    const cf11 = (await Rig.findOne({ where: { code: "CF-11" } }))!;
    await walkThroughApi(DANA, { ...preStartWalk(cf11.engineHours + 2, { at: new Date(Date.now() - 30 * 3_600_000) }), rigCode: "CF-11" });
    const leaks = (await import("~/lib/guides/files.server")).loadLibrary().find((g) => g.id === "leaks")!;
    expect(await todaysFacts(dana, cf11.id, leaks)).toEqual({});
    expect((await todaysFacts(dana, cf07.id, leaks))["lubricator-charged"]?.value).toBe(true);
  });

  it("takes the latest answer of the day, after taking back what was undone", async () => {
    const { dayFacts } = await import("~/lib/walk/day-facts");
    const card = (await import("~/lib/guides/files.server")).loadLibrary().find((g) => g.id === "pre-start")!;
    const facts = dayFacts([
      {
        title: "Pre-start",
        definition: card,
        by: "Dana",
        events: [
          { stepId: "drain-plug", answer: "NO", at: "2026-06-01T13:01:00Z" },
          { stepId: "fit-drain-plug", answer: "DONE", at: "2026-06-01T13:03:00Z" },
          { stepId: "suction-valve", answer: "YES", at: "2026-06-01T13:04:00Z" },
          { stepId: "suction-valve", answer: "BACK", at: "2026-06-01T13:04:30Z" },
        ],
      },
    ]);
    expect(facts["drain-plug-in"]).toMatchObject({ value: true, at: "2026-06-01T13:03:00Z" });
    expect(facts["suction-open"]).toBeUndefined();
  });
});

async function startLinked(cardId: string): Promise<string> {
  const res = (await startApi(args(await post(DANA, "/api/cases", { rigCode: "CF-07", guideSlug: "valve-trouble", fromCaseId: cardId })))) as Response;
  expect(res.status).toBe(201);
  return (await res.json()).id;
}
