import { describe, expect, it } from "vitest";
import { fiberCheck, WATER_LB_PER_GAL } from "~/lib/field-math/fiber-check";
import { FieldMathInputError } from "~/lib/field-math/validate";

describe("fiber check: what was actually loaded", () => {
  // The ceiling of about 50 lb of wood fiber per 100 gal of water is common practice (references.md, "not confirmed"): a default, not an oracle.
  it("says over when 14 bags of 50 lb go into 1,200 gal (700 lb against 600 lb)", () => {
    const r = fiberCheck({ bags: 14, lbPerBag: 50, waterGal: 1200, tankGal: 1500 });
    expect(r.fiberLb).toBe(700);
    expect(r.limitLb).toBe(600);
    expect(r.overFiber).toBe(true);
    expect(r.waterNeededGal).toBe(1400);
  });

  it("says within for 10 bags in the same water, and can be over where a plan at spec rates never is", () => {
    expect(fiberCheck({ bags: 10, lbPerBag: 50, waterGal: 1200, tankGal: 1500 }).overFiber).toBe(false);
    expect(fiberCheck({ bags: 13, lbPerBag: 50, waterGal: 1200, tankGal: 1500, maxFiberLbPer100Gal: 50 }).overFiber).toBe(true);
  });

  it("weighs the load with water at 8.337 lb/gal (CRC Handbook density at 60 °F) and compares it with the carrier's rating", () => {
    const r = fiberCheck({ bags: 10, lbPerBag: 50, waterGal: 1000, tankGal: 1500, carrierRatingLb: 8000 });
    expect(WATER_LB_PER_GAL).toBeCloseTo(8.337, 3);
    expect(r.loadLb).toBeCloseTo(1000 * 8.337 + 500, 6);
    expect(r.overCarrier).toBe(true);
    expect(fiberCheck({ bags: 10, lbPerBag: 50, waterGal: 1000, tankGal: 1500 }).overCarrier).toBeNull();
  });

  it("names what is wrong: more water than the tank, a blank bag weight", () => {
    const fields = (input: unknown) => {
      try {
        fiberCheck(input);
        return {};
      } catch (e) {
        return (e as FieldMathInputError).fields;
      }
    };
    expect(fields({ bags: 5, lbPerBag: 50, waterGal: 2000, tankGal: 1500 }).waterGal).toMatch(/more water than the 1500 gal tank holds/);
    expect(fields({ bags: 5, lbPerBag: Number.NaN, waterGal: 1000, tankGal: 1500 }).lbPerBag).toMatch(/Weight of a bag must be a number/);
  });
});
