import { z } from "zod";
import { DEFAULT_FIBER_CEILING_LB_PER_100_GAL, MATERIAL_KINDS, SEED_IN_TANK_MINUTES, type MaterialKind } from "./load-rules";
import { SQFT_PER_ACRE } from "./units";
import { FieldMathInputError, num, parseInput } from "./validate";

export { DEFAULT_FIBER_CEILING_LB_PER_100_GAL, SEED_IN_TANK_MINUTES };

export const materialInput = z.object({
  name: z.string({ error: "name the material" }).trim().min(1, "name the material").max(60),
  lbPerAcre: num("Rate", 0, 10_000, { minInclusive: false }),
  /** What it is, for its place in the loading order; `fiber: true` is the older way to say kind "fiber". */
  kind: z.enum(MATERIAL_KINDS, { error: `kind must be one of ${MATERIAL_KINDS.join(", ")}` }).optional(),
  fiber: z.boolean().optional(),
  bagLb: num("Bag size", 0, 2000, { minInclusive: false }).optional(),
});
export type MaterialInput = z.infer<typeof materialInput>;
export const kindOf = (m: MaterialInput): MaterialKind => m.kind ?? (m.fiber ? "fiber" : "other");

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
  const { fiberRate, waterPerAcre } = sizing(i);
  return planLoads(i, i.tankGal / waterPerAcre, fiberRate, waterPerAcre);
}
export type LoadSheet = ReturnType<typeof loadSheet>;
export type ParsedLoadSheetInput = z.infer<typeof loadSheetInput>;

/** Fiber per acre, and the water each acre needs: enough to carry its fiber under the ceiling, and at least the water rate. */
export function sizing(i: ParsedLoadSheetInput) {
  const fiberRate = i.materials.filter((m) => kindOf(m) === "fiber").reduce((s, m) => s + m.lbPerAcre, 0);
  if (fiberRate === 0 && !i.waterGalPerAcre) {
    throw new FieldMathInputError({ materials: "Mark one material as fiber mulch, or give the water per acre, so the loads can be sized." });
  }
  return { fiberRate, waterPerAcre: Math.max(i.waterGalPerAcre ?? 0, (fiberRate * 100) / i.maxFiberLbPer100Gal) };
}

/** Loads of `acresPerFullLoad` each until the area is covered; the last load takes what is left. */
export function planLoads(i: ParsedLoadSheetInput, acresPerFullLoad: number, fiberRate: number, waterPerAcre: number) {
  const acres = i.areaSqFt / SQFT_PER_ACRE;
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
    seedInTankMinutes: SEED_IN_TANK_MINUTES,
  };
}
