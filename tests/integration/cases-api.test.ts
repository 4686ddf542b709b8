import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { Case, CaseEvent, Rig } from "../../db/index";
import { action as startAction } from "~/routes/api.cases";
import { loader as caseLoader } from "~/routes/api.cases.$id";
import { action as closeAction } from "~/routes/api.cases.$id.close";
import { action as eventsAction } from "~/routes/api.cases.$id.events";
import { resetDatabase } from "../helpers/db";
import { outbox } from "../helpers/outbox";
import { args, requestAs, run } from "../helpers/requests";

const DANA = "dana@cedarflats.example";
const SAM = "sam@bluemesa.example";
const post = (email: string | null, path: string, body: unknown) =>
  requestAs(email, path, { method: "POST", body: JSON.stringify(body), headers: { "Content-Type": "application/json" } });

async function start(email: string, rigCode: string, guideSlug: string, id = randomUUID()) {
  return run(async () => startAction(args(await post(email, "/api/cases", { id, rigCode, guideSlug }))));
}
const sendEvents = async (email: string, id: string, events: unknown[]) =>
  run(async () => eventsAction(args(await post(email, `/api/cases/${id}/events`, { events }), { id })));
const ev = (seq: number, stepId: string, answer: string) => ({
  id: randomUUID(),
  seq,
  stepId,
  answer,
  at: new Date(Date.UTC(2026, 5, 1, 14, seq)).toISOString(),
});

beforeAll(() => resetDatabase());

describe("starting a case", () => {
  it("creates a case with the client's id on the company's rig and the guide's published version", async () => {
    const id = randomUUID();
    const res = await start(DANA, "CF-07", "lost-prime", id);
    expect(res.status).toBe(201);
    expect(res.data).toEqual({ id });
    expect((await Case.findByPk(id))!.outcome).toBe("open");
    // Sending the same start again changes nothing.
    expect((await start(DANA, "CF-07", "lost-prime", id)).status).toBe(200);
    expect(await Case.count({ where: { id } })).toBe(1);
  });

  it("names bad fields with 400, and answers 404 for another company's rig", async () => {
    const bad = await run(async () => startAction(args(await post(DANA, "/api/cases", { rigCode: 7, id: "nope" }))));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.data.fields).sort()).toEqual(["guideSlug", "id", "rigCode"]);
    expect((await start(DANA, "BM-01", "lost-prime")).status).toBe(404);
    expect((await start(DANA, "CF-07", "no-such-guide")).status).toBe(404);
  });
});

