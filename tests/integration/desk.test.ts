import fs from "node:fs";
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { Case, GuideRecord, GuideVersion, guideScope, User } from "../../db/index";
import { action as saveApi } from "~/routes/api.desk.$guideId.v.$number";
import { loader as deskLayout } from "~/routes/desk";
import { action as guideAction, loader as guideLoader } from "~/routes/desk.$guideId";
import { loader as diffLoader } from "~/routes/desk.$guideId.diff";
import { loader as editLoader } from "~/routes/desk.$guideId.v.$number";
import { loader as exportLoader } from "~/routes/desk.$guideId.v.$number.export";
import { loader as previewLoader } from "~/routes/desk.$guideId.v.$number.preview";
import { action as deskAction, loader as deskLoader } from "~/routes/desk._index";
import { startCase } from "~/services/cases.server";
import { usableGuides } from "~/services/guides.server";
import { resetDatabase } from "../helpers/db";
import { fixture } from "../helpers/guides";
import { args, requestAs, run } from "../helpers/requests";

const CREW = "dana@cedarflats.example";
const TRAINER = "ravi@cedarflats.example";
const SUPERVISOR = "mo@cedarflats.example";
const OTHER = "li@bluemesa.example";
const form = async (email: string, path: string, body: Record<string, string>, params: Record<string, string>) =>
  run(async () => guideAction(args(await requestAs(email, path, { form: body }), params)));
const sessionUser = async (email: string) => {
  const u = (await User.findOne({ where: { email } }))!;
  return { id: u.id, name: u.name, email, role: u.role, companyId: u.companyId, companyName: "", timeZone: "America/Denver" };
};
let builtinFoaming: GuideRecord;

beforeAll(async () => {
  await resetDatabase();
  builtinFoaming = (await GuideRecord.findOne({ where: { scope: "builtin", slug: "foaming" } }))!;
});

describe("access", () => {
  it("gives crew 403 on every desk page and API", async () => {
    const id = String(builtinFoaming.id);
    const p = { guideId: id, number: "1" };
    const calls = [
      () => deskLayout(args(new Request("http://x/desk"))),
      async () => deskLoader(args(await requestAs(CREW, "/desk"))),
      async () => deskAction(args(await requestAs(CREW, "/desk", { form: { intent: "new", title: "Hopper" } }))),
      async () => guideLoader(args(await requestAs(CREW, `/desk/${id}`), p)),
      async () => guideAction(args(await requestAs(CREW, `/desk/${id}`, { form: { intent: "edit" } }), p)),
      async () => editLoader(args(await requestAs(CREW, `/desk/${id}/v/1`), p)),
      async () => previewLoader(args(await requestAs(CREW, `/desk/${id}/v/1/preview`), p)),
      async () => exportLoader(args(await requestAs(CREW, `/desk/${id}/v/1/export`), p)),
      async () => diffLoader(args(await requestAs(CREW, `/desk/${id}/diff?a=1&b=1`), p)),
      async () =>
        saveApi(args(await requestAs(CREW, `/api/desk/${id}/v/1`, { method: "POST", body: "{}", headers: { "Content-Type": "application/json" } }), p)),
    ];
    const [layout, ...rest] = calls;
    expect((await run(layout as () => Promise<unknown>)).status).toBe(302); // signed out: to sign-in
    for (const call of rest) expect((await run(call as () => Promise<unknown>)).status).toBe(403);
  });

  it("answers 404 for another company's guide", async () => {
    const res = await run(async () => deskAction(args(await requestAs(OTHER, "/desk", { form: { intent: "new", title: "Blue Mesa only" } }))));
    const guideId = res.location!.split("/")[2];
    expect((await run(async () => guideLoader(args(await requestAs(TRAINER, `/desk/${guideId}`), { guideId })))).status).toBe(404);
    expect((await run(async () => editLoader(args(await requestAs(SUPERVISOR, `/desk/${guideId}/v/1`), { guideId, number: "1" })))).status).toBe(404);
    expect((await run(async () => exportLoader(args(await requestAs(TRAINER, "/x"), { guideId, number: "1" })))).status).toBe(404);
  });
});

