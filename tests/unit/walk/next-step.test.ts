import { transition } from "xstate";
import { describe, expect, it } from "vitest";
import { compileGuide, machineSteps } from "~/lib/guides/compile";
import { loadLibrary } from "~/lib/guides/files.server";
import { guideSteps } from "~/lib/walk/next-step";
import { replayWalk } from "~/lib/walk/replay";
import { STEP_ANSWERS } from "~/lib/vocabulary";
import { root, tinyGuide } from "../../helpers/guides";

// The phone looks the next step up in the guide's `on` table instead of loading XState; for every
// shipped guide, every step and every answer (fitting or not), it must land where XState's own
// transition on the compiled machine lands.
const library = loadLibrary(root);

describe("the phone's next step is the machine's", () => {
  it.each(library.map((g) => [g.id, g] as const))("%s: every step and answer", (_id, guide) => {
    const machine = compileGuide(guide);
    const steps = guideSteps(guide);
    expect(steps.initial).toBe(String(machine.config.initial));
    let compared = 0;
    for (const here of Object.keys(guide.states)) {
      for (const answer of [...STEP_ANSWERS, "BACK", "NOPE"]) {
        const [next] = transition(machine, machine.resolveState({ value: here }), { type: answer });
        expect(steps.next(here, answer), `${here} —${answer}→`).toBe(String(next.value));
        compared++;
      }
    }
    expect(compared).toBe(Object.keys(guide.states).length * (STEP_ANSWERS.length + 2));
  });

  it("replays a walk to the same path either way", () => {
    const guide = tinyGuide();
    const answers = [
      { seq: 1, stepId: "look", answer: "YES" },
      { seq: 2, stepId: "stop", answer: "BACK" },
      { seq: 3, stepId: "look", answer: "YES" },
      { seq: 4, stepId: "stop", answer: "ACK" },
      { seq: 5, stepId: "fix", answer: "CANT" },
    ];
    expect(replayWalk(guideSteps(guide), answers)).toEqual(replayWalk(machineSteps(compileGuide(guide)), answers));
    expect(replayWalk(guideSteps(guide), answers)).toEqual(["look", "stop", "fix", "gone"]);
  });
});
