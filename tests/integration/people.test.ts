import { beforeAll, describe, expect, it } from "vitest";
import { Invite, User } from "../../db/index";
import { loader as outboxLoader } from "~/routes/admin.outbox";
import { action as peopleAction, loader as peopleLoader } from "~/routes/admin.people";
import { action as joinAction, loader as joinLoader } from "~/routes/join.$token";
import { action as loginAction } from "~/routes/login";
import { loader as rigsLoader } from "~/routes/rigs";
import { DEMO_PASSWORD } from "../../seeds/demo-people";
import { resetDatabase } from "../helpers/db";
import { outbox } from "../helpers/outbox";
import { args, requestAs, run } from "../helpers/requests";

const JUNE = "june@cedarflats.example"; // admin, Cedar Flats
const MO = "mo@cedarflats.example"; // supervisor, Cedar Flats

const post = (email: string, form: Record<string, string>) => run(async () => peopleAction(args(await requestAs(email, "/admin/people", { form }))));
const signIn = (email: string, password: string) =>
  run(() => loginAction(args(new Request("http://127.0.0.1/login", { method: "POST", body: new URLSearchParams({ email, password, redirectTo: "/rigs" }) }))));
/** The join link in the newest invitation mail to `to`. */
async function linkTo(to: string): Promise<string> {
  const mail = (await outbox()).filter((m) => m.to.includes(to)).at(-1);
  const link = mail?.text.match(/https?:\/\/\S+\/join\/(\S+)/);
  if (!link) throw new Error(`no invitation mail to ${to}`);
  return link[1];
}
const join = (token: string, password: string, confirm = password) =>
  run(() => joinAction(args(new Request(`http://127.0.0.1/join/${token}`, { method: "POST", body: new URLSearchParams({ password, confirm }) }), { token })));

beforeAll(() => resetDatabase());

describe("people page", () => {
  it("is for admins only", async () => {
    for (const [email, status] of [
      ["dana@cedarflats.example", 403],
      ["ravi@cedarflats.example", 403],
      [MO, 403],
      [JUNE, 200],
    ] as const) {
      expect((await run(async () => peopleLoader(args(await requestAs(email, "/admin/people"))))).status, email).toBe(status);
      expect((await post(email, { intent: "invite", name: "X", email: "x@example.com", role: "crew" })).status, email).toBe(status === 200 ? 200 : 403);
    }
    expect(await Invite.count()).toBe(1);
    await Invite.destroy({ where: {} });
  });

  it("lists only the admin's own company", async () => {
    const res = await run(async () => peopleLoader(args(await requestAs(JUNE, "/admin/people"))));
    const emails = res.data.people.map((p: { email: string }) => p.email);
    expect(emails).toContain(MO);
    expect(emails.some((e: string) => e.endsWith("bluemesa.example"))).toBe(false);
    expect(res.data.people.find((p: { email: string }) => p.email === JUNE).you).toBe(true);
  });

  it("names each bad field of an invitation and sends nothing", async () => {
    const before = (await outbox()).length;
    const bad = await post(JUNE, { intent: "invite", name: " ", email: "not-an-address", role: "boss" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.data.invite.error).sort()).toEqual(["email", "name", "role"]);
    const taken = await post(JUNE, { intent: "invite", name: "Sam again", email: "sam@bluemesa.example", role: "crew" });
    expect(taken.status).toBe(400);
    expect(taken.data.invite.error.email[0]).toMatch(/already signs in/);
    expect((await outbox()).length).toBe(before);
    expect(await Invite.count()).toBe(0);
  });
});

describe("an invitation, from e-mail to first sign-in", () => {
  it("mails a link that lets the person choose a password once, and signs them in", async () => {
    const sent = await post(JUNE, { intent: "invite", name: "Tomás Reyes", email: "Tomas@CedarFlats.example", role: "trainer" });
    expect(sent.status).toBe(200);
    expect(sent.data.message).toMatch(/tomas@cedarflats\.example/);
    const mail = (await outbox()).filter((m) => m.to.includes("tomas@cedarflats.example")).at(-1)!;
    expect(mail.subject).toBe("June Halvorsen added you to Cedar Flats Erosion Control on Tankside");
    const token = await linkTo("tomas@cedarflats.example");
    // Only a hash of the token is stored.
    expect(await Invite.count({ where: { tokenHash: token } })).toBe(0);

    const landing = await run(() => joinLoader(args(new Request(`http://127.0.0.1/join/${token}`), { token })));
    expect(landing.data.invite).toMatchObject({ name: "Tomás Reyes", role: "trainer", company: "Cedar Flats Erosion Control" });

    const short = await join(token, "short", "short");
    expect(short.status).toBe(400);
    expect(short.data.result.error.password[0]).toMatch(/at least 10/);
    const differ = await join(token, "three blue hoses", "three blue hose");
    expect(differ.data.result.error.confirm[0]).toMatch(/not the same/);
    expect(await User.count({ where: { email: "tomas@cedarflats.example" } })).toBe(0);

    const joined = await join(token, "three blue hoses");
    expect(joined.status).toBe(302);
    expect(joined.location).toBe("/");
    const person = await User.findOne({ where: { email: "tomas@cedarflats.example" } });
    expect(person).toMatchObject({ name: "Tomás Reyes", role: "trainer" });
    expect((await signIn("tomas@cedarflats.example", "three blue hoses")).status).toBe(302);

    // The link works once.
    const again = await join(token, "another good one");
    expect(again.status).toBe(410);
    expect(again.data.message).toMatch(/already been used/);
    expect(await User.count({ where: { email: "tomas@cedarflats.example" } })).toBe(1);
  });

  it("refuses an expired, cancelled or made-up link", async () => {
    await post(JUNE, { intent: "invite", name: "Late Larry", email: "larry@cedarflats.example", role: "crew" });
    const token = await linkTo("larry@cedarflats.example");
    await Invite.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email: "larry@cedarflats.example" } });
    expect((await join(token, "long enough password")).data.message).toMatch(/expired/);

    await post(JUNE, { intent: "invite", name: "Late Larry", email: "larry@cedarflats.example", role: "crew" });
    const fresh = await linkTo("larry@cedarflats.example");
    expect(fresh).not.toBe(token);
    const invite = (await Invite.findOne({ where: { email: "larry@cedarflats.example", acceptedAt: null } }))!;
    expect((await post(JUNE, { intent: "cancel-invite", inviteId: String(invite.id) })).data.message).toMatch(/cancelled/);
    expect((await join(fresh, "long enough password")).status).toBe(410);
    expect((await join("made-up", "long enough password")).status).toBe(410);
    expect(await User.count({ where: { email: "larry@cedarflats.example" } })).toBe(0);
  });
});

