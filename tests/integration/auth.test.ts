import { beforeAll, describe, expect, it } from "vitest";
import { action as loginAction, loader as loginLoader } from "~/routes/login";
import { loader as shellLoader } from "~/routes/shell";
import { loader as newRigLoader } from "~/routes/rigs.new";
import { backOffSeconds, FREE_FAILURES } from "~/services/throttle.server";
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

  it("throttles one client's tries at one address with a doubling back-off, alike for known and unknown addresses, without locking the account", async () => {
    const from = (ip: string, email: string, password: string) =>
      run(() =>
        loginAction(
          args(
            new Request("http://127.0.0.1/login", {
              method: "POST",
              body: new URLSearchParams({ email, password, redirectTo: "/" }),
              headers: { "x-tankside-client-ip": ip },
            }),
          ),
        ),
      );
    const answers = async (email: string) => {
      const out = [];
      for (let i = 0; i < FREE_FAILURES + 1; i++) out.push((await from("10.0.0.7", email, "wrong password")).status);
      return out;
    };
    // Five free tries, the sixth still answered (and counted), then a wait.
    expect(await answers("sam@bluemesa.example")).toEqual([401, 401, 401, 401, 401, 401]);
    expect(await answers("nobody@bluemesa.example")).toEqual([401, 401, 401, 401, 401, 401]);
    const known = await from("10.0.0.7", "sam@bluemesa.example", "field-demo-2026");
    const unknown = await from("10.0.0.7", "nobody@bluemesa.example", "field-demo-2026");
    expect(known.status).toBe(429);
    expect(unknown.status).toBe(429);
    // The same words (only the seconds left differ with when each wait began).
    expect(known.data.error.replace(/\d+/, "N")).toBe(unknown.data.error.replace(/\d+/, "N"));
    // The account is not locked: the same person from another client signs in.
    expect((await from("10.0.0.8", "sam@bluemesa.example", "field-demo-2026")).status).toBe(302);
    // The back-off doubles past the free tries, up to 15 minutes.
    expect([1, 2, 3, 6, 20].map(backOffSeconds)).toEqual([30, 60, 120, 900, 900]);
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
