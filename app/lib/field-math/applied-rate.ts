import { z } from "zod";
import { lbPerAcreToKgPerHa, SQFT_PER_ACRE } from "./units";
import { num, parseInput } from "./validate";

export const appliedRateInput = z.object({
  /** The area the loads were measured to cover. */
  areaSqFt: num("Area sprayed", 0, 1_000 * SQFT_PER_ACRE, { minInclusive: false }),
  materials: z
    .array(
      z.object({
        name: z.string({ error: "name the material" }).trim().min(1, "name the material").max(60),
        /** What went into the tanks sprayed over that area. */
        lb: num("Amount used", 0, 1_000_000),
        specLbPerAcre: num("Spec rate", 0, 10_000, { minInclusive: false }),
      }),
    )
    .min(1, "add at least one material")
    .max(20, "at most 20 materials"),
});
export type AppliedRateInput = z.input<typeof appliedRateInput>;

/**
 * The rate actually put down: what went into the tanks ÷ the measured area (43,560 ft² per acre,
 * by definition), against the spec, with the difference in percent of the spec.
 */
export function appliedRate(input: unknown) {
  const i = parseInput(appliedRateInput, input);
  const acres = i.areaSqFt / SQFT_PER_ACRE;
  return {
    acres,
    materials: i.materials.map((m) => {
      const lbPerAcre = m.lb / acres;
      return {
        name: m.name,
        lbPerAcre,
        kgPerHa: lbPerAcreToKgPerHa(lbPerAcre),
        specLbPerAcre: m.specLbPerAcre,
        differencePercent: ((lbPerAcre - m.specLbPerAcre) / m.specLbPerAcre) * 100,
      };
    }),
  };
}
