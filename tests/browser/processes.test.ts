import http from "node:http";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startApp, type RunningApp } from "../helpers/app";

// `APP_PROCESSES=2 node server.js`: two app processes on one port, sharing only the database.
let app: RunningApp;
beforeAll(async () => {
  app = await startApp({ APP_PROCESSES: "2" });
});
afterAll(() => app?.stop());

/** One request on a connection of its own (so the processes take turns), without following redirects. */
function request(path: string, init: { method?: string; body?: string; headers?: Record<string, string> } = {}) {
  return new Promise<{ status: number; headers: http.IncomingHttpHeaders; body: string }>((resolve, reject) => {
    const req = http.request(`${app.url}${path}`, { method: init.method ?? "GET", headers: init.headers, agent: false }, (res) => {
      let body = "";
      res.on("data", (chunk) => (body += chunk));
      res.on("end", () => resolve({ status: res.statusCode!, headers: res.headers, body }));
    });
    req.on("error", reject);
    req.end(init.body);
  });
}

describe("more than one app process", () => {
  it("serves from both, and a sign-in made on one works on the other", async () => {
    const signIn = await request("/login", {
      method: "POST",
      body: new URLSearchParams({ email: "dana@cedarflats.example", password: "field-demo-2026", redirectTo: "" }).toString(),
      headers: { "Content-Type": "application/x-www-form-urlencoded", Origin: app.url },
    });
    expect(signIn.status).toBe(302);
    const madeOn = signIn.headers["x-tankside-process"];
    const cookie = String(signIn.headers["set-cookie"]).split(";")[0];

    const served = new Set<string>();
    for (let i = 0; i < 12; i++) {
      const res = await request("/account", { headers: { Cookie: cookie } });
      expect(res.status).toBe(200);
      expect(res.body).toContain("Dana");
      served.add(String(res.headers["x-tankside-process"]));
    }
    expect([...served].sort()).toEqual(["1", "2"]);
    expect(served.has(String(madeOn))).toBe(true);
  });
});
