import { describe, expect, it } from "vitest";
import { compileGuide, machineSteps } from "~/lib/guides/compile";
import { answerFits, replayWalk } from "~/lib/walk/replay";
import { tinyGuide } from "../../helpers/guides";

// tiny.json: look (check) —YES→ stop (safety) —ACK→ fix (task) —DONE→ done (fixed); NO / CANT → gone (handoff).
const guide = tinyGuide();
const machine = machineSteps(compileGuide(guide));
const a = (seq: number, stepId: string, answer: string) => ({ seq, stepId, answer });

describe("does an answer fit its step", () => {
  it("takes each kind's own answers, BACK anywhere, and names what is wrong otherwise", () => {
    expect(answerFits(guide, "look", "YES")).toBeNull();
    expect(answerFits(guide, "stop", "ACK")).toBeNull();
    expect(answerFits(guide, "fix", "CANT")).toBeNull();
    expect(answerFits(guide, "fix", "BACK")).toBeNull();
    expect(answerFits(guide, "look", "DONE")).toBe("a check step takes YES or NO, not DONE");
    expect(answerFits(guide, "stop", "YES")).toBe("a safety step takes ACK, not YES");
    expect(answerFits(guide, "done", "YES")).toBe('step "done" is an end and takes no answers');
    expect(answerFits(guide, "nowhere", "YES")).toBe('step "nowhere" is not in this guide version');
  });
});

describe("replaying a walk-through", () => {
  it("follows the answers in seq order, whatever order they arrive in", () => {
    expect(replayWalk(machine, [a(3, "fix", "DONE"), a(1, "look", "YES"), a(2, "stop", "ACK")])).toEqual(["look", "stop", "fix", "done"]);
  });

  it("undoes one step per BACK, never past the first step", () => {
    expect(replayWalk(machine, [a(1, "look", "YES"), a(2, "stop", "BACK"), a(3, "look", "NO")])).toEqual(["look", "gone"]);
    expect(replayWalk(machine, [a(1, "look", "BACK"), a(2, "look", "BACK")])).toEqual(["look"]);
  });

  it("moves nothing for an answer to another step than the one the crew is at (a resend)", () => {
    expect(replayWalk(machine, [a(1, "look", "YES"), a(2, "look", "YES"), a(3, "stop", "ACK")])).toEqual(["look", "stop", "fix"]);
  });
});
