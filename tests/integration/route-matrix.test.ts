import { RouterContextProvider } from "react-router";
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { Case, Company, GuideRecord, GuideVersion, Rig, User } from "../../db/index";
import { createGuide } from "~/services/desk.server";
import { resetDatabase } from "../helpers/db";
import { caseRow } from "../helpers/cases";
import { makeJob } from "../helpers/jobs";
import { cookieFor, run } from "../helpers/requests";
import { routeModule, routeTable } from "../helpers/route-table";

/**
 * Who may do what, route by route: the answer each method of each route in app/routes.ts gives to a
 * signed-out caller, to each role at Cedar Flats, and (where a route takes an id) to Cedar Flats' admin
 * asking for Blue Mesa's record. Requests carry no body: a 400/415 means the guard let the caller through.
 * A route added to app/routes.ts without a row here fails this test.
 */
type Row = { out: number; crew: number; trainer: number; supervisor: number; admin: number; foreign?: number };
const r = (out: number, crew: number, trainer: number, supervisor: number, admin: number, foreign?: number): Row => ({
  out,
  crew,
  trainer,
  supervisor,
  admin,
  foreign,
});

const EXPECTED: Record<string, Row> = {
  "GET /login": r(200, 302, 302, 302, 302),
  "POST /login": r(400, 400, 400, 400, 400),
  "GET /join/:token": r(410, 410, 410, 410, 410),
  "POST /join/:token": r(400, 400, 400, 400, 400),
  "POST /forgot": r(400, 400, 400, 400, 400),
  "GET /reset/:token": r(410, 410, 410, 410, 410),
  "POST /reset/:token": r(400, 400, 400, 400, 400),
  "GET /logout": r(302, 302, 302, 302, 302),
  "POST /logout": r(302, 302, 302, 302, 302),
  "GET /healthz": r(200, 200, 200, 200, 200),
  "GET /api/guides/search": r(401, 400, 400, 400, 400),
  "GET /api/offline-kit": r(401, 200, 200, 200, 200),
  "GET /api/board": r(401, 403, 403, 200, 200),
  "POST /api/field-math/:kind": r(401, 400, 400, 400, 400),
  "POST /api/cases": r(401, 415, 415, 415, 415),
  "GET /api/cases/:id": r(401, 200, 200, 200, 200, 404),
  "POST /api/cases/:id/events": r(401, 415, 415, 415, 415),
  "POST /api/cases/:id/close": r(401, 415, 415, 415, 415),
  // An empty body is refused before the case is looked up; a real upload to another company's case is a 404 (cases-pages test).
  "POST /api/cases/:id/photos": r(401, 400, 400, 400, 400, 400),
  "GET /cases/:id/photos/:photoId": r(302, 404, 404, 404, 404, 404),
  "GET /rigs/:code/label": r(302, 200, 200, 200, 200, 404),
  // Everyone signed in may print the company's guides; another company's own guide is a 404.
  "GET /guides/:slug/print": r(302, 200, 200, 200, 200, 404),
  "GET /cases/export": r(302, 403, 403, 200, 200),
  "GET /desk/:guideId/v/:number/export": r(302, 403, 200, 200, 200, 404),
  "POST /api/desk/:guideId/v/:number": r(401, 403, 415, 415, 415),
  "GET / (shell)": r(302, 200, 200, 200, 200),
  "GET /": r(302, 200, 200, 200, 200),
  "GET /rigs": r(302, 200, 200, 200, 200),
  "GET /rigs/new": r(302, 403, 403, 403, 200),
  "POST /rigs/new": r(302, 403, 403, 403, 400),
  "GET /rigs/:code": r(302, 200, 200, 200, 200, 404),
  "POST /rigs/:code": r(302, 403, 403, 403, 400),
  "GET /rigs/:code/edit": r(302, 403, 403, 403, 200, 404),
  "POST /rigs/:code/edit": r(302, 403, 403, 403, 400),
  "GET /rigs/:code/fix": r(302, 200, 200, 200, 200, 404),
  "POST /rigs/:code/fix": r(302, 400, 400, 400, 400),
  "GET /rigs/:code/cards": r(302, 200, 200, 200, 200, 404),
  "POST /rigs/:code/cards": r(302, 400, 400, 400, 400),
  "GET /rigs/:code/service": r(302, 200, 200, 200, 200, 404),
  "POST /rigs/:code/service": r(302, 400, 400, 400, 400),
  "GET /board": r(302, 403, 403, 200, 200),
  "POST /board": r(302, 403, 403, 403, 200),
  "GET /cases": r(302, 403, 403, 200, 200),
  "GET /cases/:id": r(302, 200, 200, 200, 200, 404),
  "POST /cases/:id": r(302, 403, 403, 400, 400),
  "GET /cases/:id/walk": r(302, 200, 200, 200, 200, 404),
  "GET /admin/outbox": r(302, 403, 403, 403, 200),
  "GET /admin/people": r(302, 403, 403, 403, 200),
  "POST /admin/people": r(302, 403, 403, 403, 400),
  "GET /admin/company": r(302, 403, 403, 403, 200),
  "POST /admin/company": r(302, 403, 403, 403, 400),
  "GET /account": r(302, 200, 200, 200, 200),
  "POST /account": r(302, 400, 400, 400, 400),
  "GET /desk (layout)": r(302, 403, 200, 200, 200),
  "GET /desk": r(302, 403, 200, 200, 200),
  "POST /desk": r(302, 403, 400, 400, 400),
  "GET /desk/:guideId": r(302, 403, 200, 200, 200, 404),
  "POST /desk/:guideId": r(302, 403, 400, 400, 400),
  "GET /desk/:guideId/diff": r(302, 403, 404, 404, 404, 404),
  "GET /desk/:guideId/v/:number": r(302, 403, 200, 200, 200, 404),
  "POST /desk/:guideId/v/:number": r(302, 403, 400, 400, 400),
  "GET /desk/:guideId/v/:number/preview": r(302, 403, 200, 200, 200, 404),
  "POST /api/jobs/:jobId/loads": r(401, 415, 415, 415, 415),
  // Taking a load back answers DELETE only.
  "POST /api/jobs/:jobId/loads/:loadId": r(401, 405, 405, 405, 405),
  "GET /jobs": r(302, 200, 200, 200, 200),
  "GET /jobs/new": r(302, 403, 403, 200, 200),
  "POST /jobs/new": r(302, 403, 403, 400, 400),
  "GET /jobs/:jobId": r(302, 200, 200, 200, 200, 404),
  "POST /jobs/:jobId": r(302, 403, 403, 400, 400),
  "GET /jobs/:jobId/edit": r(302, 403, 403, 200, 200, 404),
  "POST /jobs/:jobId/edit": r(302, 403, 403, 400, 400),
  "GET /field-math": r(302, 200, 200, 200, 200),
  "GET /field-math/:screen": r(302, 200, 200, 200, 200),
  "GET /*": r(302, 404, 404, 404, 404),
};

