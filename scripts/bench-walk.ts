/**
 * `npm run bench:walk`: how heavy and how quick the walk-through is on a cheap phone.
 *
 *  1. JavaScript each crew route loads, gzipped, read from the build's manifest: what every page
 *     loads (entry, root, the app frame) and what the route adds beyond it.
 *  2. Answer → next prompt painted, in Chromium at 4× CPU slowdown, over 80 answers (answer, then
 *     "back one step", repeated), p50 and p95. Runs against the app at BENCH_URL (default: start
 *     `npm start` first, http://127.0.0.1:3000) as the demo crew member.
 *  3. Cold loads on slow 4G at 4× CPU, cache off, first visit: first paint, the page's main thing
 *     painted (the walk's first prompt, the board), buttons working (hydrated), layout shift.
 */
import fs from "node:fs";
import path from "node:path";
import { gzipSync } from "node:zlib";
import { demoCookie } from "./demo-sign-in";
import { chromium, type BrowserContext, type Page } from "playwright-core";

const root = path.resolve(import.meta.dirname, "..");
const client = path.join(root, "build/client");
const base = process.env.BENCH_URL ?? "http://127.0.0.1:3000";

interface ManifestRoute {
  module: string;
  imports?: string[];
  css?: string[];
  clientLoaderModule?: string;
  clientActionModule?: string;
}

function readManifest(): { entry: ManifestRoute; routes: Record<string, ManifestRoute> } {
  const file = fs.readdirSync(path.join(client, "assets")).find((f) => /^manifest-.*\.js$/.test(f));
  if (!file) throw new Error("No build manifest: run `npm run build` first.");
  const text = fs.readFileSync(path.join(client, "assets", file), "utf8");
  return JSON.parse(text.slice(text.indexOf("{"), text.lastIndexOf("}") + 1));
}

const gz = new Map<string, number>();
const gzipBytes = (url: string) => {
  if (!gz.has(url)) gz.set(url, gzipSync(fs.readFileSync(path.join(client, url))).length);
  return gz.get(url)!;
};
const filesOf = (r: ManifestRoute) => [r.module, ...(r.imports ?? []), ...(r.clientLoaderModule ? [r.clientLoaderModule] : [])];
const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;

function bundleReport() {
  const { entry, routes } = readManifest();
  const shared = new Set([...filesOf(entry), ...filesOf(routes.root), ...filesOf(routes["routes/shell"])]);
  const sharedBytes = [...shared].reduce((s, f) => s + gzipBytes(f), 0);
  console.log(`JavaScript, gzipped (from the build manifest):`);
  console.log(`  every page (entry, root, app frame): ${kb(sharedBytes)}`);
  for (const id of ["routes/home", "routes/rigs.$code.fix", "routes/cases.$id.walk", "routes/field-math.$screen", "routes/board"]) {
    const own = [...new Set(filesOf(routes[id]))].filter((f) => !shared.has(f));
    const ownBytes = own.reduce((s, f) => s + gzipBytes(f), 0);
    console.log(`  ${id.padEnd(28)} +${kb(ownBytes).padStart(9)}   ${kb(sharedBytes + ownBytes).padStart(9)} in all`);
  }
}

const percentile = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)];
};

