import { beforeAll, describe, expect, it } from "vitest";
import { User } from "../../db/index";
import { action as accountAction, loader as accountLoader } from "~/routes/account";
import { action as loginAction } from "~/routes/login";
import { action as peopleAction } from "~/routes/admin.people";
import { loader as rigsLoader } from "~/routes/rigs";
import { DEMO_PASSWORD } from "../../seeds/demo-people";
import { resetDatabase } from "../helpers/db";
import { args, requestAs, run } from "../helpers/requests";

const RAVI = "ravi@cedarflats.example";
const form = (path: string, fields: Record<string, string>, cookie?: string) =>
  new Request(`http://127.0.0.1${path}`, { method: "POST", body: new URLSearchParams(fields), headers: cookie ? { Cookie: cookie } : {} });
/** Signs in through the real form and returns the session cookie it set. */
async function signedIn(email: string, password: string): Promise<string> {
  const res = await run(() => loginAction(args(form("/login", { email, password, redirectTo: "/" }))));
  expect(res.status, `sign-in as ${email}`).toBe(302);
  return res.cookie!;
}
const canSee = async (cookie: string) =>
  (await run(() => rigsLoader(args(new Request("http://127.0.0.1/rigs", { headers: { Cookie: cookie } }))))).status === 200;
const change = (cookie: string, fields: Record<string, string>) => run(() => accountAction(args(form("/account", fields, cookie))));

beforeAll(() => resetDatabase());

describe("your account", () => {
  it("shows who you are to anyone signed in", async () => {
    const res = await run(async () => accountLoader(args(await requestAs("dana@cedarflats.example", "/account"))));
    expect(res.data).toMatchObject({ name: "Dana Whitlock", role: "crew", company: "Cedar Flats Erosion Control" });
    expect((await run(() => accountLoader(args(new Request("http://127.0.0.1/account"))))).status).toBe(302);
  });

  it("changes the password only with the current one, keeps this device signed in and signs the others out", async () => {
    const phone = await signedIn(RAVI, DEMO_PASSWORD);
    const laptop = await signedIn(RAVI, DEMO_PASSWORD);

    const wrong = await change(phone, { current: "not my password", password: "recirculation valve open", confirm: "recirculation valve open" });
    expect(wrong.status).toBe(400);
    expect(wrong.data.result.error.current[0]).toMatch(/not your current password/);
    const differ = await change(phone, { current: DEMO_PASSWORD, password: "recirculation valve open", confirm: "recirculation valve shut" });
    expect(differ.data.result.error.confirm[0]).toMatch(/not the same/);
    expect(await canSee(laptop)).toBe(true);

    const done = await change(phone, { current: DEMO_PASSWORD, password: "recirculation valve open", confirm: "recirculation valve open" });
    expect(done.data.message).toMatch(/Password changed/);
    const renewed = done.cookie!;
    expect(await canSee(renewed)).toBe(true);
    expect(await canSee(laptop)).toBe(false);
    expect(await canSee(phone)).toBe(false);
    expect((await run(() => loginAction(args(form("/login", { email: RAVI, password: DEMO_PASSWORD, redirectTo: "/" }))))).status).toBe(401);
    await signedIn(RAVI, "recirculation valve open");
  });

  it("a sign-in turned off and back on does not revive the old session", async () => {
    const old = await signedIn("dana@cedarflats.example", DEMO_PASSWORD);
    const dana = (await User.findOne({ where: { email: "dana@cedarflats.example" } }))!;
    const admin = (fields: Record<string, string>) =>
      run(async () => peopleAction(args(await requestAs("june@cedarflats.example", "/admin/people", { form: fields }))));
    await admin({ intent: "remove-access", personId: String(dana.id), confirmed: "yes" });
    await admin({ intent: "restore-access", personId: String(dana.id) });
    expect(await canSee(old)).toBe(false);
    expect(await canSee(await signedIn("dana@cedarflats.example", DEMO_PASSWORD))).toBe(true);
  });
});
