/**
 * `npm run load:events`: phones sending answers at a fixed arrival rate (open loop: a slow answer
 * does not slow the next send, as with real phones), against the app at BENCH_URL (default
 * http://127.0.0.1:3000, started with `npm start`). Prints latency percentiles and errors.
 *
 *   RATE=500 SECONDS=10 CASES=200 npm run load:events
 *
 * 500 batches a second is 2,000 phones each sending every 4 s. Each batch is 1–3 new answers.
 */
import { randomUUID } from "node:crypto";
import { demoCookie } from "./demo-sign-in";
import { performance } from "node:perf_hooks";

const base = process.env.BENCH_URL ?? "http://127.0.0.1:3000";
const rate = Number(process.env.RATE ?? 500);
const seconds = Number(process.env.SECONDS ?? 10);
const caseCount = Number(process.env.CASES ?? 200);

const cookie = await demoCookie(base, "dana@cedarflats.example");
const headers = { "Content-Type": "application/json", Cookie: cookie, Origin: base };

// Cases on the demo's rigs, walked on the foaming guide: every batch answers its first check.
const cases: { id: string; seq: number }[] = [];
for (let i = 0; i < caseCount; i++) {
  const id = randomUUID();
  const res = await fetch(`${base}/api/cases`, {
    method: "POST",
    headers,
    body: JSON.stringify({ id, rigCode: ["CF-03", "CF-07", "CF-11"][i % 3], guideSlug: "foaming" }),
  });
  if (!res.ok) throw new Error(`Could not open a case (${res.status}): ${await res.text()}`);
  cases.push({ id, seq: 0 });
}

const total = Math.round(rate * seconds);
const latencies: number[] = [];
const errors = new Map<string, number>();
const started = performance.now();
const sends: Promise<void>[] = [];
for (let i = 0; i < total; i++) {
  const due = started + (i * 1000) / rate;
  const wait = due - performance.now();
  if (wait > 1) await new Promise((r) => setTimeout(r, wait));
  const c = cases[i % cases.length];
  const events = Array.from({ length: 1 + (i % 3) }, () => ({
    id: randomUUID(),
    seq: ++c.seq,
    stepId: "agitator-speed",
    answer: "YES",
    at: new Date().toISOString(),
  }));
  sends.push(
    fetch(`${base}/api/cases/${c.id}/events`, { method: "POST", headers, body: JSON.stringify({ events }) })
      .then(async (res) => {
        await res.arrayBuffer();
        // Measured from when the batch was due, so a backlog shows as latency rather than hiding.
        latencies.push(performance.now() - due);
        if (!res.ok) errors.set(String(res.status), (errors.get(String(res.status)) ?? 0) + 1);
      })
      .catch((e: Error) => void errors.set(e.message, (errors.get(e.message) ?? 0) + 1)),
  );
}
await Promise.all(sends);
const elapsed = (performance.now() - started) / 1000;
const sorted = latencies.sort((a, b) => a - b);
const p = (q: number) => sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)].toFixed(1);
console.log(
  `${total} batches at ${rate}/s over ${seconds} s (${(total / elapsed).toFixed(0)}/s achieved): p50 ${p(0.5)} ms, p95 ${p(0.95)} ms, p99 ${p(0.99)} ms, max ${sorted[sorted.length - 1].toFixed(1)} ms; errors ${errors.size ? JSON.stringify(Object.fromEntries(errors)) : "none"}`,
);
