import { beforeAll, describe, expect, it } from "vitest";
import { PasswordReset, SessionRecord, User } from "../../db/index";
import { action as logoutAction } from "~/routes/logout";
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

    const reset = await PasswordReset.create({
      userId: (await User.findOne({ where: { email: RAVI } }))!.id,
      tokenHash: "a".repeat(64),
      expiresAt: new Date(Date.now() + 3_600_000),
    });
    const done = await change(phone, { current: DEMO_PASSWORD, password: "recirculation valve open", confirm: "recirculation valve open" });
    expect(done.data.message).toMatch(/Password changed/);
    // This phone keeps its session; the laptop's is gone, and so is a reset link sent before.
    expect(await canSee(phone)).toBe(true);
    expect(await canSee(laptop)).toBe(false);
    expect((await reset.reload()).usedAt).not.toBeNull();
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

  it("makes a new session id at every sign-in, and signing out ends it on the server (a copied cookie stops working)", async () => {
    const one = await signedIn(RAVI, "recirculation valve open");
    const two = await signedIn(RAVI, "recirculation valve open");
    expect(one).not.toBe(two);
    const copy = one;
    const out = await run(() => logoutAction(args(form("/logout", {}, one))));
    expect(out.status).toBe(302);
    expect(await canSee(copy)).toBe(false);
    expect(await canSee(two)).toBe(true);
    // The table keeps only a hash of each id: no stored value is in a cookie.
    for (const row of await SessionRecord.findAll()) expect(decodeURIComponent(two)).not.toContain(row.idHash);
  });

  it("ends a session after 14 idle days or 60 days in all", async () => {
    const ravi = (await User.findOne({ where: { email: RAVI } }))!;
    const idle = await signedIn(RAVI, "recirculation valve open");
    const old = await signedIn(RAVI, "recirculation valve open");
    const rows = await SessionRecord.findAll({ where: { userId: ravi.id }, order: [["createdAt", "DESC"]] });
    const DAY = 86_400_000;
    await rows[1].update({ lastSeenAt: new Date(Date.now() - 14 * DAY - 60_000) });
    await rows[0].update({ expiresAt: new Date(Date.now() - 1000) });
    expect(await canSee(idle)).toBe(false);
    expect(await canSee(old)).toBe(false);
    const fresh = await signedIn(RAVI, "recirculation valve open");
    const made = await SessionRecord.findOne({ where: { userId: ravi.id }, order: [["createdAt", "DESC"]] });
    expect(made!.expiresAt.getTime() - made!.createdAt.getTime()).toBe(60 * DAY);
    expect(await canSee(fresh)).toBe(true);
  });

  it("lists the person's devices on /account and signs one out", async () => {
    const phone = await signedIn(RAVI, "recirculation valve open");
    const laptop = await signedIn(RAVI, "recirculation valve open");
    const page = await run(() => accountLoader(args(new Request("http://127.0.0.1/account", { headers: { Cookie: phone } }))));
    const devices = page.data.devices as { key: string; current: boolean }[];
    expect(devices.filter((d) => d.current)).toHaveLength(1);
    const other = devices.find((d) => !d.current)!;
    // Another person's key ends nothing of theirs.
    await run(async () => accountAction(args(await requestAs("dana@cedarflats.example", "/account", { form: { intent: "end-device", key: other.key } }))));
    expect(await canSee(laptop)).toBe(true);
    await change(phone, { intent: "end-others" });
    expect(await canSee(laptop)).toBe(false);
    expect(await canSee(phone)).toBe(true);
    const bad = await change(phone, { intent: "end-device", key: "nope" });
    expect(bad.status).toBe(400);
  });
});
