import { z } from "zod";
import { FRICTION_METHODS, HAZEN_WILLIAMS, tableById, tableFor } from "./hose-tables";
import { FieldMathInputError, num, parseInput } from "./validate";

/** Water figures are a floor: slurry with fiber loses more than water in the same hose. */
export const SLURRY_NOTE = "Figures are for clear water. Slurry loses more pressure than water, so treat these as the least you will lose.";
/** Head of water: 0.434 psi per foot of rise (the reciprocal of 2.31 ft per psi, NDSU AE1057). */
export const PSI_PER_FT_RISE = 0.434;

export const hoseFrictionInput = z.object({
  flowGpm: num("Flow", 0, 1500, { minInclusive: false }),
  lengthFt: num("Hose length", 0, 2000, { minInclusive: false }),
  diameterIn: num("Hose diameter", 0.5, 6),
  table: z.enum(FRICTION_METHODS, { error: `table must be one of ${FRICTION_METHODS.join(", ")}` }).optional(),
  /** Hazen-Williams roughness C (the formula only). */
  hazenC: num("Hazen-Williams C", 60, 160).optional(),
  elevationFt: num("Elevation change", -500, 500).optional(),
});
export type HoseFrictionInput = z.infer<typeof hoseFrictionInput>;

/** Hazen-Williams friction in psi for water through `lengthFt` of `diameterIn` hose at `flowGpm`. */
export function hazenWilliamsPsi(flowGpm: number, lengthFt: number, diameterIn: number, c: number = HAZEN_WILLIAMS.defaultC): number {
  const hfPer100 = (0.2083 * (100 / c) ** 1.852 * flowGpm ** 1.852) / diameterIn ** 4.8655;
  return hfPer100 * (lengthFt / 100) * PSI_PER_FT_RISE;
}

/**
 * Friction loss in psi, plus the head of any rise to the nozzle (negative for downhill): FL = C·Q²·L from
 * a fire-service table, or the rigid-pipe formula when asked for or when no table lists the hose size.
 */
export function hoseFriction(input: unknown) {
  const { flowGpm, lengthFt, diameterIn, table: wanted, hazenC, elevationFt = 0 } = parseInput(hoseFrictionInput, input);
  const elevationPsi = PSI_PER_FT_RISE * elevationFt;
  const table = wanted === HAZEN_WILLIAMS.id ? undefined : tableFor(diameterIn, wanted);
  if (wanted === HAZEN_WILLIAMS.id || (!table && !wanted)) {
    const c = hazenC ?? HAZEN_WILLIAMS.defaultC;
    const frictionLossPsi = hazenWilliamsPsi(flowGpm, lengthFt, diameterIn, c);
    return {
      frictionLossPsi,
      elevationPsi,
      totalLossPsi: frictionLossPsi + elevationPsi,
      coefficient: c,
      table: HAZEN_WILLIAMS.id,
      tableName: HAZEN_WILLIAMS.name,
      source: `${HAZEN_WILLIAMS.source}, C = ${c}${hazenC ? "" : " for smooth rubber-lined hose (from memory; ask the hose maker)"}${wanted ? "" : `; no hose table lists ${diameterIn} in`}`,
      note: SLURRY_NOTE,
    };
  }
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
  const rise = PSI_PER_FT_RISE * elevationFt;
  if (pumpPsi - rise <= 0) throw new FieldMathInputError({ pumpPsi: "the pump cannot lift water that high" });
  const loss = (flowGpm: number, lengthFt: number) => hoseFriction({ flowGpm, lengthFt, diameterIn, table: probe.table }).frictionLossPsi;
  const rows = [];
  for (let lengthFt = 50; lengthFt <= maxLengthFt; lengthFt += 50) {
    const nozzlePsi = settleNozzlePsi(pumpPsi - rise, (np) => loss(tipFlowGpm(tipIn, np), lengthFt));
    const flowGpm = tipFlowGpm(tipIn, nozzlePsi);
    rows.push({ lengthFt, flowGpm, nozzlePsi, frictionLossPsi: pumpPsi - rise - nozzlePsi, reachFt: reachFt(tipIn, nozzlePsi) });
  }
  return { rows, table: probe.table, tableName: probe.tableName, source: probe.source, note: SLURRY_NOTE };
}

/**
 * The nozzle pressure where what the pump gives (`available`, after any rise) = friction at the tip's flow
 * + nozzle pressure. Friction grows with flow and flow with nozzle pressure, so one root lies in
 * [0, available]; bisection finds it for the table's C·Q² and the formula's q^1.852 alike.
 */
export function settleNozzlePsi(available: number, frictionAt: (nozzlePsi: number) => number): number {
  let lo = 0;
  let hi = available;
  for (let i = 0; i < 100 && hi - lo > 1e-9; i++) {
    const mid = (lo + hi) / 2;
    if (mid + frictionAt(mid) > available) hi = mid;
    else lo = mid;
  }
  return (lo + hi) / 2;
}
