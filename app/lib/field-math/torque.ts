import { z } from "zod";
import { ftLbToNm, nmToFtLb } from "./units";
import { num, parseInput } from "./validate";

export const torqueInput = z.object({
  value: num("Torque", 0, 5000),
  unit: z.enum(["ft-lb", "N-m"], { error: 'unit must be "ft-lb" or "N-m"' }),
});

/** ft·lbf ↔ N·m through 1 ft·lbf = 1.3558179483 N·m (NIST SP 811). */
export function convertTorque(input: unknown) {
  const { value, unit } = parseInput(torqueInput, input);
  return unit === "ft-lb" ? { ftLb: value, nm: ftLbToNm(value) } : { ftLb: nmToFtLb(value), nm: value };
}

/** SAE J429 proof stress, psi: grade 5 (¼–1 in) and grade 8. */
export const PROOF_STRESS_PSI = { 5: 85_000, 8: 120_000 } as const;
export const NUT_FACTOR = { dry: 0.2, lubricated: 0.15 } as const;

export const boltInput = z.object({
  diameterIn: num("Bolt diameter", 0.25, 1),
  threadsPerInch: num("Threads per inch", 4, 40),
  grade: z.union([z.literal(5), z.literal(8)], { error: "grade must be 5 or 8" }),
  condition: z.enum(["dry", "lubricated"]),
});

/**
 * Tightening torque by T = K·D·P with P = 75 % of proof load (proof stress × tensile stress
 * area; area As = 0.7854·(D − 0.9743/n)², the unified-thread formula, from memory). A guide
 * for when the maker gives no figure; the maker's figure always comes first.
 */
export function boltTorque(input: unknown) {
  const { diameterIn, threadsPerInch, grade, condition } = parseInput(boltInput, input);
  const stressArea = 0.7854 * (diameterIn - 0.9743 / threadsPerInch) ** 2;
  const clampLb = 0.75 * PROOF_STRESS_PSI[grade] * stressArea;
  const ftLb = (NUT_FACTOR[condition] * diameterIn * clampLb) / 12;
  return { ftLb, nm: ftLbToNm(ftLb), clampLb, stressAreaSqIn: stressArea };
}
