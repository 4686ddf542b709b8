/**
 * `npm run bench:lighthouse`: Lighthouse's mobile performance score (its default: a mid-range
 * phone, slow 4G simulated, 4× CPU slowdown) for the sign-in page, a rig's fix page and a walk,
 * against the built app at BENCH_URL (default http://127.0.0.1:3000, started with `npm start`),
 * in Debian's Chromium (CHROME_PATH, default /usr/bin/chromium). RUNS=3 takes the median of three.
 */
import * as chromeLauncher from "chrome-launcher";
import { demoCookie } from "./demo-sign-in";
import lighthouse from "lighthouse";

const base = process.env.BENCH_URL ?? "http://127.0.0.1:3000";
const runs = Number(process.env.RUNS ?? 3);

const cookie = await demoCookie(base, "dana@cedarflats.example");
const opened = await fetch(`${base}/api/cases`, {
  method: "POST",
  headers: { "Content-Type": "application/json", Cookie: cookie, Origin: base },
  body: JSON.stringify({ rigCode: "CF-07", guideSlug: "lost-prime" }),
});
if (!opened.ok) throw new Error(`Could not open a case (${opened.status})`);
const { id } = (await opened.json()) as { id: string };

const pages: { name: string; path: string; signedIn: boolean }[] = [
  { name: "sign-in", path: "/login", signedIn: false },
  { name: "fix", path: "/rigs/CF-07/fix", signedIn: true },
  { name: "walk", path: `/cases/${id}/walk`, signedIn: true },
];

const chrome = await chromeLauncher.launch({
  chromePath: process.env.CHROME_PATH ?? "/usr/bin/chromium",
  chromeFlags: ["--headless=new", "--no-sandbox", "--disable-gpu", "--no-first-run"],
});
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
try {
  // A first run in a fresh browser measures the browser starting up, not the page: it is thrown away.
  await lighthouse(`${base}/login`, { port: chrome.port, onlyCategories: ["performance"], logLevel: "error" });
  for (const page of pages) {
    const scores: number[] = [];
    const metrics: Record<string, number[]> = { fcp: [], lcp: [], tbt: [], cls: [], si: [] };
    for (let i = 0; i < runs; i++) {
      const result = await lighthouse(
        `${base}${page.path}`,
        { port: chrome.port, onlyCategories: ["performance"], logLevel: "error", extraHeaders: page.signedIn ? { Cookie: cookie } : {} },
        undefined,
      );
      if (!result) throw new Error(`Lighthouse gave no result for ${page.path}`);
      const { lhr } = result;
      if (lhr.runtimeError) throw new Error(`${page.path}: ${lhr.runtimeError.message}`);
      scores.push(Math.round((lhr.categories.performance.score ?? 0) * 100));
      const audit = (name: string) => lhr.audits[name]?.numericValue ?? NaN;
      metrics.fcp.push(audit("first-contentful-paint"));
      metrics.lcp.push(audit("largest-contentful-paint"));
      metrics.tbt.push(audit("total-blocking-time"));
      metrics.cls.push(audit("cumulative-layout-shift"));
      metrics.si.push(audit("speed-index"));
    }
    const s = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
    console.log(
      `${page.name.padEnd(8)} performance ${median(scores)} (runs: ${scores.join(", ")}); first contentful paint ${s(median(metrics.fcp))}, ` +
        `largest ${s(median(metrics.lcp))}, blocking ${median(metrics.tbt).toFixed(0)} ms, layout shift ${median(metrics.cls).toFixed(3)}, speed index ${s(median(metrics.si))}`,
    );
  }
} finally {
  await chrome.kill();
}