const PEOPLE = { crew: "dana@cedarflats.example", trainer: "ravi@cedarflats.example", supervisor: "mo@cedarflats.example", admin: "june@cedarflats.example" };
let own: Record<string, string>;
let foreign: Record<string, string>;

async function handoffOn(code: string) {
  const rig = (await Rig.findOne({ where: { code } }))!;
  const version = (await GuideVersion.findOne())!;
  const id = randomUUID();
  await Case.create(
    caseRow({ id, companyId: rig.companyId, rigId: rig.id, guideVersionId: version.id, openedBy: null, openedAt: new Date(), outcome: "handoff" }),
  );
  return id;
}

beforeAll(async () => {
  await resetDatabase();
  const li = (await User.findOne({ where: { email: "li@bluemesa.example" }, include: [Company] }))!;
  const bmGuide = await createGuide(
    { id: li.id, name: li.name, email: li.email, role: li.role, companyId: li.companyId, companyName: "Blue Mesa", timeZone: "America/Denver" },
    "Blue Mesa own guide",
  );
  const builtIn = (await GuideVersion.findOne())!;
  const shared = {
    number: "1",
    token: "not-a-token",
    photoId: "1",
    loadId: "00000000-0000-4000-8000-000000000000",
    kind: "hose",
    slug: "lost-prime",
    screen: "load",
    "*": "nothing",
  };
  const jobOf = async (code: string) => String((await makeJob((await Rig.findOne({ where: { code } }))!.companyId)).id);
  own = { ...shared, id: await handoffOn("CF-07"), code: "CF-07", guideId: String(builtIn.guideId), jobId: await jobOf("CF-07") };
  foreign = {
    ...shared,
    id: await handoffOn("BM-01"),
    code: "BM-01",
    guideId: String(bmGuide.guideId),
    number: String(bmGuide.number),
    slug: (await GuideRecord.findByPk(bmGuide.guideId))!.slug,
    jobId: await jobOf("BM-01"),
  };
});

