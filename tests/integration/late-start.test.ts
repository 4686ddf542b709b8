import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { Case, CaseEvent, GuideRecord, GuideVersion, Rig } from "../../db/index";
import { action as startAction } from "~/routes/api.cases";
import { action as eventsAction } from "~/routes/api.cases.$id.events";
import { resetDatabase } from "../helpers/db";
import { args, requestAs, run } from "../helpers/requests";

// A fix started on a phone with no signal reaches the server later: its own id, opening time and guide version.
const DANA = "dana@cedarflats.example";
const SAM = "sam@bluemesa.example";
const DAY = 86_400_000;
const post = (email: string, path: string, body: unknown) =>
  requestAs(email, path, { method: "POST", body: JSON.stringify(body), headers: { "Content-Type": "application/json" } });
const start = async (email: string, body: Record<string, unknown>) => run(async () => startAction(args(await post(email, "/api/cases", body))));

async function publishedVersion(slug: string, companyId: number | null = null) {
  const guide = (await GuideRecord.findOne({ where: { slug, companyId } }))!;
  return (await GuideVersion.findOne({ where: { guideId: guide.id, number: guide.publishedVersion! } }))!;
}

beforeAll(() => resetDatabase());

describe("a start sent late", () => {
  it("keeps the phone's opening time (3 days ago) and the version it walked, and a resend stores it once", async () => {
    const id = randomUUID();
    const version = await publishedVersion("plugging");
    const openedAt = new Date(Date.now() - 3 * DAY).toISOString();
    const body = { id, rigCode: "CF-07", guideSlug: "plugging", openedAt, guideVersionId: version.id };
    expect((await start(DANA, body)).status).toBe(201);
    expect((await start(DANA, body)).status).toBe(200);
    const stored = (await Case.findByPk(id))!;
    expect(stored.openedAt.toISOString()).toBe(openedAt);
    expect(stored.guideVersionId).toBe(version.id);
    expect(await Case.count({ where: { id } })).toBe(1);
    // Its answers follow, as for any case.
    const answer = { id: randomUUID(), seq: 1, stepId: "pressure-holding", answer: "YES", at: new Date(Date.now() - 3 * DAY + 60_000).toISOString() };
    expect((await run(async () => eventsAction(args(await post(DANA, `/api/cases/${id}/events`, { events: [answer] }), { id })))).status).toBe(200);
    expect(await CaseEvent.count({ where: { caseId: id } })).toBe(1);
  });

  it("stores a start sent twice at once (two tabs of one phone) once, answering both without an error", async () => {
    const id = randomUUID();
    const body = { id, rigCode: "CF-07", guideSlug: "leaks", openedAt: new Date(Date.now() - 60_000).toISOString() };
    const statuses = (await Promise.all([start(DANA, body), start(DANA, body), start(DANA, body)])).map((r) => r.status).sort();
    expect(statuses[0]).toBe(200);
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.every((s) => s === 200 || s === 201)).toBe(true);
    expect(await Case.count({ where: { id } })).toBe(1);
  });

  it("accepts a version retired since: the crew followed it", async () => {
    const current = await publishedVersion("foaming");
    const guide = (await GuideRecord.findByPk(current.guideId))!;
    const next = await GuideVersion.create({
      guideId: guide.id,
      number: current.number + 1,
      status: "published",
      definition: current.definition,
      changeNote: "A newer edition",
      sourceHash: "newer-edition",
      authorId: null,
      reviewerId: null,
      reviewComment: null,
      publishedAt: new Date(),
    });
    await current.update({ status: "retired" });
    await guide.update({ publishedVersion: next.number });
    const id = randomUUID();
    const res = await start(DANA, {
      id,
      rigCode: "CF-07",
      guideSlug: "foaming",
      openedAt: new Date(Date.now() - DAY).toISOString(),
      guideVersionId: current.id,
    });
    expect(res.status).toBe(201);
    expect((await Case.findByPk(id))!.guideVersionId).toBe(current.id);
    // Without a version the newest published one is used.
    const fresh = randomUUID();
    expect((await start(DANA, { id: fresh, rigCode: "CF-07", guideSlug: "foaming" })).status).toBe(201);
    expect((await Case.findByPk(fresh))!.guideVersionId).toBe(next.id);
  });

  it("refuses a start more than 7 days old, or ahead of the server's clock, and names why", async () => {
    const old = await start(DANA, { id: randomUUID(), rigCode: "CF-07", guideSlug: "leaks", openedAt: new Date(Date.now() - 8 * DAY).toISOString() });
    expect(old.status).toBe(422);
    expect(old.data.error).toMatch(/more than 7 days ago.*answers stay on this phone; tell your supervisor/);
    const ahead = await start(DANA, { id: randomUUID(), rigCode: "CF-07", guideSlug: "leaks", openedAt: new Date(Date.now() + DAY).toISOString() });
    expect(ahead.status).toBe(422);
    expect(ahead.data.fields).toEqual({ openedAt: "in the future" });
  });

  it("refuses a version that is a draft, of another guide, or of another company's guide (404)", async () => {
    const leaks = await publishedVersion("leaks");
    expect((await start(DANA, { id: randomUUID(), rigCode: "CF-07", guideSlug: "plugging", guideVersionId: leaks.id })).status).toBe(404);
    const draft = await GuideVersion.create({
      guideId: leaks.guideId,
      number: 99,
      status: "draft",
      definition: leaks.definition,
      changeNote: null,
      sourceHash: "draft-99",
      authorId: null,
      reviewerId: null,
      reviewComment: null,
      publishedAt: null,
    });
    expect((await start(DANA, { id: randomUUID(), rigCode: "CF-07", guideSlug: "leaks", guideVersionId: draft.id })).status).toBe(404);
    // Blue Mesa may use the built-in leaks guide, but not a Cedar Flats rig.
    expect((await start(SAM, { id: randomUUID(), rigCode: "CF-07", guideSlug: "leaks", guideVersionId: leaks.id })).status).toBe(404);
  });

  it("refuses a new start on a rig retired meanwhile, saying whom to tell; a start already stored is still acknowledged", async () => {
    const stored = randomUUID();
    expect((await start(DANA, { id: stored, rigCode: "CF-03", guideSlug: "leaks" })).status).toBe(201);
    await Rig.update({ retired: true }, { where: { code: "CF-03" } });
    const refused = await start(DANA, { id: randomUUID(), rigCode: "CF-03", guideSlug: "leaks", openedAt: new Date(Date.now() - DAY).toISOString() });
    expect(refused.status).toBe(409);
    expect(refused.data.error).toMatch(/Rig CF-03 has been retired.*Tell your supervisor/);
    expect((await start(DANA, { id: stored, rigCode: "CF-03", guideSlug: "leaks" })).status).toBe(200);
    await Rig.update({ retired: false }, { where: { code: "CF-03" } });
  });
});

