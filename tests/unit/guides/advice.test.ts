import { describe, expect, it } from "vitest";
import { checkGuideFiles, guideFilesIn, loadLibrary } from "~/lib/guides/files.server";
import { fillRigWords } from "~/lib/guides/rig-words";
import { isolationOnArrival } from "~/lib/guides/safety";
import { edges } from "~/lib/guides/graph";
import type { Guide } from "~/lib/guides/schema";
import { causes, root } from "../../helpers/guides";

// The second edition's corrected advice, step by step (domain.md, "Fault families" and "Safety").
// Each check names the guide and step and what it must say or do; the checker covers the safety model on every path.
// The fault guides; the rig cards have their own tests (cards.test.ts).
const library = new Map(
  loadLibrary(root)
    .filter((g) => g.kind !== "card")
    .map((g) => [g.id, g]),
);
const guide = (id: string): Guide => library.get(id) ?? expect.fail(`guide ${id} is missing`);
const step = (g: string, s: string) => guide(g).states[s] ?? expect.fail(`${g} › ${s} is missing`);
const text = (g: string, s: string) => `${step(g, s).meta.prompt} ${step(g, s).meta.help ?? ""}`;
const next = (g: string, s: string, answer: string) => step(g, s).on?.[answer as "YES"];
/** What is isolated when the crew reaches a step, on every path (the checker's own analysis). */
const inForce = (g: string, s: string) => [...(isolationOnArrival(guide(g)).get(s) ?? [])];

describe("the library, second edition", () => {
  it("has eleven guides or more, each with at least six crew phrases", () => {
    expect(library.size).toBeGreaterThanOrEqual(11);
    for (const g of library.values()) expect(g.symptoms.length, g.id).toBeGreaterThanOrEqual(6);
    for (const id of ["valve-trouble", "excessive-wear", "pump-not-turning", "hydraulic-drive"]) expect(library.has(id), id).toBe(true);
  });

  it("marks every restart: a check or task that says restart, run or engage puts energy back", () => {
    for (const g of library.values()) {
      for (const [id, s] of Object.entries(g.states)) {
        if (/^(Restart|Run it|Run the|Refill and run|Engage the pump|Start the engine|Fill with water past)/.test(s.meta.prompt))
          expect(s.meta.energizes, `${g.id} › ${id}`).toBe(true);
      }
    }
  });

  it("puts a return-to-service step before every restart that follows hands-on work (no warnings)", () => {
    const results = checkGuideFiles(guideFilesIn(`${root}/content/guides`), causes);
    expect(results.flatMap((r) => r.warnings)).toEqual([]);
  });

  it("asks one question per prompt, in US spelling", () => {
    for (const g of library.values()) {
      for (const [id, s] of Object.entries(g.states)) {
        expect((s.meta.prompt.match(/\?/g) ?? []).length, `${g.id} › ${id}`).toBeLessThanOrEqual(1);
        expect(`${s.meta.prompt} ${s.meta.help ?? ""}`, `${g.id} › ${id}`).not.toMatch(/\b(centre|colour|vapour|programme|metre|litre)\b/i);
      }
    }
  });
});

