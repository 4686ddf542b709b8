import { beforeAll, describe, expect, it } from "vitest";
import { PasswordReset, User } from "../../db/index";
import { action as forgotAction } from "~/routes/forgot";
import { action as loginAction } from "~/routes/login";
import { action as resetAction, loader as resetLoader } from "~/routes/reset.$token";
import { loader as rigsLoader } from "~/routes/rigs";
import { linkRequestsSettled, RESETS_PER_HOUR } from "~/services/password-reset.server";
import { DEMO_PASSWORD } from "../../seeds/demo-people";
import { resetDatabase } from "../helpers/db";
import { outbox } from "../helpers/outbox";
import { args, run } from "../helpers/requests";

const form = (path: string, fields: Record<string, string>) => new Request(`http://127.0.0.1${path}`, { method: "POST", body: new URLSearchParams(fields) });
// The form answers before it looks anything up; the mail follows.
const forgot = async (email: string) => {
  const answer = await run(() => forgotAction(args(form("/forgot", { email }))));
  await linkRequestsSettled();
  return answer;
};
const reset = (token: string, password: string, confirm = password) => run(() => resetAction(args(form(`/reset/${token}`, { password, confirm }), { token })));
/** Signs in through the real form; a success also hands back the session cookie. */
const signIn = (email: string, password: string) => run(() => loginAction(args(form("/login", { email, password, redirectTo: "/" }))));
// The outbox is shared by every test file: only reset mails sent since this file began count.
let mark = 0;
const mailsTo = async (to: string) => (await outbox()).slice(mark).filter((m) => m.to.includes(to) && m.subject === "Choose a new Tankside password");
async function tokenFor(to: string): Promise<string> {
  const link = (await mailsTo(to)).at(-1)?.text.match(/\/reset\/(\S+)/);
  if (!link) throw new Error(`no reset mail to ${to}`);
  return link[1];
}

beforeAll(async () => {
  await resetDatabase();
  mark = (await outbox()).length;
});

describe("forgot your password", () => {
  it("answers the same for an unknown address and sends nothing; names a malformed one", async () => {
    const before = (await outbox()).length;
    const unknown = await forgot("nobody@cedarflats.example");
    expect(unknown).toMatchObject({ status: 200, data: { sent: true } });
    expect((await outbox()).length).toBe(before);
    const bad = await forgot("not-an-address");
    expect(bad.status).toBe(400);
    expect(bad.data.error).toMatch(/whole e-mail address/);
  });

  it("mails a one-hour, single-use link that sets the password", async () => {
    expect((await forgot("Dana@CedarFlats.example")).data.sent).toBe(true);
    const token = await tokenFor("dana@cedarflats.example");
    expect((await mailsTo("dana@cedarflats.example")).at(-1)!.subject).toBe("Choose a new Tankside password");
    expect(await PasswordReset.count({ where: { tokenHash: token } })).toBe(0);

    expect((await run(() => resetLoader(args(new Request(`http://127.0.0.1/reset/${token}`), { token })))).data.name).toBe("Dana Whitlock");
    const short = await reset(token, "short");
    expect(short.status).toBe(400);
    expect(short.data.result.error.password[0]).toMatch(/at least 10/);

    const done = await reset(token, "agitator paddles turn");
    expect(done).toMatchObject({ status: 302, location: "/" });
    expect((await signIn("dana@cedarflats.example", DEMO_PASSWORD)).status).toBe(401);
    expect((await signIn("dana@cedarflats.example", "agitator paddles turn")).status).toBe(302);

    const again = await reset(token, "another long password");
    expect(again.status).toBe(410);
    expect(again.data.message).toMatch(/expired or has already been used/);
  });

  it("signs out every session from before, spends every other outstanding link, refuses an expired one, and sends at most three an hour", async () => {
    const before = (await signIn("mo@cedarflats.example", DEMO_PASSWORD)).cookie!;
    expect((await run(() => rigsLoader(args(new Request("http://127.0.0.1/rigs", { headers: { Cookie: before } }))))).status).toBe(200);
    await forgot("mo@cedarflats.example");
    const first = await tokenFor("mo@cedarflats.example");
    await forgot("mo@cedarflats.example");
    const second = await tokenFor("mo@cedarflats.example");
    expect((await reset(second, "slurry in the tank")).status).toBe(302);
    expect((await run(() => rigsLoader(args(new Request("http://127.0.0.1/rigs", { headers: { Cookie: before } }))))).status).toBe(302);
    expect((await reset(first, "slurry in the tank again")).status).toBe(410);

    await forgot("mo@cedarflats.example");
    expect((await mailsTo("mo@cedarflats.example")).length).toBe(RESETS_PER_HOUR);
    await forgot("mo@cedarflats.example");
    expect((await mailsTo("mo@cedarflats.example")).length).toBe(RESETS_PER_HOUR);

    await forgot("ravi@cedarflats.example");
    const stale = await tokenFor("ravi@cedarflats.example");
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1000) }, { where: {} });
    expect((await reset(stale, "too late for this one")).status).toBe(410);
  });

  it("sends nothing to a sign-in an admin has turned off", async () => {
    await User.update({ accessRemovedAt: new Date() }, { where: { email: "sam@bluemesa.example" } });
    await forgot("sam@bluemesa.example");
    expect(await mailsTo("sam@bluemesa.example")).toEqual([]);
  });
});
