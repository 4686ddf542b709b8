/**
 * The real built app for browser tests: its own database (seeded with the demo), served
 * by react-router-serve on a free loopback port, and Debian's Chromium through playwright-core.
 */
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { afterAll, afterEach, beforeAll } from "vitest";
import { buildIfStale } from "../../scripts/build-if-stale";
import { freePort } from "../../scripts/free-port";
import { resetDatabase } from "./db";

const root = path.resolve(import.meta.dirname, "../..");

export { freePort };

export interface RunningApp {
  url: string;
  env: NodeJS.ProcessEnv;
  stop(): Promise<void>;
}

/** Builds when stale, resets the test database to the demo, and serves the app. */
export async function startApp(extraEnv: NodeJS.ProcessEnv = {}): Promise<RunningApp> {
  buildIfStale(root, () => {});
  await resetDatabase();
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    HOST: "127.0.0.1",
    PORT: String(port),
    APP_URL: url,
    SESSION_SECRET: "browser-test-secret-0123456789",
    SHOW_DEMO_SIGNINS: "1",
    ...extraEnv,
  };
  const child: ChildProcess = spawn(process.execPath, [path.join(root, "server.js")], {
    cwd: root,
    env,
    stdio: ["ignore", "ignore", "pipe"],
  });
  let stderr = "";
  child.stderr?.on("data", (chunk) => (stderr += chunk));
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The app exited: ${stderr}`);
    try {
      if ((await fetch(`${url}/healthz`)).ok) break;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  return {
    url,
    env,
    async stop() {
      if (child.exitCode === null) {
        child.kill("SIGTERM");
        await new Promise((r) => child.once("exit", r));
      }
    },
  };
}

export const PHONE = { width: 360, height: 640 };

/** What the browser reported breaking the Content-Security-Policy (any page of the context). */
export const cspViolations: string[] = [];

export async function launchBrowser(viewport = PHONE): Promise<{ context: BrowserContext; close(): Promise<void> }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "tankside-chromium-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: "/usr/bin/chromium",
    headless: true,
    viewport,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  // Fail with the locator's name well inside the test's own timeout.
  context.setDefaultTimeout(10_000);
  // Every browser test runs with the app's real security headers: a refused script or style fails it.
  context.on("page", (page) =>
    page.on("console", (m) => {
      if (/Content Security Policy|Refused to (execute|load|apply|connect|frame)/i.test(m.text())) cspViolations.push(`${page.url()}: ${m.text()}`);
    }),
  );
  return {
    context,
    async close() {
      await context.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Signs in through the real form; waits until the app has left the sign-in page. */
export async function signIn(page: Page, appUrl: string, email: string, password = "field-demo-2026") {
  await page.goto(`${appUrl}/login`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => url.pathname !== "/login");
}

/** Submits the sign-in form and returns the status of the POST, staying on the page. */
export async function failSignIn(page: Page, appUrl: string, email: string, password: string): Promise<number> {
  await page.goto(`${appUrl}/login`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  const response = page.waitForResponse((r) => r.url().includes("/login") && r.request().method() === "POST");
  await page.getByRole("button", { name: "Sign in" }).click();
  return (await response).status();
}

/**
 * For a browser test file: the built app and a browser for all its tests, stopped at the end.
 * Read `.app` and `.browser` inside tests (they are set in beforeAll).
 */
export function appAndBrowserForFile(viewport = PHONE) {
  const harness = {} as { app: RunningApp; browser: Awaited<ReturnType<typeof launchBrowser>> };
  beforeAll(async () => {
    harness.app = await startApp();
    harness.browser = await launchBrowser(viewport);
  });
  afterEach(() => {
    const seen = cspViolations.splice(0);
    if (seen.length) throw new Error(`Content-Security-Policy violations:\n${seen.join("\n")}`);
  });
  afterAll(async () => {
    await harness.browser?.close();
    await harness.app?.stop();
  });
  return harness;
}

/** Starts a case from the signed-in page through the API, as the fix page does (a card with its hour reading); returns its id. */
export async function startCaseFromPage(page: Page, rigCode: string, guideSlug: string, engineHours?: number): Promise<string> {
  return page.evaluate(
    async ([rigCode, guideSlug, engineHours]) => {
      const body = JSON.stringify({ rigCode, guideSlug, ...(engineHours === null ? {} : { engineHours }) });
      const res = await fetch("/api/cases", { method: "POST", headers: { "Content-Type": "application/json" }, body });
      return ((await res.json()) as { id: string }).id;
    },
    [rigCode, guideSlug, engineHours ?? null] as const,
  );
}

/** Waits until React has hydrated the page: typing before that can be overwritten by state kept on the phone. */
export async function hydrated(page: Page) {
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
}
