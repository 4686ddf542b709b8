import { randomUUID } from "node:crypto";
import { parse } from "csv-parse/sync";
import { beforeAll, describe, expect, it } from "vitest";
import { Case, Company, GuideVersion, Rig, User } from "../../db/index";
import { action as boardAction, loader as boardLoader } from "~/routes/board";
import { action as caseAction, loader as caseLoader } from "~/routes/cases.$id";
import { loader as exportLoader } from "~/routes/cases.export";
import { loader as casesLoader } from "~/routes/cases";
import { loader as apiBoardLoader } from "~/routes/api.board";
import { sendAllDigests } from "~/services/digest.server";
import { rebuildRollups, resetDatabase } from "../helpers/db";
import { caseRow } from "../helpers/cases";
import { outbox } from "../helpers/outbox";
import { args, requestAs, run } from "../helpers/requests";

const MO = "mo@cedarflats.example";
const awkwardNote = 'He said "it\'s the clamp, again", then left';
let handoffId: string;

beforeAll(async () => {
  await resetDatabase();
  const version = await GuideVersion.findOne();
  const add = async (code: string, day: number, outcome: "fixed" | "handoff", cause: string | null) => {
    const rig = (await Rig.findOne({ where: { code } }))!;
    const opener = (await User.findOne({ where: { companyId: rig.companyId, role: "crew" } }))!;
    const id = randomUUID();
    const openedAt = new Date(Date.now() - day * 86_400_000);
    await Case.create(
      caseRow({
        id,
        companyId: rig.companyId,
        rigId: rig.id,
        guideVersionId: version!.id,
        openedBy: opener.id,
        openedAt,
        closedAt: new Date(openedAt.getTime() + 600_000),
        engineHours: 100 + day,
        outcome,
        causeCode: cause,
        note: awkwardNote,
      }),
    );
    return id;
  };
  for (let d = 1; d <= 30; d++) await add(d % 3 ? "CF-03" : "CF-07", d, "fixed", d % 2 ? "suction-air-leak" : "plug-sump");
  handoffId = await add("CF-07", 2, "handoff", null);
  await add("BM-01", 1, "fixed", "suction-air-leak");
  await rebuildRollups();
});