describe("drafts, review and publishing", () => {
  let copyId: string;

  it("makes a company copy when a trainer edits a built-in guide, leaving the built-in as it is", async () => {
    const before = await GuideVersion.findOne({ where: { guideId: builtinFoaming.id } });
    const res = await form(TRAINER, "/desk/x", { intent: "edit" }, { guideId: String(builtinFoaming.id) });
    expect(res.status).toBe(302);
    copyId = res.location!.split("/")[2];
    expect(copyId).not.toBe(String(builtinFoaming.id));
    const copy = await GuideRecord.findByPk(Number(copyId));
    expect(copy).toMatchObject({ slug: "foaming", basedOnGuideId: builtinFoaming.id, publishedVersion: null });
    expect((await GuideVersion.findOne({ where: { guideId: builtinFoaming.id } }))!.toJSON()).toEqual(before!.toJSON());
    // Opening again returns the same draft, not a second one.
    expect((await form(TRAINER, "/desk/x", { intent: "edit" }, { guideId: String(builtinFoaming.id) })).location).toBe(res.location);
  });

  it("saves a draft (twice is the same as once) and never over a published version", async () => {
    const draft = (await GuideVersion.findOne({ where: { guideId: Number(copyId), status: "draft" } }))!;
    const definition = structuredClone(draft.definition);
    definition.states["agitator-speed"].meta.prompt = "Is the agitator faster than half speed right now?";
    const save = async () =>
      run(async () =>
        saveApi(
          args(await requestAs(TRAINER, "/x", { method: "POST", body: JSON.stringify({ definition }), headers: { "Content-Type": "application/json" } }), {
            guideId: copyId,
            number: String(draft.number),
          }),
        ),
      );
    expect((await save()).data).toEqual({ problems: [] });
    const once = (await draft.reload()).updatedAt;
    expect((await save()).status).toBe(200);
    expect((await draft.reload()).updatedAt).toEqual(once);
    const published = (await GuideVersion.findOne({ where: { guideId: builtinFoaming.id } }))!;
    const over = await run(async () =>
      saveApi(
        args(await requestAs(TRAINER, "/x", { method: "POST", body: JSON.stringify({ definition }), headers: { "Content-Type": "application/json" } }), {
          guideId: String(builtinFoaming.id),
          number: String(published.number),
        }),
      ),
    );
    expect(over.status).toBe(409);
  });

  it("refuses to send a draft with a hands-on step that skips the safety stop", async () => {
    const draft = (await GuideVersion.findOne({ where: { guideId: Number(copyId), status: "draft" } }))!;
    const bad = structuredClone(draft.definition);
    bad.states["sputters"].on!.YES = "open-pump"; // skips stop-check-pump
    await draft.update({ definition: bad });
    const res = await form(TRAINER, "/x", { intent: "submit", number: String(draft.number), changeNote: "Shorter" }, { guideId: copyId });
    expect(res.status).toBe(422);
    expect((await draft.reload()).status).toBe("draft");
    bad.states["sputters"].on!.YES = "stop-check-pump";
    await draft.update({ definition: bad });
  });

  it("lets a trainer submit but not publish; a supervisor publishes and the old version stays untouched", async () => {
    const user = await sessionUser(CREW);
    const rigCase = await startCase(user, { id: randomUUID(), rigCode: "CF-07", guideSlug: "foaming" });
    const oldVersionId = (await Case.findByPk(rigCase.id))!.guideVersionId;
    const oldVersion = (await GuideVersion.findByPk(oldVersionId))!.toJSON();

    const draft = (await GuideVersion.findOne({ where: { guideId: Number(copyId), status: "draft" } }))!;
    expect(
      (await form(TRAINER, "/x", { intent: "submit", number: String(draft.number), changeNote: "Clearer first question" }, { guideId: copyId })).status,
    ).toBe(200);
    expect((await draft.reload()).status).toBe("in_review");
    expect((await form(TRAINER, "/x", { intent: "approve", number: String(draft.number) }, { guideId: copyId })).status).toBe(403);
    expect((await draft.reload()).status).toBe("in_review");
    expect((await form(SUPERVISOR, "/x", { intent: "approve", number: String(draft.number), comment: "Good" }, { guideId: copyId })).status).toBe(200);
    expect((await draft.reload()).status).toBe("published");

    // New cases use the company's published copy; the case started before keeps its version.
    const usable = (await usableGuides(user)).find((g) => g.slug === "foaming")!;
    expect(usable.versionId).toBe(draft.id);
    const newCase = await startCase(user, { id: randomUUID(), rigCode: "CF-07", guideSlug: "foaming" });
    expect((await Case.findByPk(newCase.id))!.guideVersionId).toBe(draft.id);
    expect((await Case.findByPk(rigCase.id))!.guideVersionId).toBe(oldVersionId);
    expect((await GuideVersion.findByPk(oldVersionId))!.toJSON()).toEqual(oldVersion);
    // Blue Mesa still gets the built-in.
    expect((await usableGuides(await sessionUser(OTHER))).find((g) => g.slug === "foaming")!.versionId).toBe(oldVersionId);
  });

  it("retires the previous published version on the next publish, and sends back with a comment", async () => {
    const edit = await form(TRAINER, "/x", { intent: "edit" }, { guideId: copyId });
    const number = edit.location!.split("/").pop()!;
    expect(number).toBe("2");
    expect((await form(TRAINER, "/x", { intent: "submit", number, changeNote: "Second pass" }, { guideId: copyId })).status).toBe(200);
    expect((await form(SUPERVISOR, "/x", { intent: "return", number, comment: "" }, { guideId: copyId })).status).toBe(400);
    await form(SUPERVISOR, "/x", { intent: "return", number, comment: "Add a photo prompt" }, { guideId: copyId });
    expect(await GuideVersion.findOne({ where: { guideId: Number(copyId), number: 2 } })).toMatchObject({
      status: "draft",
      reviewComment: "Add a photo prompt",
    });
    await form(TRAINER, "/x", { intent: "submit", number, changeNote: "Second pass again" }, { guideId: copyId });
    await form(SUPERVISOR, "/x", { intent: "approve", number }, { guideId: copyId });
    const versions = await GuideVersion.findAll({ where: { guideId: Number(copyId) }, order: [["number", "ASC"]] });
    expect(versions.map((v) => v.status)).toEqual(["retired", "published"]);
    expect((await GuideRecord.findByPk(Number(copyId)))!.publishedVersion).toBe(2);
    const diff = await run(async () => diffLoader(args(await requestAs(TRAINER, `/desk/${copyId}/diff?a=1&b=2`), { guideId: copyId })));
    expect(diff.status).toBe(200);
  });
});

