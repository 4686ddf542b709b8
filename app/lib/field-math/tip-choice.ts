import { z } from "zod";
import { nozzleTipSchema } from "../rigs/schema";
import { hoseFriction, hoseFrictionInput, PSI_PER_FT_RISE, settleNozzlePsi } from "./hose";
import { FieldMathInputError, num, parseInput } from "./validate";

/**
 * Reach falls by half a foot for each psi lost before the nozzle: the smooth-bore rule
 * S = NP/2 + 26 ft (Fire Engineering, Aug 1960, citing Fire Service Hydraulics p. 171) has slope ½.
 */
export const REACH_FT_PER_PSI = 0.5;
/** That rule holds above 30 psi at the nozzle; below it a stream has no reach worth counting on. */
export const MIN_NOZZLE_PSI = 30;
/** Reach kept in hand: slurry falls shorter than the water these figures are for (common practice). */
export const REACH_MARGIN = 0.1;
/** More lines than this to cover one slope is no plan: move the rig or use another tip. */
export const MAX_PASSES = 4;

export const tipChoiceInput = z.object({
  tips: z.array(nozzleTipSchema).max(8),
  /** From where the sprayer stands to the far edge of the area. */
  distanceFt: num("Distance to the far edge", 0, 1000, { minInclusive: false }),
  /** How long the strip is, along the edge the sprayer walks. */
  widthFt: num("Width to cover", 0, 5000, { minInclusive: false }),
  hoseLengthFt: num("Hose in use", 0, 2000),
  diameterIn: hoseFrictionInput.shape.diameterIn,
  /** The pump's pressure and the flow it gives through the tip with no hose (its rated point). */
  pumpPsi: num("Pump pressure", 0, 500, { minInclusive: false }),
  flowGpm: num("Flow", 0, 1500, { minInclusive: false }),
  riseFt: num("Rise to the nozzle", -500, 500).optional(),
});
export type TipChoiceInput = z.input<typeof tipChoiceInput>;

export interface TipOption {
  name: string;
  ratedReachFt: number;
  /** Rated reach less what the hose and any rise cost. */
  reachFt: number;
  widthFt: number;
  /** Lines the sprayer works along to cover the distance. */
  passes: number;
  /** Sweeps of the pattern's width along each line. */
  sweeps: number;
  reaches: boolean;
  /** Covers the distance in at most MAX_PASSES lines. */
  workable: boolean;
  from: string[];
}

/**
 * Which of the rig's tips covers a slope with the fewest passes: reach less what the hose costs
 * decides how many lines the sprayer works from; among tips with as few passes, the widest
 * pattern covers the length in the fewest sweeps. Stated assumptions: rated reach is the maker's
 * figure at the pump's pressure with no hose, every tip passes about the pump's rated flow there,
 * and the pump holds its pressure as the flow drops.
 */
export function tipChoice(input: unknown) {
  const i = parseInput(tipChoiceInput, input);
  if (!i.tips.length) {
    throw new FieldMathInputError({ tips: "no tips are recorded for this rig: add each tip's rated reach and pattern width on the rig's page" });
  }
  // The tip passes Q = k·√NP, with k from the rated point (flow at the pump's pressure, no hose). With hose,
  // flow and nozzle pressure settle where pump pressure = friction at that flow + rise + nozzle pressure.
  const risePsi = PSI_PER_FT_RISE * (i.riseFt ?? 0);
  const available = i.pumpPsi - risePsi;
  if (available <= 0) throw new FieldMathInputError({ riseFt: "the pump cannot lift water that high" });
  const k = i.flowGpm / Math.sqrt(i.pumpPsi);
  const friction = (np: number) =>
    i.hoseLengthFt > 0 ? hoseFriction({ flowGpm: Math.max(k * Math.sqrt(np), 1e-6), lengthFt: i.hoseLengthFt, diameterIn: i.diameterIn }) : null;
  const nozzlePsi = settleNozzlePsi(available, (np) => friction(np)?.frictionLossPsi ?? 0);
  const settled = friction(nozzlePsi);
  const frictionPsi = settled?.frictionLossPsi ?? 0;
  // Downhill gains a little pressure; the rated reach stays the most a tip is counted for.
  const reachLossFt = Math.max(0, i.pumpPsi - nozzlePsi) * REACH_FT_PER_PSI;

  const tooLittlePressure = nozzlePsi <= MIN_NOZZLE_PSI;
  const options: TipOption[] = i.tips.map((t) => {
    const reachFt = tooLittlePressure ? 0 : Math.max(0, t.reachFt - reachLossFt);
    const fit = reachFt > 0 ? Math.ceil((i.distanceFt * (1 + REACH_MARGIN)) / reachFt - 1e-9) : Infinity;
    const passes = fit <= MAX_PASSES ? fit : Infinity;
    return {
      name: t.name,
      ratedReachFt: t.reachFt,
      reachFt,
      widthFt: t.widthFt,
      passes,
      sweeps: Math.ceil(i.widthFt / t.widthFt - 1e-9),
      reaches: passes === 1,
      from: positions(passes, reachFt, i.distanceFt),
      workable: Number.isFinite(passes),
    };
  });
  const ranked = [...options].sort((a, b) => a.passes - b.passes || a.sweeps - b.sweeps || a.reachFt - b.reachFt);
  return {
    best: ranked[0].workable ? ranked[0] : null,
    tooLittlePressure,
    options: ranked,
    frictionPsi,
    risePsi,
    nozzlePsi,
    flowGpm: k * Math.sqrt(nozzlePsi),
    reachLossFt,
    hoseSource: settled?.source ?? null,
    note: "Reach and friction are worked for clear water: slurry falls shorter, so a tip is only counted on where it reaches 10 % past the far edge.",
  };
}
export type TipChoice = ReturnType<typeof tipChoice>;

/** Where to stand for each pass: the near edge, then the far edge, then lines stepped in by the reach. */
function positions(passes: number, reachFt: number, distanceFt: number): string[] {
  if (!Number.isFinite(passes)) return [];
  if (passes === 1) {
    return [
      reachFt > 1.5 * distanceFt
        ? `From the near edge, aiming short: it throws about ${Math.round(reachFt)} ft, well past the far edge at ${Math.round(distanceFt)} ft.`
        : "From the near edge, spraying out to the far edge.",
    ];
  }
  if (passes === 2) return ["From the near edge, out to about half way.", "From the far edge (top or far side), back to meet the first pass."];
  return Array.from({ length: passes }, (_, k) =>
    k === 0
      ? `From the near edge, out to ${Math.round(reachFt)} ft.`
      : `From a line ${Math.round(Math.min(k * reachFt, distanceFt))} ft in, out to ${Math.round(Math.min((k + 1) * reachFt, distanceFt))} ft.`,
  );
}
