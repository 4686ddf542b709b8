import { createMachine } from "xstate";
import { getShortestPaths } from "xstate/graph";
import { describe, expect, it } from "vitest";
import { loadLibrary } from "~/lib/guides/files.server";
import type { Guide } from "~/lib/guides/schema";
import { ANSWERS_BY_KIND, STEP_ANSWERS as ANSWERS } from "~/lib/vocabulary";
import { validateGuide } from "~/lib/guides/validate";
import { CHECKLIST_ITEMS, checklistOf, CORE_STOP, HAZARD_NEEDS, STANDARD_STOP } from "~/lib/guides/safety";
import { causes, root, tinyGuide } from "../../helpers/guides";

// Small seeded generator so a failure can be replayed.
function rng(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Raw = { initial: string; states: Record<string, { type?: string; on?: Record<string, string>; meta: Record<string, unknown> }> } & Record<string, unknown>;

function mutate(g: Raw, random: () => number) {
  const pick = <T>(xs: T[]): T => xs[Math.floor(random() * xs.length)];
  const ids = Object.keys(g.states);
  const id = pick(ids);
  const step = g.states[id];
  const ops = [
    () => delete g.states[id],
    () => step.on && (step.on[pick(Object.keys(step.on))] = random() < 0.8 ? pick(ids) : "nowhere"),
    () => (step.meta.handsOn = !step.meta.handsOn),
    () => (step.meta.kind = pick(["check", "task", "safety", "fixed", "handoff"])),
    () => step.on && delete step.on[pick(Object.keys(step.on))],
    () => (step.on = { ...(step.on ?? {}), [pick([...ANSWERS])]: pick(ids) }),
    () => (step.meta.cause = random() < 0.5 ? "not-a-cause" : pick(causes).code),
    () => (g.initial = pick([...ids, "nowhere"])),
    () => (step.meta[pick(["colour", "severity"])] = 1),
    () => delete step.type,
    () => step.meta.kind === "safety" && (step.meta.kind = "check"),
    () => delete step.meta.component,
    // The safety model: restarts, checklists, hazards.
    () => (step.meta.energizes = !step.meta.energizes),
    () => (step.meta.hazards = [pick(["wet-side", "trapped-pressure", "hot-parts"])]),
    () => (step.meta.checklist = [...STANDARD_STOP, ...(random() < 0.5 ? ["suction-closed"] : [])].filter(() => random() < 0.85)),
  ];
  pick(ops)();
}

/** The rules, checked by XState's traversal rather than by the validator's own code. */
function breaksARule(g: Guide): string | null {
  const events = ANSWERS.map((type) => ({ type }));
  const machineFrom = (initial: string, stopAt: (id: string) => boolean = () => false) =>
    createMachine({
      initial,
      states: Object.fromEntries(
        Object.entries(g.states).map(([id, s]) => [id, ANSWERS_BY_KIND[s.meta.kind].length === 0 || stopAt(id) ? { type: "final" as const } : { on: s.on }]),
      ),
    });
  for (const [id, s] of Object.entries(g.states)) {
    const needed = [...ANSWERS_BY_KIND[s.meta.kind]].sort().join();
    if (
      Object.keys(s.on ?? {})
        .sort()
        .join() !== needed
    )
      return `${id}: events`;
    // A card's complete end carries no cause; a guide's fixed end must name one from the list.
    if (s.meta.kind === "fixed" && g.kind !== "card" && !causes.some((c) => c.code === s.meta.cause)) return `${id}: cause`;
    if (g.kind === "card" && s.meta.cause) return `${id}: cause on a card`;
  }
  if (!Object.values(g.states).some((s) => s.meta.kind === "fixed")) return "no fixed";
  const reached = getShortestPaths(machineFrom(g.initial), { events }).map((p) => p.state.value as string);
  if (new Set(reached).size !== Object.keys(g.states).length) return "unreachable";
  for (const id of Object.keys(g.states)) {
    const ends = getShortestPaths(machineFrom(id), { events }).filter((p) => p.state.status === "done");
    if (ends.length === 0) return `${id}: no end`;
  }
  // Independently of the checker's dataflow: for each thing a stop isolates, walk from the start and from every
  // step that puts energy back, passing any stop that does not isolate it; a hands-on step reached that needs it is unguarded.
  const needs = (s: Guide["states"][string]) => [...STANDARD_STOP, ...(s.meta.hazards ?? []).map((h) => HAZARD_NEEDS[h].item)];
  const starts = [g.initial, ...Object.keys(g.states).filter((id) => g.states[id].meta.energizes)];
  for (const item of CHECKLIST_ITEMS) {
    for (const start of starts) {
      const walked = getShortestPaths(
        // A walk from a restart passes the restart itself; one from the first step stops there if it is a stop (a card opens with one).
        machineFrom(
          start,
          (id) => (id !== start || start === g.initial) && g.states[id].meta.kind === "safety" && checklistOf(g.states[id].meta).includes(item),
        ),
        { events },
      );
      for (const p of walked) {
        const s = g.states[p.state.value as string];
        if (p.state.value === start && start !== g.initial) continue;
        if (s.meta.handsOn && s.meta.kind !== "safety" && needs(s).includes(item)) return `unguarded for ${item}`;
      }
    }
  }
  for (const [id, s] of Object.entries(g.states)) {
    if (s.meta.kind === "safety" && s.meta.checklist?.length && !CORE_STOP.every((i) => s.meta.checklist!.includes(i))) return `${id}: stop without its core`;
    if (s.meta.energizes && s.meta.handsOn) return `${id}: energizes and hands-on`;
  }
  return null;
}

describe("validator fuzz", () => {
  it("never throws and never accepts a guide that breaks a rule (1,200 mutated guides)", () => {
    const random = rng(20261202);
    const seeds = [tinyGuide(), ...loadLibrary(root)];
    let accepted = 0;
    let rejected = 0;
    for (let i = 0; i < 1200; i++) {
      const g = structuredClone(seeds[i % seeds.length]) as unknown as Raw;
      const n = 1 + Math.floor(random() * 3);
      for (let k = 0; k < n && Object.keys(g.states).length > 1; k++) mutate(g, random);
      const result = validateGuide(JSON.stringify(g), { causes });
      expect(result.problems.some((p) => p.message.startsWith("could not be checked"))).toBe(false);
      if (result.guide) {
        accepted++;
        expect(breaksARule(result.guide), `case ${i}`).toBeNull();
      } else {
        rejected++;
        expect(result.problems.length).toBeGreaterThan(0);
      }
    }
    // Both sides must be exercised for the test to mean anything.
    expect(accepted).toBeGreaterThan(20);
    expect(rejected).toBeGreaterThan(500);
  });
});
