import { z } from "zod";
import { FRICTION_TABLES, tableById, tableFor } from "./hose-tables";
import { FieldMathInputError, num, parseInput } from "./validate";

/** Water figures are a floor: slurry with fiber loses more than water in the same hose. */
export const SLURRY_NOTE = "Figures are for clear water. Slurry loses more pressure than water, so treat these as the least you will lose.";
/** Head of water: 0.434 psi per foot of rise (the reciprocal of 2.31 ft per psi, NDSU AE1057). */
export const PSI_PER_FT_RISE = 0.434;

export const hoseFrictionInput = z.object({
  flowGpm: num("Flow", 0, 1500, { minInclusive: false }),
  lengthFt: num("Hose length", 0, 2000, { minInclusive: false }),
  diameterIn: num("Hose diameter", 0.5, 6),
  table: z
    .enum(FRICTION_TABLES.map((t) => t.id) as [string, ...string[]], { error: `table must be one of ${FRICTION_TABLES.map((t) => t.id).join(", ")}` })
    .optional(),
  elevationFt: num("Elevation change", -500, 500).optional(),
});
export type HoseFrictionInput = z.infer<typeof hoseFrictionInput>;

/** Friction loss FL = C·Q²·L in psi, plus the head of any rise to the nozzle (negative for downhill). */
export function hoseFriction(input: unknown) {
  const { flowGpm, lengthFt, diameterIn, table: wanted, elevationFt = 0 } = parseInput(hoseFrictionInput, input);
  const table = tableFor(diameterIn, wanted);
  if (!table || (wanted && table.id !== wanted)) {
    const t = wanted ? tableById(wanted)! : undefined;
    throw new FieldMathInputError({
      diameterIn: `no published coefficient for ${diameterIn} in hose${
        t
          ? ` in the ${t.name} table (it has ${Object.keys(t.coefficients)
              .map(Number)
              .sort((a, b) => a - b)
              .join(", ")} in)`
          : ""
      }`,
    });
  }
  const c = table.coefficients[String(diameterIn)];
  const q = flowGpm / 100;
  const l = lengthFt / 100;
  const frictionLossPsi = c * q * q * l;
  const elevationPsi = PSI_PER_FT_RISE * elevationFt;
  return {
    frictionLossPsi,
    elevationPsi,
    totalLossPsi: frictionLossPsi + elevationPsi,
    coefficient: c,
    table: table.id,
    tableName: table.name,
    source: table.source,
    note: SLURRY_NOTE,
  };
}

/** The smooth-bore constant: gpm = 29.7·d²·√NP (IFSTA, as quoted in fire training material). */
const TIP_FLOW_K = 29.7;

/** Smooth-bore tip flow: gpm = 29.7·d²·√NP (d in inches, NP nozzle pressure in psi). */
export function tipFlowGpm(tipIn: number, nozzlePsi: number): number {
  const { tipIn: d, nozzlePsi: p } = parseInput(z.object({ tipIn: num("Tip diameter", 0.25, 3), nozzlePsi: num("Nozzle pressure", 0, 400) }), {
    tipIn,
    nozzlePsi,
  });
  return TIP_FLOW_K * d * d * Math.sqrt(p);
}

/**
 * Horizontal reach of a smooth-bore stream: S = NP/2 + 26 ft for a ¾ in tip above 30 psi,
 * plus 5 ft for each ⅛ in of tip above ¾ in (Fire Engineering, Aug 1960, citing Fire Service
 * Hydraulics p. 171). Below 30 psi the rule does not apply and null is returned.
 */
export function reachFt(tipIn: number, nozzlePsi: number): number | null {
  const { tipIn: d, nozzlePsi: p } = parseInput(z.object({ tipIn: num("Tip diameter", 0.75, 2), nozzlePsi: num("Nozzle pressure", 0, 400) }), {
    tipIn,
    nozzlePsi,
  });
  if (p <= 30) return null;
  return p / 2 + 26 + 5 * ((d - 0.75) / 0.125);
}

export const hoseReachInput = z.object({
  pumpPsi: num("Pump pressure", 0, 400, { minInclusive: false }),
  tipIn: num("Tip diameter", 0.75, 2),
  diameterIn: num("Hose diameter", 0.5, 6),
  table: hoseFrictionInput.shape.table,
  elevationFt: num("Elevation change", -500, 500).optional(),
  maxLengthFt: num("Longest hose", 50, 2000).optional(),
});

/**
 * What each 50 ft of hose costs in reach at a given pump pressure. Flow and nozzle pressure
 * settle where pump pressure = friction + rise + nozzle pressure; with the tip flow formula
 * that is NP = (P − rise) / (1 + C·L·29.7²·d⁴ / 10⁶), solved exactly.
 */
export function reachByHoseLength(input: unknown) {
  const { pumpPsi, tipIn, diameterIn, table: wanted, elevationFt = 0, maxLengthFt = 500 } = parseInput(hoseReachInput, input);
  const probe = hoseFriction({ flowGpm: 100, lengthFt: 100, diameterIn, table: wanted });
  const c = probe.coefficient;
  const rise = PSI_PER_FT_RISE * elevationFt;
  if (pumpPsi - rise <= 0) throw new FieldMathInputError({ pumpPsi: "the pump cannot lift water that high" });
  const rows = [];
  for (let lengthFt = 50; lengthFt <= maxLengthFt; lengthFt += 50) {
    const k = (c * lengthFt * TIP_FLOW_K ** 2 * tipIn ** 4) / 1e6;
    const nozzlePsi = (pumpPsi - rise) / (1 + k);
    const flowGpm = tipFlowGpm(tipIn, nozzlePsi);
    rows.push({ lengthFt, flowGpm, nozzlePsi, frictionLossPsi: pumpPsi - rise - nozzlePsi, reachFt: reachFt(tipIn, nozzlePsi) });
  }
  return { rows, table: probe.table, tableName: probe.tableName, source: probe.source, note: SLURRY_NOTE };
}
