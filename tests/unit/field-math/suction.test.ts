import { describe, expect, it } from "vitest";
import { atmosphereKpa, kpaToFtHead, npshAvailableFt, suctionCheck, vapourPressureKpa } from "~/lib/field-math/suction";
import { cToF, kpaToPsi, mToFt } from "~/lib/field-math/units";
import { FieldMathInputError } from "~/lib/field-math/validate";

describe("atmosphere (U.S. Standard Atmosphere 1976)", () => {
  it.each([
    // Table adapted from COESA 1976 in Davis, Water and Wastewater Engineering (references.md):
    [0, 101.3],
    [500, 95.46],
    [1000, 89.88],
    [1500, 84.56],
    [2000, 79.5],
    [2500, 74.69],
    [3000, 70.12],
  ])("%i m → %s kPa", (m, kpa) => {
    expect(atmosphereKpa(mToFt(m))).toBeCloseTo(kpa, kpa === 101.3 ? 1 : 1);
  });

  it("5,000 ft → 12.230 psia and 10,000 ft → 10.108 psia (references.md)", () => {
    expect(kpaToPsi(atmosphereKpa(5000))).toBeCloseTo(12.23, 2);
    expect(kpaToPsi(atmosphereKpa(10_000))).toBeCloseTo(10.108, 2);
  });

  it("never gives more NPSH higher up (property)", () => {
    let last = Infinity;
    for (let ft = 0; ft <= 14_000; ft += 250) {
      const n = suctionCheck({ altitudeFt: ft, waterTempF: 60, liftFt: 10, suctionLossFt: 2, npshRequiredFt: 10 }).npshAvailableFt;
      expect(n).toBeLessThan(last);
      last = n;
    }
  });
});

describe("vapour pressure of water (Antoine; CRC Handbook values as the oracle)", () => {
  it.each([
    [10, 1.2281],
    [15, 1.7056],
    [20, 2.3388],
    [25, 3.169],
    [30, 4.2455],
    [35, 5.6267],
    [40, 7.3814],
  ])("%i °C → %s kPa within 1 %", (c, kpa) => {
    // The Antoine fit is good to about 1 % over 1–100 °C; that is ample for an NPSH check.
    expect(Math.abs(vapourPressureKpa(cToF(c)) - kpa) / kpa).toBeLessThan(0.01);
  });

  it.each([
    // Pump text table in °F (references.md):
    [40, 0.1217],
    [50, 0.1781],
    [60, 0.2563],
    [80, 0.5069],
    [90, 0.6982],
    [100, 0.9492],
  ])("%i °F → %s psia within 1 %", (f, psia) => {
    expect(Math.abs(kpaToPsi(vapourPressureKpa(f)) - psia) / psia).toBeLessThan(0.01);
  });
});

describe("NPSH available", () => {
  it("water-treatment handbook example: 20 ft lift → 11 ft; 15 ft flooded → 46 ft", () => {
    // 60 °F, 34 ft atmosphere, 0.6 ft vapour, 0.4 ft entrance loss, 2 ft friction (references.md)
    expect(npshAvailableFt({ atmosphereFt: 34, vapourFt: 0.6, liftFt: 20, lossesFt: 0.4 + 2 })).toBeCloseTo(11, 10);
    expect(npshAvailableFt({ atmosphereFt: 34, vapourFt: 0.6, liftFt: -15, lossesFt: 0.4 + 2 })).toBeCloseTo(46, 10);
  });

  it("centrifugal pump text example at 7,000 ft: 14.789 ft", () => {
    // Ha 26.2, lift 8, Hvp 0.411 (50 °F), Hf 1, Hi 2 (references.md)
    expect(npshAvailableFt({ atmosphereFt: 26.2, vapourFt: 0.411, liftFt: 8, lossesFt: 1 + 2 })).toBeCloseTo(14.789, 10);
    // Our atmosphere agrees with the example's 26.2 ft at 7,000 ft to within 0.3 ft.
    expect(kpaToFtHead(atmosphereKpa(7000))).toBeCloseTo(26.2, 0);
  });

  it("gives a plain verdict with what to change", () => {
    const sea = suctionCheck({ altitudeFt: 0, waterTempF: 60, liftFt: 5, suctionLossFt: 2, npshRequiredFt: 12 });
    expect(sea.verdict).toBe("enough");
    expect(sea.advice).toEqual([]);
    const high = suctionCheck({ altitudeFt: 6100, waterTempF: 85, liftFt: 15, suctionLossFt: 4, npshRequiredFt: 8 });
    expect(high.verdict).toBe("will cavitate or lose prime");
    expect(high.advice.join(" ")).toMatch(/Shorten the lift/);
    expect(high.advice.join(" ")).toMatch(/cooler water/);
    const edge = suctionCheck({ altitudeFt: 0, waterTempF: 60, liftFt: 10, suctionLossFt: 2, npshRequiredFt: 20 });
    expect(edge.npshAvailableFt).toBeGreaterThan(20);
    expect(edge.verdict).toBe("marginal");
  });

  it("flags a total suction head over NE-ENG-76's 22 ft", () => {
    expect(suctionCheck({ altitudeFt: 0, waterTempF: 50, liftFt: 20, suctionLossFt: 3, npshRequiredFt: 1 }).liftNote).toMatch(/over 22 ft/);
  });

  it("refuses water at 120 °C and other absurd input by name", () => {
    try {
      suctionCheck({ altitudeFt: 50_000, waterTempF: cToF(120), liftFt: 10, suctionLossFt: -1, npshRequiredFt: 10 });
      throw new Error("should have thrown");
    } catch (e) {
      expect((e as FieldMathInputError).fields).toEqual({
        altitudeFt: "Altitude over 14,000 is not plausible",
        waterTempF: "Water temperature over 180 is not plausible",
        suctionLossFt: "Suction hose loss must be at least 0",
      });
    }
  });
});
