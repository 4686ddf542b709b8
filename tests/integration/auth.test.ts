import { beforeAll, describe, expect, it } from "vitest";
import { User } from "../../db/index";
import { action as loginAction, loader as loginLoader } from "~/routes/login";
import { loader as shellLoader } from "~/routes/shell";
import { loader as newRigLoader } from "~/routes/rigs.new";
import { MAX_FAILURES } from "~/services/auth.server";
import { resetDatabase } from "../helpers/db";
import { args, requestAs, run } from "../helpers/requests";

const signIn = (email: string, password: string) =>
  loginAction(args(new Request("http://127.0.0.1/login", { method: "POST", body: new URLSearchParams({ email, password, redirectTo: "/rigs" }) })));

beforeAll(() => resetDatabase());

describe("sign-in", () => {
  it("signs in with the right password and sets an HttpOnly, SameSite=Lax session cookie", async () => {
    const res = (await signIn("dana@cedarflats.example", "field-demo-2026")) as Response;
    expect(res.status).toBe(302);
    expect(res.headers.get("Location")).toBe("/rigs");
    const cookie = res.headers.get("Set-Cookie")!;
    expect(cookie).toMatch(/^__tankside=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it("gives the same 401 message for a wrong password and an unknown e-mail, with no cookie", async () => {
    const wrong = await run(() => signIn("dana@cedarflats.example", "nope"));
    const unknown = await run(() => signIn("nobody@cedarflats.example", "nope"));
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect((wrong.data as { error: string }).error).toBe((unknown.data as { error: string }).error);
  });

  it("names an empty field instead of trying", async () => {
    const res = await run(() => signIn("", ""));
    expect(res.status).toBe(400);
    expect(res.data).toMatchObject({ fields: { email: "Enter your e-mail.", password: "Enter your password." } });
  });

  it("never redirects off-site after sign-in", async () => {
    const res = await run(() => loginLoader(args(new Request("http://127.0.0.1/login?redirectTo=//evil.example/x"))));
    // Nothing safe to go back to: the form carries no target, and the person lands where their role starts.
    expect((res.data as { redirectTo: string }).redirectTo).toBe("");
  });

  it(`locks an account for 15 minutes after ${MAX_FAILURES} failures in 15 minutes`, async () => {
    for (let i = 0; i < MAX_FAILURES; i++) {
      expect((await run(() => signIn("sam@bluemesa.example", "wrong"))).status).toBe(401);
    }
    const locked = await run(() => signIn("sam@bluemesa.example", "field-demo-2026"));
    expect(locked.status).toBe(423);
    expect((locked.data as { error: string }).error).toMatch(/locked for 15 more minutes/);
    // Once the lock has passed, the right password works again and clears the counter.
    await User.update({ lockedUntil: new Date(Date.now() - 1000) }, { where: { email: "sam@bluemesa.example" } });
    expect((await run(() => signIn("sam@bluemesa.example", "field-demo-2026"))).status).toBe(302);
    const sam = await User.findOne({ where: { email: "sam@bluemesa.example" } });
    expect(sam!.failedLogins).toBe(0);
  });
});

describe("guards", () => {
  it("sends a signed-out person to sign-in with the way back", async () => {
    const res = await run(async () => shellLoader(args(await requestAs(null, "/rigs/CF-07?x=1"))));
    expect(res.status).toBe(302);
    expect(res.location).toBe("/login?redirectTo=%2Frigs%2FCF-07%3Fx%3D1");
  });

  it("gives a lower role 403 on an admin page", async () => {
    for (const email of ["dana@cedarflats.example", "ravi@cedarflats.example", "mo@cedarflats.example"]) {
      expect((await run(async () => newRigLoader(args(await requestAs(email, "/rigs/new"))))).status).toBe(403);
    }
    expect((await run(async () => newRigLoader(args(await requestAs("june@cedarflats.example", "/rigs/new"))))).status).toBe(200);
  });
});
