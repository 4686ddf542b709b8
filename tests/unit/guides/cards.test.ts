import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { checkGuideFiles, libraryFiles, loadLibrary } from "~/lib/guides/files.server";
import { simplePaths, stepsToEnd } from "~/lib/guides/graph";
import { DAY_CHECKS, SERVICE_TASKS, type DayCheck } from "~/lib/guides/kinds";
import { describeProblem, validateGuide } from "~/lib/guides/validate";
import { ANSWERS_BY_KIND } from "~/lib/vocabulary";
import { causes, fixture, root } from "../../helpers/guides";

const all = loadLibrary(root);
const cards = all.filter((g) => g.kind === "card");
const guideIds = all.filter((g) => g.kind !== "card").map((g) => g.id);

// One fixture per card rule, with the message it must produce (and the step it must name).
const EXPECTED: Record<string, RegExp> = {
  "card-with-cause": /step "done": a rig card's steps carry no cause/,
  "card-no-complete-end": /card-no-complete-end: the card has no complete \(fixed\) end/,
  "opens-guide-on-check": /step "valves": only a rig card's task opens a guide/,
  "opens-unknown-guide": /step "valve-guide": opens guide "no-such-guide", which is not a guide in the library/,
  "day-check-on-safety": /step "stop": a card's day fact sits on a check or a task/,
  "card-unguarded-hands-on": /step "grease": is hands-on but can be reached without passing a safety step/,
  "service-on-guide": /only a rig card's check or task records a service/,
  "guide-day-check-on-task": /a guide asks about today's card only on a check step/,
};

describe("rig card files", () => {
  it("accepts the tiny fixture card", () => {
    const result = validateGuide(fs.readFileSync(fixture("guides", "tiny-card.json"), "utf8"), { causes, guideIds });
    expect(result.problems).toEqual([]);
    expect(result.guide?.kind).toBe("card");
  });

  it.each(Object.entries(EXPECTED))("rejects %s with the step named", (name, message) => {
    const text = fs.readFileSync(fixture("broken-cards", `${name}.json`), "utf8");
    const result = validateGuide(text, { causes, name, guideIds });
    expect(result.guide).toBeNull();
    expect(result.problems.map(describeProblem).join("\n")).toMatch(message);
  });

  it("has a fixture for every expected message and nothing else", () => {
    const files = fs.readdirSync(fixture("broken-cards")).map((f) => f.replace(/\.json$/, ""));
    expect(files.sort()).toEqual(Object.keys(EXPECTED).sort());
  });

  it("keeps cards in content/cards and guides out of it", () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "cards-"));
    fs.mkdirSync(path.join(dir, "guides"));
    fs.copyFileSync(fixture("guides", "tiny-card.json"), path.join(dir, "guides", "tiny-card.json"));
    const [result] = checkGuideFiles([path.join(dir, "guides", "tiny-card.json")], causes);
    expect(result.problems.map((p) => p.message)).toContain('a rig card ("kind": "card") belongs in content/cards');
  });
});

describe("the shipped rig cards", () => {
  it("are all valid and ship the day's six cards", () => {
    expect(checkGuideFiles(libraryFiles(root), causes).flatMap((r) => r.problems)).toEqual([]);
    expect(cards.map((c) => c.id).sort()).toEqual(["end-of-season", "flush-and-purge", "loading", "pre-start", "shut-down-clean-out", "weekly-service"]);
  });

  it.each(cards.map((c) => [c.id, c] as const))("%s: minutes on every item, a complete end, every path ends", (_id, card) => {
    for (const [id, step] of Object.entries(card.states)) {
      if (ANSWERS_BY_KIND[step.meta.kind].length) expect(step.meta.minutes, `${id} has minutes`).toBeGreaterThan(0);
    }
    expect(Object.values(card.states).some((s) => s.meta.kind === "fixed")).toBe(true);
    const left = stepsToEnd(card);
    for (const id of Object.keys(card.states)) expect(left[id], id).toBeLessThan(Infinity);
    for (const p of simplePaths(card, 10_000)) expect(["fixed", "handoff"]).toContain(card.states[p.steps.at(-1)!].meta.kind);
  });

  it("pre-start checks the domain's list, in order, behind one stop, in a couple of minutes of taps", () => {
    const pre = cards.find((c) => c.id === "pre-start")!;
    // The straight path (every item fine) is the usual morning: count its taps.
    const straight = simplePaths(pre, 10_000).find(
      (p) => p.answers.every((a) => a === "YES" || a === "DONE" || a === "ACK") && pre.states[p.steps.at(-1)!].meta.kind === "fixed",
    )!;
    const facts = straight.steps.flatMap((s) => (pre.states[s].meta.dayCheck ? [pre.states[s].meta.dayCheck as DayCheck] : []));
    expect(facts).toEqual(["drain-plug-in", "suction-open", "grease-done", "lubricator-charged", "hoses-clear", "valves-free"]);
    expect(straight.answers.length).toBeLessThanOrEqual(10);
    expect(pre.states[straight.steps[0]].meta.kind).toBe("safety");
    expect(pre.states.positions.meta.prompt).toMatch(/recirculation open, discharge closed, pump clutch out, agitator in neutral, throttle low/);
    for (const f of facts) expect(DAY_CHECKS[f]).toBeTruthy();
  });

  it("opens the right guide from a card item, and records services by known tasks", () => {
    const opens = cards.flatMap((c) => Object.entries(c.states).flatMap(([id, s]) => (s.meta.opensGuide ? [`${c.id}.${id}→${s.meta.opensGuide}`] : [])));
    expect(opens).toEqual(
      expect.arrayContaining(["pre-start.valve-guide→valve-trouble", "flush-and-purge.prime-guide→lost-prime", "weekly-service.leaks-guide→leaks"]),
    );
    for (const c of cards) for (const s of Object.values(c.states)) if (s.meta.service) expect(SERVICE_TASKS[s.meta.service]).toBeTruthy();
  });

  it("loading opens the load card and holds the fiber until the tank is half full", () => {
    const loading = cards.find((c) => c.id === "loading")!;
    expect(Object.values(loading.states).some((s) => s.meta.fieldMath === "load-sheet")).toBe(true);
    expect(loading.states["fiber-half"].on?.NO).toBe("wait-half");
  });

  it("guides ask again what the pre-start answered: lubricator, suction valve, valves", () => {
    const asks = all
      .filter((g) => g.kind !== "card")
      .flatMap((g) => Object.entries(g.states).flatMap(([id, s]) => (s.meta.dayCheck ? [`${g.id}.${id}:${s.meta.dayCheck}`] : [])));
    expect(asks.sort()).toEqual(["leaks.lube-today:lubricator-charged", "lost-prime.suction-valve:suction-open", "valve-trouble.handle-moves:valves-free"]);
  });

  it("no guide points at a pre-start check that does not exist", () => {
    for (const g of all) for (const s of Object.values(g.states)) expect(s.meta.prompt).not.toMatch(/add it to your pre-start/i);
  });
});
