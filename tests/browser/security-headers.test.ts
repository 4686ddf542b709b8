import { PassThrough } from "node:stream";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createApp } from "../../server.js";
import { freePort, startApp, type RunningApp } from "../helpers/app";

let app: RunningApp;
beforeAll(async () => {
  app = await startApp();
});
afterAll(() => app?.stop());

const post = (path: string, init: { origin?: string | null; referer?: string; type?: string; body?: string; cookie?: string }) =>
  fetch(`${app.url}${path}`, {
    method: "POST",
    redirect: "manual",
    headers: {
      ...(init.origin ? { Origin: init.origin } : {}),
      ...(init.referer ? { Referer: init.referer } : {}),
      ...(init.type ? { "Content-Type": init.type } : {}),
      ...(init.cookie ? { Cookie: init.cookie } : {}),
    },
    body: init.body ?? "",
  });

/** Signs in through the real form over HTTP and returns the session cookie. */
async function signedIn(email: string): Promise<string> {
  const res = await post("/login", {
    origin: app.url,
    type: "application/x-www-form-urlencoded",
    body: new URLSearchParams({ email, password: "field-demo-2026" }).toString(),
  });
  expect(res.status).toBe(302);
  return res.headers.get("Set-Cookie")!.split(";")[0];
}

describe("security headers on every response (OWASP ASVS 14.4)", () => {
  it("sends a CSP whose script nonce matches every inline script, and no unsafe-inline for scripts", async () => {
    const res = await fetch(`${app.url}/login`);
    const csp = res.headers.get("Content-Security-Policy")!;
    const nonce = csp.match(/script-src 'self' 'nonce-([A-Za-z0-9+/=]+)'/)![1];
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(csp).toMatch(/frame-ancestors 'none'/);
    const html = await res.text();
    const inline = [...html.matchAll(/<script(?![^>]*\bsrc=)([^>]*)>/g)].map((m) => m[1]);
    expect(inline.length).toBeGreaterThan(0);
    for (const attrs of inline) expect(attrs).toContain(`nonce="${nonce}"`);
    // A new nonce for the next response.
    const again = (await fetch(`${app.url}/login`)).headers.get("Content-Security-Policy")!;
    expect(again).not.toContain(nonce);
    expect(res.headers.get("X-Content-Type-Options")).toBe("nosniff");
    expect(res.headers.get("Referrer-Policy")).toBe("same-origin");
    expect(res.headers.get("Permissions-Policy")).toMatch(/camera=\(self\)/);
    expect(res.headers.get("Cross-Origin-Opener-Policy")).toBe("same-origin");
    expect(res.headers.get("Strict-Transport-Security")).toBeNull(); // plain http on loopback
    expect(res.headers.get("X-Powered-By")).toBeNull();
    // Pages are never kept: Back after signing out shows nothing private.
    expect(res.headers.get("Cache-Control")).toBe("private, no-store");
  });

  it("sends no Referer from pages that carry a token", async () => {
    for (const path of ["/join/abc123", "/reset/abc123"]) expect((await fetch(`${app.url}${path}`)).headers.get("Referrer-Policy"), path).toBe("no-referrer");
  });

  it("adds HSTS when the app's address is https, and keeps tokens out of the access log", async () => {
    const lines: string[] = [];
    const logStream = new PassThrough();
    logStream.on("data", (c) => lines.push(String(c)));
    const secure = await createApp({ appUrl: "https://tankside.example", logStream });
    const port = await freePort();
    const server = secure.listen(port, "127.0.0.1");
    try {
      const res = await fetch(`http://127.0.0.1:${port}/join/SECRET-TOKEN-123?x=1`);
      expect(res.headers.get("Strict-Transport-Security")).toMatch(/max-age=31536000/);
      expect(res.headers.get("Content-Security-Policy")).toMatch(/upgrade-insecure-requests/);
      await fetch(`http://127.0.0.1:${port}/reset/OTHER-SECRET`);
      await new Promise((r) => setTimeout(r, 100));
      const log = lines.join("");
      expect(log).toMatch(/GET \/join\/\[token\]\?x=1 /);
      expect(log).toMatch(/GET \/reset\/\[token\] /);
      expect(log).not.toMatch(/SECRET/);
    } finally {
      server.close();
    }
  });
});

describe("cross-site requests (OWASP ASVS 13.2.3, 4.2.2)", () => {
  it("refuses every change from another origin, even another port of the same host, and one with no origin at all", async () => {
    const cookie = await signedIn("dana@cedarflats.example");
    const foreign = app.url.replace(/:(\d+)$/, (_m, p) => `:${Number(p) + 1}`);
    const body = JSON.stringify({ rigCode: "CF-07", guideSlug: "foaming" });
    for (const [path, type] of [
      ["/api/cases", "application/json"],
      ["/api/cases", "text/plain"],
      ["/logout", "application/x-www-form-urlencoded"],
      ["/rigs/CF-07/fix", "application/x-www-form-urlencoded"],
    ]) {
      expect((await post(path, { origin: foreign, type, body, cookie })).status, `${path} from ${foreign}`).toBe(403);
      expect((await post(path, { referer: `${foreign}/page`, type, body, cookie })).status, `${path} referred from ${foreign}`).toBe(403);
      expect((await post(path, { type, body, cookie })).status, `${path} with no origin`).toBe(403);
    }
  });

  it("takes a same-origin change, and refuses a JSON route's body that is not declared JSON (415)", async () => {
    const cookie = await signedIn("dana@cedarflats.example");
    const body = JSON.stringify({ rigCode: "CF-07", guideSlug: "foaming" });
    expect((await post("/api/cases", { origin: app.url, type: "text/plain", body, cookie })).status).toBe(415);
    expect((await post("/api/cases", { origin: app.url, type: "application/json", body, cookie })).status).toBe(201);
    expect((await post("/api/cases", { referer: `${app.url}/rigs/CF-07/fix`, type: "application/json", body, cookie })).status).toBe(201);
  });
});