describe("roles and sign-ins", () => {
  it("changes a role at once, never the admin's own, and answers 404 for another company's person", async () => {
    const ravi = (await User.findOne({ where: { email: "ravi@cedarflats.example" } }))!;
    expect((await post(JUNE, { intent: "role", personId: String(ravi.id), role: "supervisor" })).data.message).toMatch(/now supervisor/);
    expect((await User.findByPk(ravi.id))!.role).toBe("supervisor");

    const june = (await User.findOne({ where: { email: JUNE } }))!;
    expect((await post(JUNE, { intent: "role", personId: String(june.id), role: "crew" })).status).toBe(409);
    expect((await post(JUNE, { intent: "remove-access", personId: String(june.id), confirmed: "yes" })).status).toBe(409);
    expect((await User.findByPk(june.id))!.role).toBe("admin");

    const sam = (await User.findOne({ where: { email: "sam@bluemesa.example" } }))!;
    expect((await post(JUNE, { intent: "role", personId: String(sam.id), role: "admin" })).status).toBe(404);
    expect((await User.findByPk(sam.id))!.role).toBe("crew");

    const nonsense = await post(JUNE, { intent: "promote", personId: "x" });
    expect(nonsense.status).toBe(400);
    expect(nonsense.data.message).toMatch(/^Nothing changed/);
  });

  it("turning a sign-in off ends the session at once and refuses the password; turning it on restores both", async () => {
    const dana = (await User.findOne({ where: { email: "dana@cedarflats.example" } }))!;
    const session = await requestAs("dana@cedarflats.example", "/rigs");
    expect((await run(() => rigsLoader(args(session.clone())))).status).toBe(200);

    await post(JUNE, { intent: "remove-access", personId: String(dana.id), confirmed: "yes" });
    const after = await run(() => rigsLoader(args(session.clone())));
    expect(after.status).toBe(302);
    expect(after.location).toMatch(/^\/login/);
    const refused = await signIn("dana@cedarflats.example", DEMO_PASSWORD);
    expect(refused.status).toBe(403);
    expect(refused.data.error).toMatch(/turned this sign-in off/);
    // A wrong password still gets the usual answer, so nobody learns the account exists.
    expect((await signIn("dana@cedarflats.example", "wrong password")).status).toBe(401);

    await post(JUNE, { intent: "restore-access", personId: String(dana.id) });
    expect((await signIn("dana@cedarflats.example", DEMO_PASSWORD)).status).toBe(302);
  });

  it("shows each admin only the mail their own company sent, even when two companies invite the same address", async () => {
    const li = await User.findOne({ where: { email: "li@bluemesa.example" } });
    await li!.update({ role: "admin" });
    const shared = "pat.shared@example.com";
    await post(JUNE, { intent: "invite", name: "Pat", email: shared, role: "crew" });
    await run(async () =>
      peopleAction(
        args(await requestAs("li@bluemesa.example", "/admin/people", { form: { intent: "invite", name: "Pat", email: shared, role: "supervisor" } })),
      ),
    );
    const inbox = async (email: string) =>
      (await run(async () => outboxLoader(args(await requestAs(email, "/admin/outbox"))))).data.messages as { text: string; to: string[] }[];
    const cedar = (await inbox(JUNE)).filter((m) => m.to.includes(shared));
    const mesa = (await inbox("li@bluemesa.example")).filter((m) => m.to.includes(shared));
    expect(cedar).toHaveLength(1);
    expect(mesa).toHaveLength(1);
    expect(cedar[0].text).toMatch(/Cedar Flats/);
    expect(cedar[0].text).not.toMatch(/Blue Mesa/);
    expect(mesa[0].text).toMatch(/Blue Mesa/);
    await li!.update({ role: "supervisor" });
  });
});