describe("cases table", () => {
  it("is for supervisors and admins only", async () => {
    for (const [email, status] of [
      ["dana@cedarflats.example", 403],
      ["ravi@cedarflats.example", 403],
      [MO, 200],
      ["june@cedarflats.example", 200],
    ] as const) {
      expect((await run(async () => casesLoader(args(await requestAs(email, "/cases"))))).status, email).toBe(status);
    }
  });

  it("filters, sorts and pages on the server, within the company", async () => {
    const all = await run(async () => casesLoader(args(await requestAs(MO, "/cases"))));
    expect(all.data.total).toBe(31);
    expect(all.data.rows).toHaveLength(25);
    expect(all.data.rows.every((r: { rigCode: string }) => r.rigCode.startsWith("CF"))).toBe(true);
    const page2 = await run(async () => casesLoader(args(await requestAs(MO, "/cases?page=2"))));
    expect(page2.data.rows).toHaveLength(6);
    const cf07 = await run(async () => casesLoader(args(await requestAs(MO, "/cases?rig=CF-07&cause=plug-sump&sort=opened&dir=asc"))));
    expect(cf07.data.rows.map((r: { rigCode: string; causeCode: string }) => `${r.rigCode}:${r.causeCode}`)).toEqual(
      Array(cf07.data.total).fill("CF-07:plug-sump"),
    );
    const dates = cf07.data.rows.map((r: { openedAt: string }) => r.openedAt);
    expect([...dates].sort()).toEqual(dates);
    expect((await run(async () => casesLoader(args(await requestAs(MO, "/cases?sort=bogus"))))).status).toBe(400);
  });

  it("exports only the filtered rows of the company as CSV, with fields escaped", async () => {
    const res = (await exportLoader(args(await requestAs(MO, "/cases/export?outcome=handoff")))) as Response;
    expect(res.headers.get("Content-Type")).toMatch(/text\/csv/);
    expect(res.headers.get("Content-Disposition")).toMatch(/attachment; filename="tankside-cases-/);
    const rows = parse(await res.text(), { columns: true }) as Record<string, string>[];
    expect(rows.map((r) => r.case_id)).toEqual([handoffId]);
    const everything = parse(await ((await exportLoader(args(await requestAs(MO, "/cases/export")))) as Response).text(), { columns: true }) as Record<
      string,
      string
    >[];
    expect(everything).toHaveLength(31);
    expect(everything.some((r) => r.rig === "BM-01")).toBe(false);
    expect((await run(async () => exportLoader(args(await requestAs("dana@cedarflats.example", "/cases/export"))))).status).toBe(403);
  });

  it("reads a blank value of every query parameter as no filter, on the table, the CSV, the board and its API", async () => {
    const blank = "rig=&guide=&cause=&outcome=&person=&from=&to=&sort=&dir=&page=";
    const table = await run(async () => casesLoader(args(await requestAs(MO, `/cases?${blank}`))));
    expect(table.status).toBe(200);
    expect(table.data.total).toBe(31);
    const csv = parse(await ((await exportLoader(args(await requestAs(MO, `/cases/export?${blank}`)))) as Response).text(), { columns: true });
    expect(csv).toHaveLength(table.data.total);
    // Each parameter on its own, blank, answers as if it were missing.
    for (const name of blank.split("&").map((p) => p.slice(0, -1))) {
      const one = await run(async () => casesLoader(args(await requestAs(MO, `/cases?${name}=`))));
      expect(one.data.total, name).toBe(31);
    }
    const boardBlank = "from=&to=&rig=&repeatDays=";
    const plain = await run(async () => boardLoader(args(await requestAs(MO, "/board"))));
    const blanked = await run(async () => boardLoader(args(await requestAs(MO, `/board?${boardBlank}`))));
    expect(blanked.data.board).toEqual(plain.data.board);
    expect(plain.data.board.fleet.cases).toBe(31);
    expect(plain.data.board.rigs.length).toBeGreaterThan(0);
    const api = (await apiBoardLoader(args(await requestAs(MO, `/api/board?${boardBlank}`)))) as Response;
    const apiBody = await api.json();
    expect(apiBody.fleet.cases).toBe(31);
    expect(apiBody.window.rig).toBeNull();
    expect(apiBody.repeats.every((r: { rigCode: string }) => r.rigCode !== "?")).toBe(true);
    // A bad value is still named.
    const bad = await run(async () => casesLoader(args(await requestAs(MO, "/cases?from=June"))));
    expect(bad.status).toBe(400);
    expect(bad.data.error).toMatch(/from/);
  });

  it("writes CSV times in the company's zone with their offset", async () => {
    const rows = parse(await ((await exportLoader(args(await requestAs(MO, "/cases/export")))) as Response).text(), { columns: true }) as Record<
      string,
      string
    >[];
    // The demo companies work in America/Denver: UTC−7 in winter, UTC−6 in summer.
    for (const r of rows) {
      expect(r.opened_at).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}-0[67]:00$/);
    }
    const first = (await Case.findByPk(rows[0].case_id))!;
    expect(new Date(rows[0].opened_at).getTime()).toBe(Math.floor(first.openedAt.getTime() / 1000) * 1000);
  });

  it("escapes a quote and a comma in a CSV field (guide titles and names go through the CSV writer)", async () => {
    const mo = await User.findOne({ where: { email: MO } });
    await mo!.update({ name: 'Mo "Boss", Brennan' });
    const c = await Case.findByPk(handoffId);
    await c!.update({ openedBy: mo!.id });
    const text = await ((await exportLoader(args(await requestAs(MO, "/cases/export?outcome=handoff")))) as Response).text();
    expect(text).toContain('"Mo ""Boss"", Brennan"');
    expect((parse(text, { columns: true }) as Record<string, string>[])[0].opened_by).toBe('Mo "Boss", Brennan');
  });
});

