import { RouterContextProvider } from "react-router";
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { Case, db, GuideRecord, GuideVersion, Rig } from "../../db/index";
import { resetDatabase } from "../helpers/db";
import { caseRow } from "../helpers/cases";
import { cookieFor } from "../helpers/requests";
import { routeModule, routeTable } from "../helpers/route-table";
import { linkRequestsSettled } from "~/services/password-reset.server";
import { expectConsoleError } from "../setup-each";

/**
 * Hostile input at every action and API route: ≥ 2,000 generated bodies (forms with wrong, huge or
 * broken values, JSON where a form is expected and the reverse, broken multipart, deep nesting,
 * lone surrogates). None may answer 5xx, and a refused one (4xx) must change no table.
 */
const ROUNDS = 2_100;

// A small, seeded generator: the same bodies on every run.
let seed = 20261202;
const rand = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];

const NAMES = [
  "intent",
  "email",
  "password",
  "confirm",
  "current",
  "name",
  "role",
  "personId",
  "inviteId",
  "confirmed",
  "note",
  "guideSlug",
  "caseId",
  "rigCode",
  "code",
  "tankGal",
  "engineHours",
  "hoseLengthFt",
  "hoseDiameterIn",
  "yardElevationFt",
  "mount",
  "pumpKind",
  "number",
  "changeNote",
  "comment",
  "title",
  "file",
  "key",
  "timeZone",
  "stepId",
  "redirectTo",
  "events",
  "outcome",
  "finalStep",
  "definition",
  "q",
  "rig",
  "from",
  "to",
  "page",
  "sort",
];
const INTENTS = [
  "invite",
  "role",
  "remove-access",
  "restore-access",
  "cancel-invite",
  "retire",
  "reinstate",
  "resolve-handoff",
  "new",
  "import",
  "edit",
  "submit",
  "approve",
  "return",
  "end-device",
  "end-others",
  "bogus",
  "",
];
const deep = (n: number): unknown => (n === 0 ? "x" : { a: deep(n - 1) });
const VALUES: (() => unknown)[] = [
  () => "",
  () => " ",
  () => "yes",
  () => pick(INTENTS),
  () => String(Math.floor(rand() * 10)),
  () => "-1",
  () => "1e309",
  () => "NaN",
  () => "x".repeat(5000),
  () => "\ud800 lone surrogate",
  () => "<script>alert(1)</script>",
  () => '=HYPERLINK("http://x")',
  () => "__proto__",
  () => "CF-07",
  () => "foaming",
  () => "2026-13-45",
  () => "America/Nowhere",
  () => randomUUID(),
  () => 12,
  () => -5,
  () => null,
  () => true,
  () => [],
  () => [1, "two", null],
  () => ({ a: 1 }),
  () => deep(80),
];

function body(): { headers: Record<string, string>; body: BodyInit } {
  const fields: Record<string, unknown> = {};
  const n = Math.floor(rand() * 6);
  for (let i = 0; i < n; i++) fields[pick(NAMES)] = pick(VALUES)();
  switch (Math.floor(rand() * 6)) {
    case 0:
    case 1: {
      const form = new URLSearchParams();
      for (const [k, v] of Object.entries(fields)) form.set(k, typeof v === "string" ? v : JSON.stringify(v));
      return { headers: { "Content-Type": "application/x-www-form-urlencoded" }, body: form };
    }
    case 2:
      return { headers: { "Content-Type": "application/json" }, body: JSON.stringify(rand() < 0.2 ? pick(VALUES)() : fields) };
    case 3:
      return { headers: { "Content-Type": "application/json" }, body: pick(["{", "[1,", "nul", '"unterminated', '{"a":}']) };
    case 4:
      return {
        headers: { "Content-Type": "multipart/form-data; boundary=XYZ" },
        body: pick(['--XYZ\r\nContent-Disposition: form-data; name="a"\r\n\r\nb', "garbage", "--XYZ--"]),
      };
    default:
      return { headers: { "Content-Type": pick(["text/plain", "application/xml", ""]) }, body: JSON.stringify(fields) };
  }
}