const keyOf = (method: string, path: string, file: string) =>
  `${method} ${path}${file.endsWith("shell.tsx") ? " (shell)" : file.endsWith("desk.tsx") ? " (layout)" : ""}`;

describe("who may do what, for every route in app/routes.ts", () => {
  it("has a row for every method of every route, and no row for a route that is gone", async () => {
    const keys: string[] = [];
    for (const e of routeTable()) {
      const mod = await routeModule(e);
      if (mod.loader) keys.push(keyOf("GET", e.path, e.file));
      if (mod.action) keys.push(keyOf("POST", e.path, e.file));
    }
    expect(
      keys.filter((k) => !(k in EXPECTED)),
      "routes with no row: add them to EXPECTED",
    ).toEqual([]);
    expect(
      Object.keys(EXPECTED).filter((k) => !keys.includes(k)),
      "rows for routes that no longer exist",
    ).toEqual([]);
  });

  it("answers each caller as the table says", async () => {
    const mismatches: string[] = [];
    let checked = 0;
    for (const e of routeTable()) {
      const mod = await routeModule(e);
      for (const [method, fn] of [
        ["GET", mod.loader],
        ["POST", mod.action],
      ] as const) {
        if (!fn) continue;
        const key = keyOf(method, e.path, e.file);
        const row = EXPECTED[key];
        // A fresh sign-in for each request: signing out (one of the routes) ends the session it was given.
        const ask = async (email: string | null, params: Record<string, string>) => {
          const cookie = email ? await cookieFor(email) : null;
          const url = `http://127.0.0.1${e.path.replace(/:(\w+)/g, (_m, k) => params[k]).replace("*", "nothing")}`;
          const headers: Record<string, string> = cookie ? { Cookie: cookie } : {};
          const init: RequestInit =
            method === "POST" ? { method, headers: { ...headers, "Content-Type": "application/x-www-form-urlencoded" }, body: "" } : { headers };
          return (await run(async () => fn({ request: new Request(url, init), params, context: new RouterContextProvider() }))).status;
        };
        const answers: Partial<Row> = { out: await ask(null, own) };
        for (const role of Object.keys(PEOPLE) as (keyof typeof PEOPLE)[]) answers[role] = await ask(PEOPLE[role], own);
        if (row.foreign !== undefined) answers.foreign = await ask(PEOPLE.admin, foreign);
        checked += Object.keys(answers).length;
        for (const [who, status] of Object.entries(answers)) {
          if (row[who as keyof Row] !== status) mismatches.push(`${key} as ${who}: expected ${row[who as keyof Row]}, got ${status}`);
        }
      }
    }
    console.log(`route matrix: ${checked} requests over ${Object.keys(EXPECTED).length} route methods`);
    expect(mismatches).toEqual([]);
  });
});