describe("import and export", () => {
  const importFile = async (email: string, text: string, name = "guide.json") => {
    const body = new FormData();
    body.set("intent", "import");
    body.set("file", new File([text], name, { type: "application/json" }));
    return run(async () => deskAction(args(await requestAs(email, "/desk", { method: "POST", body }))));
  };

  it("lists every problem of a broken file and changes nothing", async () => {
    const before = [await GuideRecord.count(), await GuideVersion.count()];
    const broken = fs.readFileSync(fixture("broken-guides", "unguarded-hands-on.json"), "utf8");
    const res = await importFile(TRAINER, broken);
    expect(res.status).toBe(400);
    expect(res.data.error).toMatch(/2 problems; nothing was imported/);
    expect(res.data.problems.join("\n")).toMatch(/step "fix": is hands-on but can be reached without passing a safety step/);
    expect([await GuideRecord.count(), await GuideVersion.count()]).toEqual(before);
    expect((await importFile(TRAINER, "{ not json")).data.problems[0]).toMatch(/not valid JSON/);
  });

  it("exports a version as a guide file and imports it back as a new draft", async () => {
    const copy = (await GuideRecord.findOne({ where: { scope: guideScope((await sessionUser(TRAINER)).companyId), slug: "foaming" } }))!;
    const exported = (await exportLoader(args(await requestAs(TRAINER, "/x"), { guideId: String(copy.id), number: "2" }))) as Response;
    expect(exported.headers.get("Content-Disposition")).toMatch(/foaming\.v2\.json/);
    const text = await exported.text();
    const res = await importFile(TRAINER, text);
    expect(res.status).toBe(302);
    expect(await GuideVersion.findOne({ where: { guideId: copy.id, number: 3 } })).toMatchObject({ status: "draft", changeNote: "Imported from a file." });
    expect((await importFile(TRAINER, text)).status).toBe(409);
  });
});