/** Runs `work` in a fresh phone-sized Chromium, signed in as the demo crew member. */
async function asCrewMember(work: (context: BrowserContext, page: Page) => Promise<void>) {
  const dir = fs.mkdtempSync(path.join(root, ".data", "bench-walk-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: "/usr/bin/chromium",
    headless: true,
    viewport: { width: 360, height: 640 },
    args: ["--no-sandbox", "--disable-gpu"],
  });
  try {
    const page = await context.newPage();
    await page.goto(`${base}/login`);
    await page.getByLabel("E-mail").fill("dana@cedarflats.example");
    await page.getByLabel("Password").fill("field-demo-2026");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => u.pathname !== "/login");
    await work(context, page);
  } finally {
    await context.close();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

async function answerTimes() {
  await asCrewMember(async (context, page) => {
    await page.goto(`${base}/rigs/CF-07/fix`);
    await page.getByRole("button", { name: /Foam in the tank/ }).click();
    await page.waitForURL(/\/walk$/);
    await page.locator("#step-prompt").waitFor();
    const cdp = await context.newCDPSession(page);
    await cdp.send("Emulation.setCPUThrottlingRate", { rate: 4 });

    // Each answer is a real tap (Playwright's trusted click); the browser's Event Timing API gives
    // each interaction's time from the tap to the next frame painted. Interactions under 16 ms are
    // not reported by the browser (its lowest threshold), so they count as "16 ms or less".
    await page.evaluate(() => {
      const w = window as unknown as { __taps: Map<number, number> };
      w.__taps = new Map();
      new PerformanceObserver((list) => {
        // interactionId is in Chromium's Event Timing but not yet in TypeScript's DOM types.
        for (const e of list.getEntries() as (PerformanceEventTiming & { interactionId?: number })[]) {
          if (e.interactionId) w.__taps.set(e.interactionId, Math.max(w.__taps.get(e.interactionId) ?? 0, e.duration));
        }
      }).observe({ type: "event", durationThreshold: 16, buffered: true } as PerformanceObserverInit);
    });
    const answers = 80;
    for (let i = 0; i < answers / 2; i++) {
      for (const name of [i % 2 === 0 ? "Yes" : "No", "Back one step"]) {
        const before = await page.locator("#step-prompt").textContent();
        await page.getByRole("button", { name, exact: true }).click();
        await page.waitForFunction((text) => document.querySelector("#step-prompt")?.textContent !== text, before);
      }
    }
    await page.waitForTimeout(500);
    const slow = await page.evaluate(() => [...(window as unknown as { __taps: Map<number, number> }).__taps.values()]);
    const times = [...slow, ...Array(Math.max(0, answers - slow.length)).fill(16)];
    const p = (q: number) => percentile(times, q);
    const say = (ms: number) => (ms <= 16 ? "≤ 16 ms" : `${ms} ms`);
    console.log(
      `Answer → next prompt painted (Event Timing), 4× CPU slowdown, ${answers} taps: p50 ${say(p(50))}, p95 ${say(p(95))}, max ${say(Math.max(...times))}; ${slow.length} over 16 ms`,
    );
  });
}

async function cookieOf(email: string) {
  const cookie = await demoCookie(base, email);
  const at = cookie.indexOf("=");
  return { name: cookie.slice(0, at), value: cookie.slice(at + 1), url: base };
}

/**
 * Each page loaded cold on slow 4G at 4× CPU, cache off, in a fresh browser context with no service
 * worker (a first visit): first paint, when the page's main thing was painted (the walk's prompt,
 * the board's figures), when its buttons work (React has hydrated them), and layout shift.
 */
async function coldLoads() {
  const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", headless: true, args: ["--no-sandbox", "--disable-gpu"] });
  const crew = await cookieOf("dana@cedarflats.example");
  const supervisor = await cookieOf("mo@cedarflats.example");
  const opened = await fetch(`${base}/api/cases`, {
    method: "POST",
    headers: { "Content-Type": "application/json", Cookie: `${crew.name}=${crew.value}`, Origin: base },
    body: JSON.stringify({ rigCode: "CF-07", guideSlug: "lost-prime" }),
  });
  const { id } = (await opened.json()) as { id: string };
  console.log("Cold load, slow 4G (150 ms, 1.6 Mbps down) and 4× CPU, cache off, first visit (no service worker):");
  const pages: [string, string, typeof crew | null, string, string][] = [
    ["sign-in (signed out)", "/login", null, "h1", "button[type=submit]"],
    ["home", "/", crew, "h1", "a[href^='/rigs/']"],
    ["start a fix", "/rigs/CF-07/fix", crew, "h1", "button"],
    ["walk (first prompt)", `/cases/${id}/walk`, crew, "#step-prompt", "[data-answer] , main button"],
    ["board (supervisor)", "/board", supervisor, "main table, main h2", "main a, main button"],
  ];
  try {
    for (const [label, address, cookie, main, button] of pages) {
      const context = await browser.newContext({ viewport: { width: 360, height: 640 }, serviceWorkers: "block" });
      if (cookie) await context.addCookies([cookie]);
      const q = await context.newPage();
      const cdp = await context.newCDPSession(q);
      await cdp.send("Network.enable");
      await cdp.send("Network.setCacheDisabled", { cacheDisabled: true });
      await cdp.send("Network.emulateNetworkConditions", {
        offline: false,
        latency: 150,
        downloadThroughput: (1.6 * 1024 * 1024) / 8,
        uploadThroughput: (750 * 1024) / 8,
      });
      await cdp.send("Emulation.setCPUThrottlingRate", { rate: 4 });
      await q.addInitScript(
        ([main, button]) => {
          const w = window as unknown as { __shift: number; __main?: number; __live?: number };
          w.__shift = 0;
          new PerformanceObserver((list) => {
            for (const e of list.getEntries() as (PerformanceEntry & { value: number; hadRecentInput: boolean })[]) if (!e.hadRecentInput) w.__shift += e.value;
          }).observe({ type: "layout-shift", buffered: true });
          // Painted: the next frame after the element is in the page. Working: React has put its handlers on a button.
          // (No named functions here: the script runner's name helper does not exist in the page.)
          const timer = setInterval(() => {
            if (w.__main === undefined && document.querySelector(main)) requestAnimationFrame(() => (w.__main ??= performance.now()));
            const b = document.querySelector(button);
            if (w.__live === undefined && b && Object.keys(b).some((k) => k.startsWith("__reactProps"))) w.__live = performance.now();
            if (w.__main !== undefined && w.__live !== undefined) clearInterval(timer);
          }, 10);
        },
        [main, button],
      );
      await q.goto(`${base}${address}`, { waitUntil: "load" });
      await q.waitForTimeout(2500);
      const r = await q.evaluate(() => {
        const w = window as unknown as { __shift: number; __main?: number; __live?: number };
        return {
          fcp: performance.getEntriesByName("first-contentful-paint")[0]?.startTime ?? NaN,
          main: w.__main ?? NaN,
          live: w.__live ?? NaN,
          shift: w.__shift,
        };
      });
      const sec = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
      // Nothing is painted before the first paint, though a frame callback may run while the styles still load.
      console.log(
        `  ${label.padEnd(22)} first paint ${sec(r.fcp)}, main thing painted ${sec(Math.max(r.fcp, r.main))}, buttons working ${sec(r.live)}, layout shift ${r.shift.toFixed(3)}`,
      );
      await context.close();
    }
  } finally {
    await browser.close();
  }
}

// PARTS=bundle,answers,cold (the default: all three) runs only those named.
const parts = (process.env.PARTS ?? "bundle,answers,cold").split(",");
if (parts.includes("bundle")) bundleReport();
if (parts.includes("answers")) await answerTimes();
if (parts.includes("cold")) await coldLoads();