describe("board page, hand-offs and the digest", () => {
  it("gives crew and trainers 403 and supervisors the board", async () => {
    expect((await run(async () => boardLoader(args(await requestAs("ravi@cedarflats.example", "/board"))))).status).toBe(403);
    const board = await run(async () => boardLoader(args(await requestAs(MO, "/board"))));
    expect(board.data.board.pareto.map((p: { cause: string; count: number }) => [p.cause, p.count])).toEqual([
      ["plug-sump", 15],
      ["suction-air-leak", 15],
    ]);
    expect(board.data.board.openHandoffs.map((o: { caseId: string }) => o.caseId)).toEqual([handoffId]);
  });

  it("lets a supervisor mark a hand-off dealt with, and another company gets 404", async () => {
    expect(
      (
        await run(async () =>
          caseAction(args(await requestAs("li@bluemesa.example", "/x", { form: { intent: "resolve-handoff", confirmed: "yes" } }), { id: handoffId })),
        )
      ).status,
    ).toBe(404);
    expect(
      (
        await run(async () =>
          caseAction(args(await requestAs("dana@cedarflats.example", "/x", { form: { intent: "resolve-handoff", confirmed: "yes" } }), { id: handoffId })),
        )
      ).status,
    ).toBe(403);
    // One tap without the confirmation changes nothing.
    const unconfirmed = await run(async () => caseAction(args(await requestAs(MO, "/x", { form: { intent: "resolve-handoff" } }), { id: handoffId })));
    expect(unconfirmed.status).toBe(400);
    expect(unconfirmed.data.error).toMatch(/Confirm/);
    expect((await Case.findByPk(handoffId))!.handoffResolvedAt).toBeNull();
    await run(async () =>
      caseAction(
        args(await requestAs(MO, "/x", { form: { intent: "resolve-handoff", confirmed: "yes", note: "New suction gasket fitted at the yard." } }), {
          id: handoffId,
        }),
      ),
    );
    const resolved = (await Case.findByPk(handoffId))!;
    expect(resolved.handoffResolvedAt).not.toBeNull();
    expect(resolved.handoffResolvedNote).toBe("New suction gasket fitted at the yard.");
    const page = await run(async () => caseLoader(args(await requestAs(MO, `/cases/${handoffId}`), { id: handoffId })));
    expect(page.data.handoffResolvedBy).toBe('Mo "Boss", Brennan');
    expect(page.data.handoffResolvedNote).toBe("New suction gasket fitted at the yard.");
    const board = await run(async () => boardLoader(args(await requestAs(MO, "/board"))));
    expect(board.data.board.openHandoffs).toEqual([]);
  });

  it("sends each company's digest to its own supervisors; only admins can send it from the board", async () => {
    const before = (await outbox()).length;
    const sent = await sendAllDigests();
    expect(sent.map((s) => s.sentTo)).toEqual([['Mo "Boss", Brennan'], ["Li Serrano"]]);
    const mails = (await outbox()).slice(before);
    const cedar = mails.find((m) => m.to.includes("mo@cedarflats.example"))!;
    expect(cedar.subject).toMatch(/Tankside weekly digest/);
    expect(cedar.text).toMatch(/Top causes:\n {2}Air leaking into the suction side[^\n]*: 15 \(52 %\)\n {2}Sump plugged with dewatered fiber: 14/);
    expect(cedar.text).toMatch(/CF-03: 71\.4 per 100 engine hours against 40 for the others/);
    expect(cedar.text).toMatch(/Repeats/);
    expect(mails.find((m) => m.to.includes("li@bluemesa.example"))!.text).not.toMatch(/CF-0/);
    expect((await run(async () => boardAction(args(await requestAs(MO, "/board", { form: {} }))))).status).toBe(403);
    const byAdmin = await run(async () => boardAction(args(await requestAs("june@cedarflats.example", "/board", { form: {} }))));
    expect(byAdmin.data.sentTo).toEqual(['Mo "Boss", Brennan']);
    expect(await Company.count()).toBe(2);
  });
});