describe("storing answers", () => {
  it("stores a resent batch once, and events that arrive out of order in sequence order", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "lost-prime", id);
    const batch = [ev(1, "water-level", "YES"), ev(2, "suction-valve", "NO")];
    expect((await sendEvents(DANA, id, batch)).data).toEqual({ stored: 2, duplicates: 0 });
    expect((await sendEvents(DANA, id, batch)).data).toEqual({ stored: 0, duplicates: 2 });
    const later = [ev(4, "holds-after-valve", "YES"), ev(3, "open-suction-valve", "DONE")];
    expect((await sendEvents(DANA, id, [later[0], batch[1]])).data).toEqual({ stored: 1, duplicates: 1 });
    expect((await sendEvents(DANA, id, [later[1]])).data).toEqual({ stored: 1, duplicates: 0 });
    const res = await run(async () => caseLoader(args(await requestAs(DANA, `/api/cases/${id}`), { id })));
    expect(res.data.events.map((e: { seq: number; stepId: string }) => `${e.seq}:${e.stepId}`)).toEqual([
      "1:water-level",
      "2:suction-valve",
      "3:open-suction-valve",
      "4:holds-after-valve",
    ]);
  });

  it("stores nothing of a batch with one event that does not fit the guide (422)", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "lost-prime", id);
    const res = await sendEvents(DANA, id, [ev(1, "water-level", "YES"), ev(2, "suction-valve", "DONE")]);
    expect(res.status).toBe(422);
    expect(res.data.error).toMatch(/event 2: a check step takes YES or NO, not DONE/);
    const ghost = await sendEvents(DANA, id, [ev(1, "no-such-step", "YES")]);
    expect(ghost.status).toBe(422);
    expect(await CaseEvent.count({ where: { caseId: id } })).toBe(0);
  });

  it("names a malformed event's fields with 400", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "lost-prime", id);
    const res = await sendEvents(DANA, id, [{ id: "x", seq: 0, stepId: "water-level", answer: "MAYBE", at: "yesterday" }]);
    expect(res.status).toBe(400);
    expect(Object.keys(res.data.fields).sort()).toEqual(["events.0.answer", "events.0.at", "events.0.id", "events.0.seq"]);
  });

  it("stores twenty identical batches sent at once exactly once, with no errors", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "lost-prime", id);
    const batch = [ev(1, "water-level", "NO"), ev(2, "add-water", "DONE"), ev(3, "holds-after-water", "YES")];
    const answers = await Promise.all(Array.from({ length: 20 }, () => sendEvents(DANA, id, batch)));
    expect(answers.map((a) => a.status)).toEqual(Array(20).fill(200));
    expect(answers.reduce((n, a) => n + a.data.stored, 0)).toBe(3);
    expect(await CaseEvent.count({ where: { caseId: id } })).toBe(3);
  });

  it("records when the safety stop was acknowledged", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "lost-prime", id);
    await sendEvents(DANA, id, [ev(1, "water-level", "YES"), ev(2, "suction-valve", "YES"), ev(3, "throttle", "NO"), ev(4, "stop-throttle", "ACK")]);
    expect((await Case.findByPk(id))!.safetyAckAt!.toISOString()).toBe("2026-06-01T14:04:00.000Z");
  });
});

