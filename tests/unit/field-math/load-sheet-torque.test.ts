import { describe, expect, it } from "vitest";
import { loadSheet, SEED_IN_TANK_MINUTES } from "~/lib/field-math/load-sheet";
import { boltTorque, convertTorque } from "~/lib/field-math/torque";
import { FieldMathInputError } from "~/lib/field-math/validate";

const fiber = (lbPerAcre: number, bagLb = 50) => ({ name: "Wood fiber", lbPerAcre, fiber: true, bagLb });

describe("load sheet", () => {
  it("500 lb of fiber at 2,000 lb/ac covers 0.25 ac = 10,890 ft² (USU Extension CNMP step 7-1 arithmetic)", () => {
    // 1,000 gal tank at the 50 lb / 100 gal ceiling (common practice) carries 500 lb of fiber.
    const r = loadSheet({ areaSqFt: 43_560, tankGal: 1000, maxFiberLbPer100Gal: 50, materials: [fiber(2000)] });
    expect(r.loads).toBe(4);
    expect(r.fiberPerFullLoadLb).toBeCloseTo(500, 10);
    expect(r.perLoad[0].areaSqFt).toBeCloseTo(10_890, 8);
    expect(r.perLoad[0].acres).toBeCloseTo(0.25, 10);
    expect(r.perLoad[0].materials[0]).toEqual({ name: "Wood fiber", lb: 500, bags: 10 });
  });

  it("WSDOE BMP C120/C121 rates: 1,500 lb/ac mulch, 120 lb/ac seed, 90 lb/ac 10-4-6 in a 1,500 gal tank", () => {
    const r = loadSheet({
      areaSqFt: 2 * 43_560,
      tankGal: 1500,
      materials: [fiber(1500), { name: "Seed mix", lbPerAcre: 120 }, { name: "Fertilizer 10-4-6", lbPerAcre: 90, bagLb: 50 }],
    });
    // 750 lb of fiber per load at 1,500 lb/ac → 0.5 ac per load → 4 loads for 2 ac.
    expect(r.loads).toBe(4);
    expect(r.perLoad[0].materials.map((m) => m.lb)).toEqual([750, 60, 45]);
    expect(r.perLoad[0].waterGal).toBeCloseTo(1500, 10);
    expect(r.totals.materials[1].lb).toBeCloseTo(240, 10);
    expect(r.seedInTankMinutes).toBe(30); // USDA NRCS Wyoming fact sheet
    expect(SEED_IN_TANK_MINUTES).toBe(30);
  });

  it("makes the last load smaller when the area does not divide evenly", () => {
    const r = loadSheet({ areaSqFt: 30_000, tankGal: 1000, materials: [fiber(2000)] });
    expect(r.loads).toBe(3);
    expect(r.perLoad[2].areaSqFt).toBeCloseTo(30_000 - 2 * 10_890, 8);
    expect(r.perLoad[2].waterGal).toBeLessThan(r.perLoad[0].waterGal);
  });

  it("keeps loads × per-load fiber = total fiber, and more area never fewer loads (property)", () => {
    let lastLoads = 0;
    for (let area = 1000; area <= 400_000; area += 7919) {
      const r = loadSheet({ areaSqFt: area, tankGal: 1200, maxFiberLbPer100Gal: 45, materials: [fiber(1800), { name: "Tackifier", lbPerAcre: 100 }] });
      const sum = r.perLoad.reduce((s, l) => s + l.materials[0].lb, 0);
      expect(sum).toBeCloseTo((1800 * area) / 43_560, 6);
      for (const l of r.perLoad) expect(l.waterGal).toBeLessThanOrEqual(1200 + 1e-9);
      for (const l of r.perLoad) expect((l.materials[0].lb / l.waterGal) * 100).toBeLessThanOrEqual(45 + 1e-9);
      expect(r.loads).toBeGreaterThanOrEqual(lastLoads);
      lastLoads = r.loads;
    }
  });

  it("names each bad field, and asks for a fiber or a water rate", () => {
    const bad = () => loadSheet({ areaSqFt: 0, tankGal: 50, materials: [{ name: "", lbPerAcre: -5 }] });
    expect(bad).toThrow(FieldMathInputError);
    try {
      bad();
    } catch (e) {
      expect(Object.keys((e as FieldMathInputError).fields).sort()).toEqual(["areaSqFt", "materials.0.lbPerAcre", "materials.0.name", "tankGal"]);
    }
    expect(() => loadSheet({ areaSqFt: 1000, tankGal: 500, materials: [{ name: "Seed", lbPerAcre: 100 }] })).toThrow(/fiber/);
  });
});

describe("torque", () => {
  it("converts with 1 ft·lbf = 1.3558179483 N·m (NIST SP 811) both ways", () => {
    expect(convertTorque({ value: 25, unit: "ft-lb" }).nm).toBeCloseTo(33.895448707, 8);
    expect(convertTorque({ value: 102, unit: "N-m" }).ftLb).toBeCloseTo(75.23, 2);
    expect(() => convertTorque({ value: -1, unit: "ft-lb" })).toThrow(/Torque must be at least 0/);
    expect(() => convertTorque({ value: 1, unit: "in-lb" })).toThrow(/unit must be/);
  });

  it("½-13 grade 5 dry ≈ 75 ft·lb (102 N·m) by T = K·D·P, P = 75 % of proof load (SAE J429 proof 85,000 psi)", () => {
    const t = boltTorque({ diameterIn: 0.5, threadsPerInch: 13, grade: 5, condition: "dry" });
    expect(Math.round(t.ftLb)).toBe(75);
    expect(Math.round(t.nm)).toBe(102);
    expect(boltTorque({ diameterIn: 0.5, threadsPerInch: 13, grade: 5, condition: "lubricated" }).ftLb).toBeCloseTo(t.ftLb * 0.75, 8);
  });
});
