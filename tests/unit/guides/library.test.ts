import path from "node:path";
import { initialTransition, transition } from "xstate";
import { getSimplePaths } from "xstate/graph";
import { describe, expect, it } from "vitest";
import { compileGuide } from "~/lib/guides/compile";
import { checkGuideFiles, guideFilesIn, loadLibrary } from "~/lib/guides/files.server";
import { simplePaths } from "~/lib/guides/graph";
import { ANSWERS_BY_KIND as EVENTS_BY_KIND, STEP_ANSWERS as ANSWERS } from "~/lib/vocabulary";
import type { Guide } from "~/lib/guides/schema";
import { causes, root } from "../../helpers/guides";

// The fault guides; the rig cards have their own tests (cards.test.ts).
const library = loadLibrary(root).filter((g) => g.kind !== "card");
const REQUIRED = [
  "lost-prime",
  "short-throw",
  "foaming",
  "plugging",
  "leaks",
  "vibration",
  "agitator-stall",
  "slurry-too-thick",
  "valve-trouble",
  "excessive-wear",
  "pump-not-turning",
  "hydraulic-drive",
];

describe("the shipped guide library", () => {
  it("has every file valid", () => {
    const results = checkGuideFiles(guideFilesIn(path.join(root, "content/guides")), causes);
    expect(results.flatMap((r) => r.problems)).toEqual([]);
  });

  it("covers the twelve fault families", () => {
    expect(library.map((g) => g.id)).toEqual(expect.arrayContaining(REQUIRED));
  });

  it.each(library.map((g) => [g.id, g] as [string, Guide]))("%s: symptoms, minutes, fixed and handoff ends", (_id, guide) => {
    expect(guide.symptoms.length).toBeGreaterThanOrEqual(6);
    const steps = Object.entries(guide.states);
    for (const [id, step] of steps) {
      if (EVENTS_BY_KIND[step.meta.kind].length) expect(step.meta.minutes, `${id} has minutes`).toBeGreaterThan(0);
    }
    expect(steps.some(([, s]) => s.meta.kind === "fixed")).toBe(true);
    expect(steps.some(([, s]) => s.meta.kind === "handoff")).toBe(true);
  });

  it("uses field-math widgets in at least three guides", () => {
    const withFieldMath = library.filter((g) => Object.values(g.states).some((s) => s.meta.fieldMath));
    expect(withFieldMath.length).toBeGreaterThanOrEqual(3);
  });

  it.each(library.map((g) => [g.id, g] as [string, Guide]))("%s: every simple path ends in fixed or handoff, walked on the compiled machine", (_id, guide) => {
    const machine = compileGuide(guide);
    // Every path, however many: the short-throw guide has some twelve thousand.
    const paths = simplePaths(guide, 100_000);
    expect(paths.length).toBeGreaterThan(1);
    for (const p of paths) {
      let [snapshot] = initialTransition(machine);
      for (const answer of p.answers) [snapshot] = transition(machine, snapshot, { type: answer });
      expect(snapshot.status).toBe("done");
      expect(snapshot.value).toBe(p.steps[p.steps.length - 1]);
      expect(["fixed", "handoff"]).toContain(guide.states[snapshot.value as string].meta.kind);
    }
    // XState's own graph traversal is the independent oracle: same number of paths to an end.
    const oracle = getSimplePaths(machine, {
      events: ANSWERS.map((type) => ({ type })),
      toState: (s) => s.status === "done",
    });
    expect(oracle.length).toBe(paths.length);
  });
});