describe("closing a case", () => {
  it("closes fixed with the cause of the end step and takes the engine hours", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "lost-prime", id);
    await sendEvents(DANA, id, [ev(1, "water-level", "NO"), ev(2, "add-water", "DONE"), ev(3, "holds-after-water", "YES")]);
    const res = await run(async () =>
      closeAction(args(await post(DANA, `/api/cases/${id}/close`, { outcome: "fixed", finalStep: "fixed-low-water", engineHours: 2400 }), { id })),
    );
    expect(res.status).toBe(200);
    expect(await Case.findByPk(id)).toMatchObject({ outcome: "fixed", causeCode: "low-water", engineHours: 2400 });
    expect((await Rig.findOne({ where: { code: "CF-07" } }))!.engineHours).toBe(2400);
  });

  it("refuses an outcome that does not match the end step", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "lost-prime", id);
    const res = await run(async () => closeAction(args(await post(DANA, `/api/cases/${id}/close`, { outcome: "fixed", finalStep: "handoff-pump" }), { id })));
    expect(res.status).toBe(422);
    expect((await Case.findByPk(id))!.outcome).toBe("open");
  });

  it("mails a hand-off to the company's supervisor only, once", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "leaks", id);
    await sendEvents(DANA, id, [ev(1, "at-coupling", "YES"), ev(2, "stop-coupling", "ACK"), ev(3, "fix-coupling", "CANT")]);
    const before = (await outbox()).length;
    const close = () =>
      run(async () =>
        closeAction(args(await post(DANA, `/api/cases/${id}/close`, { outcome: "handoff", finalStep: "handoff-leak", note: "Gasket seat cracked" }), { id })),
      );
    const res = await close();
    expect(res.data).toMatchObject({ outcome: "handoff", notified: ["Mo Brennan"] });
    const mails = (await outbox()).slice(before);
    expect(mails).toHaveLength(1);
    expect(mails[0].to).toEqual(["mo@cedarflats.example"]);
    expect(mails[0].subject).toBe("Hand-off: CF-07 — Leaks");
    expect(mails[0].text).toMatch(/Crew note: Gasket seat cracked/);
    expect(mails[0].text).toMatch(/Is the leak at a hose cam-lock coupling\?\n\s+→ Yes/);
    expect(mails[0].text).toContain(`/cases/${id}`);
    // A resend of the close is told the truth: who was mailed, and when.
    const again = (await close()).data;
    expect(again).toMatchObject({ alreadyClosed: true, notified: ["Mo Brennan"], mailFailed: false });
    expect(again.mailedAt).toBe((await Case.findByPk(id))!.handoffMailedAt!.toISOString());
    expect((await outbox()).length).toBe(before + 1);
    // Times in the mail are the company's (America/Denver in the demo), named with the zone.
    expect(mails[0].text).toMatch(/ 8:0[1-3]:00 AM MDT {2}Is the leak at a hose cam-lock coupling\?/);
  });

  it("sends one hand-off mail for twenty closes arriving at once, and tells each of them who was mailed", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "leaks", id);
    await sendEvents(DANA, id, [ev(1, "at-coupling", "YES"), ev(2, "stop-coupling", "ACK"), ev(3, "fix-coupling", "CANT")]);
    const before = (await outbox()).length;
    const results = await Promise.all(
      Array.from({ length: 20 }, async () =>
        run(async () => closeAction(args(await post(DANA, `/api/cases/${id}/close`, { outcome: "handoff", finalStep: "handoff-leak" }), { id }))),
      ),
    );
    expect(results.map((r) => r.status)).toEqual(Array(20).fill(200));
    // The closes that lost the race waited for the one sending: none settles for "not confirmed".
    expect(results.map((r) => (r.data as { notified: string[] }).notified)).toEqual(Array(20).fill(["Mo Brennan"]));
    await new Promise((r) => setTimeout(r, 300));
    expect((await outbox()).slice(before).filter((m) => m.text.includes(`/cases/${id}`))).toHaveLength(1);
    expect((await Case.findByPk(id))!.handoffMailedTo).toBe("Mo Brennan");
  });

  it("takes no new answers once closed (409, nothing stored), while a resend of earlier ones is still a duplicate", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "lost-prime", id);
    const answered = [ev(1, "water-level", "NO"), ev(2, "add-water", "DONE"), ev(3, "holds-after-water", "YES")];
    await sendEvents(DANA, id, answered);
    await run(async () => closeAction(args(await post(DANA, `/api/cases/${id}/close`, { outcome: "fixed", finalStep: "fixed-low-water" }), { id })));
    const late = await sendEvents(DANA, id, [ev(4, "holds-after-water", "BACK")]);
    expect(late.status).toBe(409);
    expect(late.data.error).toMatch(/closed as fixed and takes no more answers/);
    const mixed = await sendEvents(DANA, id, [answered[2], ev(5, "holds-after-water", "BACK")]);
    expect(mixed.status).toBe(409);
    expect(await CaseEvent.count({ where: { caseId: id } })).toBe(3);
    expect((await sendEvents(DANA, id, answered)).data).toEqual({ stored: 0, duplicates: 3 });
  });
});

describe("company boundaries", () => {
  it("answers 404 on every case API for another company's case", async () => {
    const id = randomUUID();
    await start(DANA, "CF-07", "foaming", id);
    expect((await run(async () => caseLoader(args(await requestAs(SAM, `/api/cases/${id}`), { id })))).status).toBe(404);
    expect((await sendEvents(SAM, id, [ev(1, "agitator-speed", "YES")])).status).toBe(404);
    expect((await run(async () => closeAction(args(await post(SAM, `/api/cases/${id}/close`, { outcome: "abandoned" }), { id })))).status).toBe(404);
    expect((await start(SAM, "BM-01", "foaming", id)).status).toBe(409);
    expect(await CaseEvent.count({ where: { caseId: id } })).toBe(0);
  });

  it("asks a signed-out caller to sign in (401)", async () => {
    expect((await start(null as never, "CF-07", "foaming")).status).toBe(401);
  });
});
