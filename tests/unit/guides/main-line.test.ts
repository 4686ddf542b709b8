import { describe, expect, it } from "vitest";
import { compileGuide } from "~/lib/guides/compile";
import { diffGuides } from "~/lib/guides/diff";
import { loadLibrary } from "~/lib/guides/files.server";
import { mainLine } from "~/lib/guides/main-line";
import { stepFlow } from "~/lib/stats/step-flow";
import { root, tinyGuide } from "../../helpers/guides";

const library = loadLibrary(root);

describe("main line of checks", () => {
  it("follows the way on in the lost-prime guide, keeping each safety stop with the check it guards", () => {
    const line = mainLine(library.find((g) => g.id === "lost-prime")!);
    expect(line.map((c) => c.stepId)).toEqual(["water-level", "suction-valve", "throttle", "air-sound", "drafting", "backflush-suction"]);
    expect(line.find((c) => c.stepId === "water-level")!.causes).toEqual(["low-water"]);
    const flush = line.find((c) => c.stepId === "backflush-suction")!;
    expect(flush.guard).toBe("stop-suction-plug");
    expect(flush.minutes).toBe(30 + 2);
  });

  it("gives every shipped guide that finds two causes or more a main line of at least two checks", () => {
    for (const g of library) {
      const found = new Set(Object.values(g.states).flatMap((s) => (s.meta.kind === "fixed" && s.meta.cause ? [s.meta.cause] : [])));
      if (found.size >= 2) expect(mainLine(g).length, g.id).toBeGreaterThanOrEqual(2);
    }
  });
});

describe("step flow from cases", () => {
  it("counts who reached each step, how they answered, where they stopped, and the median time", () => {
    const g = tinyGuide();
    const t = (s: number) => new Date(Date.UTC(2026, 0, 1, 8, 0, s)).toISOString();
    const flow = stepFlow(compileGuide(g), Object.keys(g.states), [
      {
        outcome: "fixed",
        finalStep: "done",
        openedAt: t(0),
        events: [
          { seq: 1, stepId: "look", answer: "YES", at: t(10) },
          { seq: 2, stepId: "stop", answer: "ACK", at: t(40) },
          { seq: 3, stepId: "fix", answer: "DONE", at: t(100) },
        ],
      },
      { outcome: "handoff", finalStep: "gone", openedAt: t(0), events: [{ seq: 1, stepId: "look", answer: "NO", at: t(20) }] },
      { outcome: "abandoned", finalStep: null, openedAt: t(0), events: [{ seq: 1, stepId: "look", answer: "YES", at: t(30) }] },
    ]);
    const by = Object.fromEntries(flow.map((f) => [f.stepId, f]));
    expect(by.look).toMatchObject({ reached: 3, answers: { YES: 2, NO: 1 }, medianSeconds: 20 });
    expect(by.stop).toMatchObject({ reached: 2, abandonedHere: 1, medianSeconds: 30 });
    expect(by.done).toMatchObject({ reached: 1, endedHere: 1 });
    expect(by.gone).toMatchObject({ reached: 1, endedHere: 1 });
  });
});

describe("diff between versions", () => {
  it("names steps added, removed and changed, with the fields", () => {
    const a = tinyGuide();
    const b = structuredClone(a);
    b.title = "Tiny guide, revised";
    b.states.look.meta.prompt = "Is it really broken?";
    b.states.look.on = { YES: "stop", NO: "extra" };
    b.states.extra = { on: { YES: "done", NO: "gone" }, meta: { kind: "check", prompt: "New?" } } as never;
    delete (b.states as Record<string, unknown>).gone;
    const d = diffGuides(a, b);
    expect(d.fields.map((f) => f.field)).toEqual(["title"]);
    expect(d.added).toEqual(["extra"]);
    expect(d.removed).toEqual(["gone"]);
    expect(d.changed).toEqual([{ step: "look", fields: ["prompt", "answers"] }]);
  });
});
