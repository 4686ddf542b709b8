import { beforeAll, describe, expect, it } from "vitest";
import { Company, GuideRecord, GuideVersion, guideScope } from "../../db/index";
import { loadLibrary } from "~/lib/guides/files.server";
import { loader as searchLoader } from "~/routes/api.guides.search";
import { importBuiltinGuides } from "../../seeds/import-guides";
import { resetDatabase } from "../helpers/db";
import { root, tinyGuide } from "../helpers/guides";
import { args, requestAs, run } from "../helpers/requests";

const library = loadLibrary(root);

beforeAll(() => resetDatabase());

describe("guide storage", () => {
  it("holds the library as published version 1 after seeding, and a second import adds nothing", async () => {
    expect(await GuideRecord.count({ where: { companyId: null } })).toBe(library.length);
    expect(await GuideVersion.count()).toBe(library.length);
    expect(await importBuiltinGuides(library)).toEqual({ created: 0, updated: 0, unchanged: library.length });
    expect(await GuideVersion.count()).toBe(library.length);
    const v1 = await GuideVersion.findOne({ include: [{ model: GuideRecord, as: "guide", where: { slug: "foaming" } }] });
    expect(v1).toMatchObject({ number: 1, status: "published" });
  });

  it("turns an edited file into a new published version and leaves the old one as it was", async () => {
    const foaming = library.find((g) => g.id === "foaming")!;
    const record = await GuideRecord.findOne({ where: { scope: guideScope(null), slug: "foaming" } });
    const before = (await GuideVersion.findOne({ where: { guideId: record!.id, number: 1 } }))!;
    const edited = structuredClone(foaming);
    edited.states["agitator-speed"].meta.prompt = "Is the agitator above half speed?";
    expect(await importBuiltinGuides([edited])).toEqual({ created: 0, updated: 1, unchanged: 0 });
    const versions = await GuideVersion.findAll({ where: { guideId: record!.id }, order: [["number", "ASC"]] });
    expect(versions.map((v) => [v.number, v.status])).toEqual([
      [1, "retired"],
      [2, "published"],
    ]);
    expect(versions[0].definition).toEqual(before.definition);
    expect(versions[0].definition.states["agitator-speed"].meta.prompt).toBe(foaming.states["agitator-speed"].meta.prompt);
    expect((await record!.reload()).publishedVersion).toBe(2);
  });
});

describe("GET /api/guides/search", () => {
  const search = async (email: string | null, q: string) => {
    const out = await run(async () => searchLoader(args(await requestAs(email, `/api/guides/search?q=${encodeURIComponent(q)}`))));
    return { status: out.status, body: out.data };
  };

  it("answers a signed-in person, best first, at most 10", async () => {
    const { status, body } = await search("dana@cedarflats.example", "tank full of suds");
    expect(status).toBe(200);
    expect(body.results[0]).toMatchObject({ slug: "foaming", title: "Foam in the tank", score: 1 });
    expect(body.results.length).toBeLessThanOrEqual(10);
  });

  it("refuses an empty or over-long query with a message", async () => {
    const empty = await search("dana@cedarflats.example", "   ");
    expect(empty.status).toBe(400);
    expect(empty.body.fields.q).toMatch(/Say what is wrong/);
    const long = await search("dana@cedarflats.example", "x".repeat(121));
    expect(long.status).toBe(400);
    expect(long.body.fields.q).toMatch(/under 120/);
  });

  it("needs a signed-in person", async () => {
    const thrown = await searchLoader(args(await requestAs(null, "/api/guides/search?q=foam"))).catch((e: unknown) => e);
    expect((thrown as { init: ResponseInit }).init.status).toBe(401);
  });

  it("finds a company's own guide for that company only", async () => {
    const mesa = await Company.findOne({ where: { slug: "blue-mesa" } });
    const own = { ...tinyGuide(), id: "hopper-gate", title: "Hopper gate sticks", symptoms: ["hopper gate sticks", "gate won't open"] };
    const record = await GuideRecord.create({
      companyId: mesa!.id,
      scope: guideScope(mesa!.id),
      slug: own.id,
      title: own.title,
      publishedVersion: 1,
      basedOnGuideId: null,
    });
    await GuideVersion.create({
      guideId: record.id,
      number: 1,
      status: "published",
      definition: own,
      sourceHash: "x".repeat(64),
      authorId: null,
      reviewerId: null,
      changeNote: null,
      reviewComment: null,
      publishedAt: new Date(),
    });
    expect((await search("sam@bluemesa.example", "hopper gate sticks")).body.results[0].slug).toBe("hopper-gate");
    const cedar = (await search("dana@cedarflats.example", "hopper gate sticks")).body.results.map((r: { slug: string }) => r.slug);
    expect(cedar).not.toContain("hopper-gate");
  });
});
