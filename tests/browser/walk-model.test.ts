import { describe, expect, it } from "vitest";
import { getSimplePaths } from "xstate/graph";
import { compileGuide } from "~/lib/guides/compile";
import { loadLibrary } from "~/lib/guides/files.server";
import { ANSWER_LABELS, STEP_ANSWERS, type StepAnswer } from "~/lib/vocabulary";
import { appAndBrowserForFile, signIn, startCaseFromPage } from "../helpers/app";
import { root } from "../helpers/guides";

const harness = appAndBrowserForFile();
const guide = loadLibrary(root).find((g) => g.id === "vibration")!;
const machine = compileGuide(guide);

// Every simple path to an end, as XState's own graph tools find them on the compiled machine.
const ends = getSimplePaths(machine, { events: STEP_ANSWERS.map((type) => ({ type })) }).filter(
  (p) => guide.states[String(p.state.value)].meta.kind === "fixed" || guide.states[String(p.state.value)].meta.kind === "handoff",
);

describe("the walk screen follows the guide's machine on every path (vibration)", () => {
  it("finds paths to every end", () => {
    const reached = new Set(ends.map((p) => String(p.state.value)));
    const finals = Object.entries(guide.states).filter(([, s]) => s.meta.kind === "fixed" || s.meta.kind === "handoff");
    expect([...reached].sort()).toEqual(finals.map(([id]) => id).sort());
  });

  it.each(
    ends.map(
      (p) =>
        [
          p.steps
            .map((s) => s.event.type)
            .filter((t) => t !== "xstate.init")
            .join(" → "),
          p,
        ] as const,
    ),
  )("%s", async (_name, path) => {
    await harness.browser.context.clearCookies();
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    const id = await startCaseFromPage(p, "CF-03", "vibration");
    await p.goto(`${harness.app.url}/cases/${id}/walk`);
    for (const step of path.steps) {
      if (step.event.type === "xstate.init") continue;
      await p.locator("#step-prompt").waitFor();
      await p.getByRole("button", { name: ANSWER_LABELS[step.event.type as StepAnswer], exact: true }).click();
    }
    const end = guide.states[String(path.state.value)].meta;
    await p.getByRole("heading", { name: end.kind === "fixed" ? "Fixed" : "Handed off" }).waitFor();
    expect(await p.locator("section[aria-labelledby='end-title']").innerText()).toContain(end.prompt.replace(/\*\*/g, "").slice(0, 30));
    await p.close();
  });
});
