import { describe, expect, it } from "vitest";
import * as u from "~/lib/field-math/units";

describe("units (exact factors)", () => {
  it("matches NIST SP 811 App. B definitions", () => {
    expect(u.ftToM(1)).toBe(0.3048); // NIST SP 811: 1 ft = 0.3048 m exactly
    expect(u.lbToKg(1)).toBe(0.45359237); // NIST SP 811: 1 lb = 0.45359237 kg exactly
    expect(u.galToL(1)).toBe(3.785411784); // NIST SP 811: 1 US gal = 3.785411784 L exactly
    expect(u.acresToSqFt(1)).toBe(43_560); // NIST Handbook 44: 1 acre = 43,560 ft²
    expect(u.ftLbToNm(1)).toBeCloseTo(1.3558179483, 10); // NIST SP 811: 1 ft·lbf = 1.3558179483 N·m
  });

  it("derives lb/acre → kg/ha as in references.md", () => {
    expect(u.LB_PER_ACRE_TO_KG_PER_HA).toBeCloseTo(1.12085, 5); // derived from the exact factors
    expect(Math.round(u.lbPerAcreToKgPerHa(1500))).toBe(1681); // references.md: 1,500 lb/ac = 1,681 kg/ha
    expect(Math.round(u.lbPerAcreToKgPerHa(2000))).toBe(2242); // references.md: 2,000 lb/ac = 2,242 kg/ha
  });

  it("uses 2.31 ft of head per psi (NDSU Extension AE1057, Table 1)", () => {
    expect(u.psiToFtHead(10)).toBeCloseTo(23.1, 10);
  });

  it("round-trips every pair", () => {
    for (const x of [0, 0.5, 1, 17.3, 1234.5]) {
      expect(u.mToFt(u.ftToM(x))).toBeCloseTo(x, 10);
      expect(u.kgToLb(u.lbToKg(x))).toBeCloseTo(x, 10);
      expect(u.lToGal(u.galToL(x))).toBeCloseTo(x, 10);
      expect(u.sqFtToAcres(u.acresToSqFt(x))).toBeCloseTo(x, 10);
      expect(u.sqMToSqFt(u.sqFtToSqM(x))).toBeCloseTo(x, 10);
      expect(u.nmToFtLb(u.ftLbToNm(x))).toBeCloseTo(x, 10);
      expect(u.kpaToPsi(u.psiToKpa(x))).toBeCloseTo(x, 10);
      expect(u.ftHeadToPsi(u.psiToFtHead(x))).toBeCloseTo(x, 10);
      expect(u.cToF(u.fToC(x))).toBeCloseTo(x, 10);
    }
    expect(u.fToC(212)).toBe(100);
  });
});