/** Row counts and content checksums of every table (the rate-limit counters and sessions excepted: refusing is allowed to count). */
async function digest(): Promise<string> {
  const sequelize = db();
  const [rows] = await sequelize.query("SHOW TABLES");
  const tables = (rows as Record<string, string>[]).map((r) => Object.values(r)[0]).filter((t) => !["rate_limits", "sessions"].includes(t));
  const [sums] = await sequelize.query(`CHECKSUM TABLE ${tables.map((t) => `\`${t}\``).join(", ")}`);
  return JSON.stringify(sums);
}

let params: Record<string, string>;
beforeAll(async () => {
  await resetDatabase();
  const rig = (await Rig.findOne({ where: { code: "CF-07" } }))!;
  const version = (await GuideVersion.findOne())!;
  const guide = (await GuideRecord.findByPk(version.guideId))!;
  const id = randomUUID();
  await Case.create(
    caseRow({ id, companyId: rig.companyId, rigId: rig.id, guideVersionId: version.id, openedBy: null, openedAt: new Date(), outcome: "open" }),
  );
  params = { id, code: "CF-07", guideId: String(guide.id), number: "1", token: "not-a-token", photoId: "1", kind: "hose", screen: "load", "*": "nothing" };
});

describe("hostile input at every action and API route", () => {
  it(`answers ${ROUNDS} generated bodies with no 5xx, and a refused body changes no table`, async () => {
    const routes = [];
    for (const e of routeTable()) {
      const mod = await routeModule(e);
      if (mod.action) routes.push({ e, run: mod.action, method: "POST" });
      if (mod.loader && e.path.startsWith("/api/")) routes.push({ e, run: mod.loader, method: "GET" });
    }
    expect(routes.length).toBeGreaterThanOrEqual(15);
    const cookie = await cookieFor("june@cedarflats.example");
    const tally = { "2xx/3xx": 0, "4xx": 0, "5xx": 0 };
    const fivexx: string[] = [];
    const changed: string[] = [];
    let before = await digest();
    expectConsoleError(ROUNDS); // a refused request may be logged; a 5xx is what fails here
    for (let i = 0; i < ROUNDS; i++) {
      const r = routes[i % routes.length];
      const url = new URL(`http://127.0.0.1${r.e.path.replace(/:(\w+)/g, (_m, k) => params[k] ?? "x").replace("*", "nothing")}`);
      if (r.method === "GET") for (let k = 0; k < 3; k++) url.searchParams.set(pick(NAMES), String(pick(VALUES)()));
      const b = r.method === "POST" ? body() : { headers: {}, body: undefined };
      const request = new Request(url, {
        method: r.method,
        headers: { ...b.headers, Cookie: cookie, "x-tankside-client-ip": `10.9.${i % 250}.1` },
        body: b.body,
      });
      let status: number;
      try {
        const out = await r.run({ request, params: Object.fromEntries(Object.keys(params).map((k) => [k, params[k]])), context: new RouterContextProvider() });
        status = out instanceof Response ? out.status : ((out as { init?: { status?: number } } | undefined)?.init?.status ?? 200);
      } catch (thrown) {
        status =
          thrown instanceof Response
            ? thrown.status
            : ((thrown as { init?: { status?: number } }).init?.status ?? ((thrown as { type?: string }).type === "DataWithResponseInit" ? 200 : 500));
        if (status === 500 && thrown instanceof Error) fivexx.push(`${r.method} ${url.pathname}: ${thrown.message.slice(0, 160)}`);
      }
      if (status >= 500) {
        tally["5xx"]++;
        if (!fivexx.at(-1)?.startsWith(`${r.method} ${url.pathname}`)) fivexx.push(`${r.method} ${url.pathname} answered ${status}`);
      } else if (status >= 400) {
        tally["4xx"]++;
      } else tally["2xx/3xx"]++;
      // Every table is compared after each request: a refused one must have changed nothing.
      await linkRequestsSettled();
      const after = await digest();
      if (status >= 400 && after !== before) changed.push(`${r.method} ${url.pathname} answered ${status} but changed a table`);
      before = after;
    }
    console.log(`fuzzed ${ROUNDS} requests over ${routes.length} actions and API routes:`, tally);
    expect(fivexx).toEqual([]);
    expect(changed).toEqual([]);
  }, 600_000);
});
