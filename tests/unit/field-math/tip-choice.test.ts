import { describe, expect, it } from "vitest";
import { tipChoice } from "~/lib/field-math/tip-choice";

// Rig tips, invented for the test: rated reach and pattern width in feet.
const tips = [
  { name: "Wide fan", reachFt: 40, widthFt: 30 },
  { name: "Narrow fan", reachFt: 70, widthFt: 12 },
  { name: "Long range", reachFt: 110, widthFt: 6 },
];
// Worked by hand: the tip passes 200 gpm at 100 psi with no hose, so Q = 20·√NP. Through 100 ft of 2½ in hose
// (FL = C·Q²·L, C = 2, Rohnert Park fire training 3-8): 100 = NP + 2·(0.2·√NP)²·1 → NP = 100 / 1.08 = 92.593 psi,
// a loss of 7.407 psi; at ½ ft of reach per psi (slope of S = NP/2 + 26, Fire Engineering 1960) 3.704 ft.
const run = { hoseLengthFt: 100, diameterIn: 2.5, pumpPsi: 100, flowGpm: 200 };

describe("tip chooser", () => {
  it("takes the hose friction off the rated reach", () => {
    const r = tipChoice({ tips, distanceFt: 60, widthFt: 120, ...run });
    expect(r.nozzlePsi).toBeCloseTo(100 / 1.08, 6);
    expect(r.frictionPsi).toBeCloseTo(100 - 100 / 1.08, 6);
    expect(r.flowGpm).toBeCloseTo(20 * Math.sqrt(100 / 1.08), 6);
    expect(r.reachLossFt).toBeCloseTo((100 - 100 / 1.08) / 2, 6);
    expect(r.options.find((o) => o.name === "Narrow fan")!.reachFt).toBeCloseTo(66.296, 3);
  });

  it("60 ft deep, 120 ft long: the narrow fan reaches in one pass with fewer sweeps than the long-range tip", () => {
    const r = tipChoice({ tips, distanceFt: 60, widthFt: 120, ...run });
    expect(r.best!.name).toBe("Narrow fan");
    expect(r.best!).toMatchObject({ passes: 1, sweeps: 10, reaches: true });
    expect(r.options.map((o) => [o.name, o.passes])).toEqual([
      ["Narrow fan", 1],
      ["Long range", 1],
      ["Wide fan", 2],
    ]);
  });

  it("30 ft deep: the wide fan reaches and covers fastest", () => {
    expect(tipChoice({ tips, distanceFt: 30, widthFt: 120, ...run }).best).toMatchObject({ name: "Wide fan", passes: 1, sweeps: 4 });
  });

  it("250 ft deep: no tip reaches, the long-range tip takes 3 passes stepped in by its reach", () => {
    const best = tipChoice({ tips, distanceFt: 250, widthFt: 120, ...run }).best!;
    expect(best).toMatchObject({ name: "Long range", passes: 3, reaches: false });
    expect(best.from).toEqual(["From the near edge, out to 106 ft.", "From a line 106 ft in, out to 213 ft.", "From a line 213 ft in, out to 250 ft."]);
  });

  it("two passes: one from each edge", () => {
    const best = tipChoice({ tips: [tips[0]], distanceFt: 70, widthFt: 50, hoseLengthFt: 0, diameterIn: 2.5, pumpPsi: 100, flowGpm: 200 }).best!;
    expect(best.passes).toBe(2);
    expect(best.from[1]).toMatch(/far edge/);
  });

  it("spraying uphill costs 0.434 psi a foot of rise (NDSU AE1057) on top of the hose", () => {
    // 100 − 8.68 = 91.32 psi left for hose and nozzle: NP = 91.32 / 1.08 = 84.556 psi.
    const r = tipChoice({ tips, distanceFt: 60, widthFt: 120, ...run, riseFt: 20 });
    expect(r.risePsi).toBeCloseTo(8.68, 10);
    expect(r.nozzlePsi).toBeCloseTo(91.32 / 1.08, 6);
    expect(r.reachLossFt).toBeCloseTo((100 - 91.32 / 1.08) / 2, 6);
  });

  it("a long thin hose throttles the flow; under 30 psi at the nozzle no tip is counted on to reach", () => {
    // 250 gpm at 100 psi (k = 25) through 300 ft of 1½ in (C = 24): NP = 100 / (1 + 24·0.0625·3) = 100 / 5.5 = 18 psi.
    const r = tipChoice({ tips, distanceFt: 40, widthFt: 100, hoseLengthFt: 300, diameterIn: 1.5, pumpPsi: 100, flowGpm: 250 });
    expect(r.nozzlePsi).toBeCloseTo(100 / 5.5, 6);
    expect(r.tooLittlePressure).toBe(true);
    expect(r.best).toBeNull();
    // 100 ft of it: NP = 100 / 2.5 = 40 psi, above 30: 30 ft off each tip.
    const shorter = tipChoice({ tips, distanceFt: 40, widthFt: 100, hoseLengthFt: 100, diameterIn: 1.5, pumpPsi: 100, flowGpm: 250 });
    expect(shorter.options.find((o) => o.name === "Long range")!.reachFt).toBeCloseTo(80, 6);
  });

  it("more than four passes is no plan, and a tip throwing far past the edge is aimed short", () => {
    const r = tipChoice({ tips, distanceFt: 250, widthFt: 120, ...run });
    expect(r.options.find((o) => o.name === "Wide fan")).toMatchObject({ workable: false, passes: Infinity });
    const near = tipChoice({ tips: [tips[2]], distanceFt: 40, widthFt: 120, ...run }).best!;
    expect(near.from[0]).toMatch(/aiming short: it throws about 106 ft/);
  });

  it("a rig without tips gets a message naming what to record", () => {
    expect(() => tipChoice({ tips: [], distanceFt: 60, widthFt: 120, ...run })).toThrow(/no tips are recorded for this rig/);
  });
});