describe("the kit a phone keeps for no signal", () => {
  it("holds the company's active rigs with their specs, the guides its crews may start and cause names, and nothing of another company", async () => {
    const { loader } = await import("~/routes/api.offline-kit");
    const res = await run(async () => loader(args(await requestAs(DANA, "/api/offline-kit"))));
    expect(res.status).toBe(200);
    const kit = res.data as {
      rigs: { code: string; agitatorMixes: string }[];
      guides: { slug: string; versionId: number; definition: { states: object } }[];
      causeNames: Record<string, string>;
    };
    const codes = kit.rigs.map((r) => r.code);
    expect(codes).toEqual(expect.arrayContaining(["CF-03", "CF-07", "CF-11"]));
    expect(codes.some((c) => c.startsWith("BM-"))).toBe(false);
    expect(kit.rigs.every((r) => r.agitatorMixes === "forward" || r.agitatorMixes === "reverse")).toBe(true);
    expect(kit.guides.length).toBeGreaterThanOrEqual(11);
    expect(kit.guides.every((g) => g.versionId > 0 && Object.keys(g.definition.states).length > 0)).toBe(true);
    expect(kit.causeNames["suction-air-leak"]).toMatch(/Air leaking/);
  });

  it("stays inside its size budget: 512 KB as sent, 64 KB gzipped", async () => {
    const { gzipSync } = await import("node:zlib");
    const { loader } = await import("~/routes/api.offline-kit");
    const res = await run(async () => loader(args(await requestAs(DANA, "/api/offline-kit"))));
    const body = Buffer.from(JSON.stringify(res.data));
    const gz = gzipSync(body).length;
    console.info(`offline kit: ${(body.length / 1024).toFixed(1)} KB, ${(gz / 1024).toFixed(1)} KB gzipped`);
    expect(body.length).toBeLessThan(512 * 1024);
    expect(gz).toBeLessThan(64 * 1024);
  });
});
