import { RouterContextProvider } from "react-router";
import { gunzipSync } from "node:zlib";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { Company, User } from "../../db/index";
import { loader as boardApi } from "~/routes/api.board";
import { reports } from "~/services/db.server";
import { resolveHandoff } from "~/services/cases.server";
import type { SessionUser } from "~/services/guards.server";
import { LOW_WATER_WALK, walkThroughApi } from "../helpers/cases";
import { resetDatabase } from "../helpers/db";
import { requestAs } from "../helpers/requests";

// Reports kept in memory (report-cache.server.ts) are the truth or are not used: every change a
// report shows raises the company's reports version, so the next read computes afresh.
const MO = "mo@cedarflats.example";
const DANA = "dana@cedarflats.example";
const args = (request: Request, params: Record<string, string> = {}) => ({ request, params, context: new RouterContextProvider() }) as never;

async function board(encoding?: string) {
  const res = (await boardApi(args(await requestAs(MO, "/api/board", { headers: encoding ? { "Accept-Encoding": encoding } : {} })))) as Response;
  const bytes = Buffer.from(await res.arrayBuffer());
  const gzipped = res.headers.get("Content-Encoding") === "gzip";
  return {
    gzipped,
    data: JSON.parse((gzipped ? gunzipSync(bytes) : bytes).toString("utf8")) as { fleet: { cases: number }; openHandoffs: { caseId: string }[] },
  };
}

let cedarFlats: Company;
beforeAll(async () => {
  await resetDatabase();
  cedarFlats = (await Company.findOne({ where: { slug: "cedar-flats" } }))!;
});

describe("reports kept in memory", () => {
  it("reads the board's figures once while nothing changes, and answers the same bytes gzipped or plain", async () => {
    const first = await board("gzip, deflate, br");
    expect(first.gzipped).toBe(true);
    const spy = vi.spyOn(reports(), "query");
    const again = await board();
    expect(again.gzipped).toBe(false);
    expect(again.data).toEqual(first.data);
    // One look at the company's reports version per kept report (the board, its care figures and its jobs),
    // none at the figures (the other queries are the sign-in's).
    const sql = spy.mock.calls.map((c) => String(c[0]));
    expect(sql.filter((q) => /reports_version/.test(q))).toHaveLength(3);
    expect(sql.filter((q) => /board_|FROM cases|FROM rigs|service_|FROM jobs|job_days/.test(q))).toEqual([]);
    spy.mockRestore();
  });

  it("counts a case closed since the last read", async () => {
    const before = (await board()).data.fleet.cases;
    await walkThroughApi(DANA, LOW_WATER_WALK);
    expect((await board()).data.fleet.cases).toBe(before + 1);
  });

  it("drops a hand-off marked dealt with since the last read", async () => {
    const id = await walkThroughApi(DANA, {
      rigCode: "CF-07",
      guideSlug: "leaks",
      answers: [
        ["at-coupling", "YES"],
        ["stop-coupling", "ACK"],
        ["fix-coupling", "CANT"],
      ],
      outcome: "handoff",
      finalStep: "handoff-leak",
    });
    const open = async () => (await board()).data.openHandoffs.map((h) => h.caseId);
    expect(await open()).toContain(id);
    const person = (await User.findOne({ where: { email: MO } }))!;
    const mo: SessionUser = {
      id: person.id,
      name: person.name,
      email: MO,
      role: "supervisor",
      companyId: cedarFlats.id,
      companyName: cedarFlats.name,
      timeZone: cedarFlats.timeZone,
    };
    await resolveHandoff(mo, id, "New gasket fitted");
    expect(await open()).not.toContain(id);
  });
});
