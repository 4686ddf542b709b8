import { ANSWERS_BY_KIND } from "../vocabulary";
import type { Guide } from "./schema";

/** The targets each step's answers lead to, in answer order (only targets that exist). */
export function edges(guide: Guide): Map<string, string[]> {
  const out = new Map<string, string[]>();
  for (const [id, step] of Object.entries(guide.states)) {
    const targets = Object.values(step.on ?? {}).filter((t): t is string => typeof t === "string" && t in guide.states);
    out.set(id, targets);
  }
  return out;
}

/** Steps reachable from `from` (itself included), optionally not passing through some steps. */
export function reachable(guide: Guide, from: string, opts: { stopAt?: (id: string) => boolean } = {}): Set<string> {
  const next = edges(guide);
  const seen = new Set<string>();
  const queue = from in guide.states ? [from] : [];
  while (queue.length) {
    const id = queue.shift()!;
    if (seen.has(id)) continue;
    seen.add(id);
    if (opts.stopAt?.(id)) continue;
    for (const t of next.get(id) ?? []) if (!seen.has(t)) queue.push(t);
  }
  return seen;
}

/** For each step, the fewest answers left to reach any final step (Infinity: none can be reached). */
export function stepsToEnd(guide: Guide): Record<string, number> {
  const back = new Map<string, string[]>();
  for (const [from, targets] of edges(guide)) for (const t of targets) back.set(t, [...(back.get(t) ?? []), from]);
  const dist: Record<string, number> = Object.fromEntries(Object.keys(guide.states).map((id) => [id, Infinity]));
  const queue: string[] = [];
  for (const [id, step] of Object.entries(guide.states)) {
    if (ANSWERS_BY_KIND[step.meta.kind].length === 0) {
      dist[id] = 0;
      queue.push(id);
    }
  }
  while (queue.length) {
    const id = queue.shift()!;
    for (const prev of back.get(id) ?? []) {
      if (dist[prev] === Infinity) {
        dist[prev] = dist[id] + 1;
        queue.push(prev);
      }
    }
  }
  return dist;
}

export interface GuidePath {
  steps: string[];
  answers: string[];
}

/** Every simple path (no step twice) from the initial step to a final step, with the answers taken. */
export function simplePaths(guide: Guide, limit = 10_000): GuidePath[] {
  const paths: GuidePath[] = [];
  const walk = (id: string, steps: string[], answers: string[]) => {
    if (paths.length >= limit) return;
    const step = guide.states[id];
    if (!step) return;
    if (ANSWERS_BY_KIND[step.meta.kind].length === 0) {
      paths.push({ steps: [...steps, id], answers });
      return;
    }
    for (const [answer, target] of Object.entries(step.on ?? {})) {
      if (typeof target === "string" && !steps.includes(target) && target !== id) walk(target, [...steps, id], [...answers, answer]);
    }
  };
  walk(guide.initial, [], []);
  return paths;
}
