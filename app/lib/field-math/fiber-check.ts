import { z } from "zod";
import { DEFAULT_FIBER_CEILING_LB_PER_100_GAL } from "./load-sheet";
import { FieldMathInputError, num, parseInput } from "./validate";

/** Water near 60–70 °F: 8.337 lb per US gallon (CRC Handbook density table, 999.0 kg/m³ at 15.6 °C). */
export const WATER_LB_PER_GAL = 8.337;

export const fiberCheckInput = z.object({
  bags: num("Bags of fiber", 0, 200),
  lbPerBag: num("Weight of a bag", 1, 2000, { minInclusive: true }),
  waterGal: num("Water in the tank", 0, 6000, { minInclusive: false }),
  tankGal: num("Tank size", 100, 6000),
  maxFiberLbPer100Gal: num("Fiber ceiling", 5, 150).default(DEFAULT_FIBER_CEILING_LB_PER_100_GAL),
  /** What the truck or trailer is rated to carry, if known. */
  carrierRatingLb: num("Carrier rating", 500, 80_000).optional(),
});

/**
 * What was actually loaded, against what the water can carry: fiber = bags × weight, the limit =
 * ceiling × water ÷ 100 (about 50 lb per 100 gal, common practice). Also the load's weight (water and
 * fiber) against what the carrier is rated for, when the rig records it.
 */
export function fiberCheck(input: unknown) {
  const i = parseInput(fiberCheckInput, input);
  if (i.waterGal > i.tankGal) throw new FieldMathInputError({ waterGal: `more water than the ${i.tankGal} gal tank holds` });
  const fiberLb = i.bags * i.lbPerBag;
  const limitLb = (i.maxFiberLbPer100Gal * i.waterGal) / 100;
  const loadLb = i.waterGal * WATER_LB_PER_GAL + fiberLb;
  return {
    fiberLb,
    limitLb,
    fiberPer100Gal: (fiberLb / i.waterGal) * 100,
    overFiber: fiberLb > limitLb,
    /** Water it would take to carry this much fiber within the ceiling. */
    waterNeededGal: (fiberLb / i.maxFiberLbPer100Gal) * 100,
    loadLb,
    overCarrier: i.carrierRatingLb === undefined ? null : loadLb > i.carrierRatingLb,
  };
}
