import fs from "node:fs";
import { describe, expect, it } from "vitest";
import { compileGuide } from "~/lib/guides/compile";
import { simplePaths, stepsToEnd } from "~/lib/guides/graph";
import { describeProblem, validateGuide } from "~/lib/guides/validate";
import { initialTransition, transition } from "xstate";
import { causes, fixture, tinyGuide } from "../../helpers/guides";

// One fixture per rule, with the message it must produce (and the step it must name).
const EXPECTED: Record<string, RegExp> = {
  "bad-json": /bad-json: is not valid JSON: .*position 146 \(line 9, column 3\)/,
  "unknown-field": /step "look": unknown field "colour" in meta/,
  "missing-field": /missing field "title"/,
  "wrong-events": /step "look": a check step answers YES or NO, not DONE/,
  "missing-target": /step "fix": answer DONE points at "nowhere", which is not a step/,
  "unreachable-step": /step "orphan": cannot be reached from the first step/,
  "no-end-reachable": /step "loop-a": no fixed or handoff end can be reached from here/,
  "unguarded-hands-on": /step "fix": is hands-on but can be reached without passing a safety step/,
  "unknown-cause": /step "done": cause "gremlins" is not in the cause list/,
  "duplicate-step-id": /step "fix": step id "fix" is used twice/,
  "no-fixed-end": /no-fixed-end: the guide has no fixed end/,
  "final-without-type": /step "gone": a handoff step is an end: give it "type": "final"/,
  "fixed-without-component": /step "done": a fixed step needs a component/,
  "missing-initial": /initial step "start-here" is not one of the steps/,
  "hands-on-safety": /step "stop": a safety step is the shut-down stop itself/,
  "bad-kind": /step "look": meta\.kind: Invalid option/,
  "end-with-answers": /step "gone": a handoff step is an end and takes no answers/,
  "cause-on-check": /step "look": only fixed and hand-off steps carry a cause/,
  // The safety model (domain.md, "Safety"): a restart ends the shut-down; a stop covers what the step exposes.
  "restart-then-hands-on": /step "fix": is hands-on but step "run" puts energy back and no safety step comes after it/,
  "wet-side-uncovered": /step "fix": opens the wet side .* does not cover: suction valve closed, or the tank run down/,
  "checklist-missing-core": /step "stop": a safety step's checklist must include "clutch-out", "engine-off-key-out", "moving-parts-stopped"/,
  "inside-tank": /step "fix": sends someone inside the tank/,
  // A box left unticked does not hide a restart the prompt spells out.
  "restart-unmarked": /step "run": says it restarts or runs the rig, so tick “puts energy back”/,
  "energizes-hands-on": /step "fix": puts energy back and is hands-on/,
  "checklist-on-check": /step "look": only a safety step carries a checklist/,
  "hazards-not-hands-on": /step "look": only a hands-on step names hazards/,
};