describe("corrected advice, by guide and step", () => {
  it("short-throw › shorten-hose: taking hose sections off sits behind a stop that lets the hose pressure off", () => {
    expect(step("short-throw", "shorten-hose").meta.handsOn).toBe(true);
    expect(inForce("short-throw", "shorten-hose")).toContain("pressure-relieved");
  });

  it("short-throw: checks a suction air leak, a part-plugged suction and foam", () => {
    expect(text("short-throw", "air-bubbles")).toMatch(/bubbles in the recirculation return/);
    expect(text("short-throw", "watery")).toMatch(/pale.*watery/);
    expect(text("short-throw", "foam")).toMatch(/froth/);
    expect(inForce("short-throw", "fix-air-leak")).toContain("suction-closed");
  });

  it("lost-prime › cut-lift and backflush-suction: changing the suction hose or moving the rig is behind a stop with the suction valve closed", () => {
    for (const s of ["cut-lift", "backflush-suction", "fix-air-leak"])
      expect(inForce("lost-prime", s), s).toEqual(expect.arrayContaining(["clutch-out", "suction-closed"]));
    expect(text("lost-prime", "cut-lift")).toMatch(/clutch out/);
  });

  it("plugging › stop-nozzle: vents trapped hose pressure before a plugged tip is opened", () => {
    expect(text("plugging", "stop-nozzle")).toMatch(/crack the remote valve/);
    expect(step("plugging", "clear-nozzle").meta.hazards).toContain("trapped-pressure");
  });

  it("plugging: a pressure drop opens the pump before the take-off", () => {
    expect(next("plugging", "stream-watery", "NO")).toBe("stop-pump");
    expect(next("plugging", "stop-pump", "ACK")).toBe("open-pump");
    expect(next("plugging", "open-pump", "NO")).toBe("look-takeoff");
  });

  it("plugging: the pump is opened and checked before it is called air-bound, and air-bound gets the foam remedies; a vent only where the rig has one", () => {
    expect(next("plugging", "look-takeoff", "NO")).toBe("rts-air-bound");
    expect(text("plugging", "foam-remedy")).toMatch(/agitator at half speed or less/);
    expect(text("plugging", "antifoam")).toMatch(/antifoam/);
    expect(text("plugging", "antifoam")).toMatch(/recirculation short/);
    expect(next("plugging", "has-vent", "NO")).toBe("handoff-plug");
    expect(next("plugging", "has-vent", "YES")).toBe("stop-vent");
    expect(text("foaming", "open-pump")).toMatch(/before you call the pump air-bound/);
  });

  it("plugging › clear-sump says how to back-flush; refit-drain puts the drain plug back; the suction line is checked too", () => {
    expect(text("plugging", "clear-sump")).toMatch(/push clean water back through it/);
    expect(text("plugging", "refit-drain")).toMatch(/drain plug/);
    expect(step("plugging", "refit-drain").meta.returnsToService).toBe(true);
    expect(next("plugging", "restart-sump", "NO")).toBe("stop-suction-line");
  });

  it("plugging: records whether the plug was fiber or a foreign object", () => {
    for (const s of ["object-pump", "object-takeoff", "object-sump"]) {
      expect(text("plugging", s)).toMatch(/foreign object/);
      expect(step("plugging", next("plugging", s, "YES")!).meta.cause).toBe("foreign-object");
    }
  });

  it("leaks › service-lube and replace-seal: the pump-shaft leak clears out wrong grease and replaces the seal", () => {
    expect(text("leaks", "service-lube")).toMatch(/Clean out the old grease/);
    expect(text("leaks", "service-lube")).toMatch(/wrong grease/);
    expect(text("leaks", "seal-kit")).toMatch(/servicing the lubricator alone will not stop this leak/);
    expect(step("leaks", "fixed-pump-shaft").meta.cause).toBe("leak-pump-shaft-seal");
    expect(step("leaks", "handoff-seal").meta.cause).toBe("leak-pump-shaft-seal");
  });

  it("leaks › service-lube: an end never says the lubricator was serviced when the crew could not do it", () => {
    const afterCant = next("leaks", "service-lube", "CANT")!;
    expect(text("leaks", afterCant)).toMatch(/could not be serviced/);
    // The seal hand-off is reached with or without servicing, so it claims neither.
    expect(text("leaks", "handoff-seal")).not.toMatch(/is serviced|was serviced/);
    expect(step("leaks", afterCant).meta.cause).toBe("leak-pump-shaft-seal");
    // A lubricator left unserviced means the pump must not run: no flushing from the controls.
    expect(text("leaks", afterCant)).toMatch(/do not run the pump/);
    expect(text("leaks", afterCant)).not.toMatch(/flush the tank and pump/);
    // The fixed end is reached with the right grease already in (no servicing), so it does not claim any.
    expect(text("leaks", "fixed-pump-shaft")).not.toMatch(/lubricator serviced/);
  });

  it("leaks: the cover O-ring is the pump's, and suction-piping work starts with the suction valve closed", () => {
    expect(step("leaks", "fixed-cover").meta.component).toBe("pump");
    expect(step("leaks", "stop-suction").meta.checklist).toContain("suction-closed");
    expect(step("leaks", "fix-suction").meta.hazards).toContain("wet-side");
  });

  it("leaks › fix-bearing: a bearing with new gaskets takes about an hour", () => {
    expect(step("leaks", "fix-bearing").meta.minutes).toBeGreaterThanOrEqual(60);
  });

  it("agitator-stall › reverse-briefly names this rig's directions", () => {
    const prompt = step("agitator-stall", "reverse-briefly").meta.prompt;
    expect(fillRigWords(prompt, { agitatorMixes: "forward" })).toBe("Switch the agitator to reverse for a few seconds, then back to forward.");
    expect(fillRigWords(prompt, { agitatorMixes: "reverse" })).toBe("Switch the agitator to forward for a few seconds, then back to reverse.");
    expect(next("agitator-stall", "turning", "NO")).toBe("neutral-stop");
    expect(text("agitator-stall", "neutral-stop")).toMatch(/neutral/);
  });

  it("agitator-stall › dislodge: no heat or flame on frozen material, worked from outside", () => {
    expect(text("agitator-stall", "dislodge")).toMatch(/No heat or flame on frozen material/);
    expect(text("agitator-stall", "dislodge")).toMatch(/from outside the tank/);
  });

  it("hydraulic-drive › leak-visible: never feel for a hydraulic leak by hand", () => {
    expect(step("hydraulic-drive", "leak-visible").meta.handsOn).toBeUndefined();
    expect(text("hydraulic-drive", "leak-visible")).toMatch(/Never feel for a hydraulic leak with your hand/);
  });

  it("slurry-too-thick › held-long: the trigger is time since loading and how the slurry behaves, not seed life", () => {
    expect(text("slurry-too-thick", "held-long")).toMatch(/since loading finished/);
    expect(text("slurry-too-thick", "piles-up")).toMatch(/peaks/);
    for (const s of Object.values(guide("slurry-too-thick").states)) expect(`${s.meta.prompt} ${s.meta.help ?? ""}`).not.toMatch(/seed/i);
  });

  it("vibration › spray-out: does not dump a load just to look, and a bent paddle goes to the shop", () => {
    expect(text("vibration", "spray-out")).toMatch(/Do not dump a load just to look/);
    expect(next("vibration", "look-paddles", "YES")).toBe("handoff-paddle");
    expect(step("vibration", "handoff-paddle").meta.cause).toBe("bent-paddle");
  });

  it("valve-trouble: product in before the center line means drain and clean, from outside", () => {
    expect(text("valve-trouble", "loaded-early")).toMatch(/center line/);
    expect(text("valve-trouble", "drain-clean")).toMatch(/Never climb in/);
    expect(step("valve-trouble", "fixed-loaded-early").meta.cause).toBe("loaded-before-centre-line");
  });

  it("excessive-wear ends in a hand-off that records the wear", () => {
    const handoffs = Object.values(guide("excessive-wear").states).filter((s) => s.meta.kind === "handoff");
    expect(handoffs.length).toBeGreaterThan(0);
    for (const h of handoffs) expect(h.meta.cause).toBeTruthy();
  });

  it("pump-not-turning checks switch, fuse, connector, air gap and belt, in that order", () => {
    const order = ["switch-on", "check-fuse", "check-connector", "check-air-gap", "check-belt"];
    const g = guide("pump-not-turning");
    const out = edges(g);
    for (const id of order) expect(g.states[id], id).toBeTruthy();
    expect(out.get("check-fuse")).toContain("check-connector");
    expect(out.get("check-connector")).toContain("check-air-gap");
    expect(out.get("check-air-gap")).toContain("check-belt");
  });

  it("every hand-off with a likely shop cause carries it as suspected", () => {
    expect(step("short-throw", "handoff-pump").meta.cause).toBe("pump-worn");
    expect(step("vibration", "handoff-shaft").meta.cause).toBe("bent-agitator-shaft");
    expect(step("pump-not-turning", "handoff-clutch").meta.cause).toBe("clutch-not-engaging");
  });
});

describe("the cause list", () => {
  it("has no cause that no step uses", () => {
    const used = new Set([...library.values()].flatMap((g) => Object.values(g.states).flatMap((s) => (s.meta.cause ? [s.meta.cause] : []))));
    expect(causes.filter((c) => !used.has(c.code)).map((c) => c.code)).toEqual([]);
  });

  it("files ISO 14224 modes as the domain notes say: valves fail to open or close, foam and air-binding give erratic output, low oil gives low output", () => {
    const mode = (code: string) => causes.find((c) => c.code === code)?.iso14224;
    expect(mode("valve-stuck")).toBe("FTO");
    expect(mode("valve-foreign-object")).toBe("FTC");
    expect(mode("air-bound-pump")).toBe("ERO");
    expect(mode("foam-over-agitation")).toBe("ERO");
    expect(mode("hydraulic-oil-low")).toBe("LOO");
    expect(causes.find((c) => c.code === "leak-cover-oring")?.component).toBe("pump");
    // Every mapping says where it comes from.
    for (const c of causes) if (c.iso14224) expect(c.isoNote, c.code).toMatch(/from memory/);
  });
});
