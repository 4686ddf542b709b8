/**
 * `npm run load:reads`: a supervisor's reports under load — `/api/board` and the cases table
 * (`/cases`, the page's data) each kept busy by CONNECTIONS clients at once (closed loop: each sends
 * its next request when the last is answered) for SECONDS, against the app at BENCH_URL (default
 * http://127.0.0.1:3000, started with `npm start`). Prints requests a second, latency percentiles
 * and errors per path.
 *
 *   CONNECTIONS=50 SECONDS=10 npm run load:reads
 */
import { demoCookie } from "./demo-sign-in";
import { performance } from "node:perf_hooks";

const base = process.env.BENCH_URL ?? "http://127.0.0.1:3000";
const connections = Number(process.env.CONNECTIONS ?? 50);
const seconds = Number(process.env.SECONDS ?? 10);
const PATHS = ["/api/board", "/cases.data"];

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] ?? NaN;

async function load(path: string, cookie: string) {
  const latencies: number[] = [];
  const errors = new Map<string, number>();
  const until = performance.now() + seconds * 1000;
  const client = async () => {
    while (performance.now() < until) {
      const t = performance.now();
      try {
        const res = await fetch(`${base}${path}`, { headers: { Cookie: cookie } });
        await res.arrayBuffer();
        if (!res.ok) errors.set(String(res.status), (errors.get(String(res.status)) ?? 0) + 1);
        else latencies.push(performance.now() - t);
      } catch (error) {
        const key = error instanceof Error ? error.message : String(error);
        errors.set(key, (errors.get(key) ?? 0) + 1);
      }
    }
  };
  // One warm-up request so the first figures are not the process's first compile of the route.
  await fetch(`${base}${path}`, { headers: { Cookie: cookie } }).then((r) => r.arrayBuffer());
  await Promise.all(Array.from({ length: connections }, client));
  latencies.sort((a, b) => a - b);
  const ms = (v: number) => `${v.toFixed(0)} ms`;
  console.log(
    `${path.padEnd(12)} ${connections} connections, ${seconds} s: ${(latencies.length / seconds).toFixed(0)} req/s, ` +
      `p50 ${ms(percentile(latencies, 50))}, p95 ${ms(percentile(latencies, 95))}, p99 ${ms(percentile(latencies, 99))}, ` +
      `errors ${[...errors].map(([k, n]) => `${k}×${n}`).join(", ") || "none"}`,
  );
}

const cookie = await demoCookie(base, "mo@cedarflats.example");
for (const path of PATHS) await load(path, cookie);