describe("validator", () => {
  it("accepts the tiny fixture guide", () => {
    expect(validateGuide(fs.readFileSync(fixture("guides", "tiny.json"), "utf8"), { causes }).problems).toEqual([]);
  });

  it.each(Object.entries(EXPECTED))("rejects %s with the step named", (name, message) => {
    const text = fs.readFileSync(fixture("broken-guides", `${name}.json`), "utf8");
    const result = validateGuide(text, { causes, name });
    expect(result.guide).toBeNull();
    expect(result.problems.map(describeProblem).join("\n")).toMatch(message);
  });

  it("has a fixture for every expected message and nothing else", () => {
    const files = fs.readdirSync(fixture("broken-guides")).map((f) => f.replace(/\.json$/, ""));
    expect(files.sort()).toEqual(Object.keys(EXPECTED).sort());
  });

  it("accepts a restart when a new stop covering the wet side comes before the hands-on step, and warns when nothing is put back first", () => {
    const g = JSON.parse(fs.readFileSync(fixture("broken-guides", "restart-then-hands-on.json"), "utf8"));
    g.id = "restart-with-new-stop";
    g.states.run.on.NO = "stop-again";
    g.states["stop-again"] = {
      on: { ACK: "fix" },
      meta: {
        kind: "safety",
        prompt: "Shut down again.",
        checklist: ["clutch-out", "engine-off-key-out", "moving-parts-stopped", "pressure-relieved", "controls-tagged", "suction-closed"],
      },
    };
    g.states.fix.meta.hazards = ["wet-side"];
    const ok = validateGuide(g, { causes });
    expect(ok.problems).toEqual([]);
    // fix → run again without refitting: the restart is flagged, not refused.
    g.states.fix.on.DONE = "run";
    const warned = validateGuide(g, { causes });
    expect(warned.problems).toEqual([]);
    expect(warned.warnings.map(describeProblem).join("\n")).toMatch(/step "run": puts energy back after hands-on work with no return-to-service step/);
    // A return-to-service step between them clears the warning.
    g.states.fix.on.DONE = "refit";
    g.states.refit = {
      on: { DONE: "run", CANT: "gone" },
      meta: { kind: "task", prompt: "Refit the cover and guards; everyone clear of the stream.", returnsToService: true },
    };
    expect(validateGuide(g, { causes }).warnings).toEqual([]);
  });

  it("holds a stop only while nothing restarts: one path with a restart is enough to refuse", () => {
    const g = JSON.parse(fs.readFileSync(fixture("broken-guides", "restart-then-hands-on.json"), "utf8"));
    // Two ways into fix: straight from the stop (guarded) and through the test run (not).
    g.states.look.on.NO = "stop";
    g.states.stop.on.ACK = "run";
    g.states.run.on.YES = "fix";
    g.states.run.on.NO = "fix";
    expect(validateGuide(g, { causes }).problems.map((p) => p.step)).toContain("fix");
    // The same step as a look, with nothing restarted: the stop holds on both paths.
    delete g.states.run.meta.energizes;
    g.states.run.meta.prompt = "Look at the stream marks on the ground. Was it strong?";
    expect(validateGuide(g, { causes }).problems).toEqual([]);
  });

  it("reports every problem at once", () => {
    const g = tinyGuide() as unknown as { states: Record<string, { meta: Record<string, unknown>; on?: Record<string, string> }> };
    g.states.look.on!.YES = "fix";
    g.states.done.meta.cause = "gremlins";
    g.states.look.meta.colour = "red";
    const messages = validateGuide(g, { causes }).problems.map((p) => p.message);
    expect(messages).toEqual(expect.arrayContaining([expect.stringMatching(/hands-on/), expect.stringMatching(/gremlins/), expect.stringMatching(/colour/)]));
  });

  it.each([null, 42, "", "[]", "{", [], { states: 5 }, { states: { a: null } }, { id: "x", states: { a: { meta: { kind: "check" }, on: 7 } } }])(
    "never throws on %j",
    (input) => {
      const result = validateGuide(input, { causes });
      expect(result.guide).toBeNull();
      expect(result.problems.length).toBeGreaterThan(0);
    },
  );
});

describe("compiler and path analysis", () => {
  it("builds a machine that answers by kind", () => {
    const machine = compileGuide(tinyGuide());
    let [s] = initialTransition(machine);
    expect(s.value).toBe("look");
    [s] = transition(machine, s, { type: "DONE" }); // not an answer to a check: stays
    expect(s.value).toBe("look");
    [s] = transition(machine, s, { type: "YES" });
    expect(s.value).toBe("stop");
    [s] = transition(machine, s, { type: "ACK" });
    [s] = transition(machine, s, { type: "DONE" });
    expect(s.value).toBe("done");
    expect(s.status).toBe("done");
  });

  it("counts the fewest answers left to an end", () => {
    expect(stepsToEnd(tinyGuide())).toEqual({ look: 1, stop: 2, fix: 1, done: 0, gone: 0 });
  });

  it("lists every simple path with its answers", () => {
    const paths = simplePaths(tinyGuide()).map((p) => p.answers.join(" "));
    expect(paths.sort()).toEqual(["NO", "YES ACK CANT", "YES ACK DONE"]);
  });
});
