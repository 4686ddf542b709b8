import { z } from "zod";
import { SQFT_PER_ACRE } from "./units";
import { FieldMathInputError, num, parseInput } from "./validate";

/** About 50 lb of wood fiber per 100 gal of water is a usual ceiling (common practice; set per rig and product). */
export const DEFAULT_FIBER_CEILING_LB_PER_100_GAL = 50;
/** Seed should stay in the tank no more than 30 minutes (USDA NRCS Wyoming, Hydroseeding and Hydromulching Fact Sheet). */
export const SEED_IN_TANK_MINUTES = 30;

/** Loading order (USDA NRCS Wyoming fact sheet; the half / three-quarter marks are common practice). */
export const LOADING_ORDER = [
  "Water in to about half, agitator running.",
  "Lightest materials next.",
  "Fiber mulch only once the tank is at least half full; all of it in by about three-quarters full.",
  "Tackifier, then fertilizer.",
  `Seed last, just before spraying: no more than ${SEED_IN_TANK_MINUTES} minutes in the tank.`,
  "Do not over-agitate once loaded.",
];

export const materialInput = z.object({
  name: z.string({ error: "name the material" }).trim().min(1, "name the material").max(60),
  lbPerAcre: num("Rate", 0, 10_000, { minInclusive: false }),
  fiber: z.boolean().optional(),
  bagLb: num("Bag size", 0, 2000, { minInclusive: false }).optional(),
});

export const loadSheetInput = z.object({
  areaSqFt: num("Area", 0, 100 * SQFT_PER_ACRE, { minInclusive: false }),
  tankGal: num("Tank size", 100, 6000),
  maxFiberLbPer100Gal: num("Fiber ceiling", 5, 150).default(DEFAULT_FIBER_CEILING_LB_PER_100_GAL),
  waterGalPerAcre: num("Water rate", 0, 20_000, { minInclusive: false }).optional(),
  materials: z.array(materialInput).min(1, "add at least one material").max(20, "at most 20 materials"),
});
export type LoadSheetInput = z.input<typeof loadSheetInput>;

export interface LoadMaterial {
  name: string;
  lb: number;
  bags?: number;
}

export interface Load {
  number: number;
  waterGal: number;
  areaSqFt: number;
  acres: number;
  materials: LoadMaterial[];
}

/**
 * Tank loads for an area at the spec rates. A load is limited by the fiber the water can
 * carry (ceiling × water ÷ 100) and by the tank; the last load is smaller when the area
 * does not divide evenly. Area per load = fiber per load ÷ rate × 43,560 ft².
 */
export function loadSheet(input: unknown) {
  const i = parseInput(loadSheetInput, input);
  const acres = i.areaSqFt / SQFT_PER_ACRE;
  const fiberRate = i.materials.filter((m) => m.fiber).reduce((s, m) => s + m.lbPerAcre, 0);
  if (fiberRate === 0 && !i.waterGalPerAcre) {
    throw new FieldMathInputError({ materials: "mark the fiber mulch as fiber, or give a water rate, so the loads can be sized" });
  }
  // Water each acre needs: enough to carry its fiber under the ceiling, and at least the water rate.
  const waterPerAcre = Math.max(i.waterGalPerAcre ?? 0, (fiberRate * 100) / i.maxFiberLbPer100Gal);
  const acresPerFullLoad = i.tankGal / waterPerAcre;
  const loadCount = Math.max(1, Math.ceil(acres / acresPerFullLoad - 1e-9));

  const loads: Load[] = [];
  for (let n = 1; n <= loadCount; n++) {
    const loadAcres = n < loadCount ? acresPerFullLoad : acres - acresPerFullLoad * (loadCount - 1);
    loads.push({
      number: n,
      waterGal: loadAcres * waterPerAcre,
      acres: loadAcres,
      areaSqFt: loadAcres * SQFT_PER_ACRE,
      materials: i.materials.map((m) => ({ name: m.name, lb: m.lbPerAcre * loadAcres, ...(m.bagLb ? { bags: (m.lbPerAcre * loadAcres) / m.bagLb } : {}) })),
    });
  }
  const totals = {
    acres,
    areaSqFt: i.areaSqFt,
    waterGal: acres * waterPerAcre,
    materials: i.materials.map((m) => ({ name: m.name, lb: m.lbPerAcre * acres, ...(m.bagLb ? { bags: (m.lbPerAcre * acres) / m.bagLb } : {}) })),
  };
  return {
    loads: loadCount,
    perLoad: loads,
    totals,
    fiberPerFullLoadLb: fiberRate * acresPerFullLoad,
    limitedBy: i.waterGalPerAcre && i.waterGalPerAcre * i.maxFiberLbPer100Gal > fiberRate * 100 ? ("water rate" as const) : ("fiber ceiling" as const),
    loadingOrder: LOADING_ORDER,
    seedInTankMinutes: SEED_IN_TANK_MINUTES,
  };
}
