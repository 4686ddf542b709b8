import { z } from "zod";
import { FT_HEAD_PER_PSI, fToC, kpaToPsi, ftToM } from "./units";
import { num, parseInput } from "./validate";

/**
 * Pressure of the U.S. Standard Atmosphere 1976 in the troposphere:
 * P = 101,325 Pa · (1 − h / 44,329 m)^5.255876.
 */
export function atmosphereKpa(altitudeFt: number): number {
  const { altitudeFt: h } = parseInput(z.object({ altitudeFt: num("Altitude", -1400, 36_000) }), { altitudeFt });
  return 101.325 * (1 - ftToM(h) / 44_329) ** 5.255876;
}

/**
 * Vapour pressure of water by the Antoine equation, log10(P mmHg) = A − B / (C + T °C) with
 * A 8.07131, B 1730.63, C 233.426 for 1–100 °C (constants from memory, as widely tabulated;
 * checked in the tests against the CRC Handbook table in references.md).
 */
export const ANTOINE_SOURCE = "Antoine equation for water, 1–100 °C (A 8.07131, B 1730.63, C 233.426; mmHg, °C)";
export function vapourPressureKpa(waterTempF: number): number {
  const { waterTempF: f } = parseInput(z.object({ waterTempF: num("Water temperature", 33.8, 212) }), { waterTempF });
  const mmHg = 10 ** (8.07131 - 1730.63 / (233.426 + fToC(f)));
  return mmHg * 0.133322368;
}

export const kpaToFtHead = (kpa: number) => kpaToPsi(kpa) * FT_HEAD_PER_PSI;

/** NPSH available from heads in feet: atmosphere − vapour − lift (negative lift: flooded) − losses. */
export function npshAvailableFt(h: { atmosphereFt: number; vapourFt: number; liftFt: number; lossesFt: number }): number {
  return h.atmosphereFt - h.vapourFt - h.liftFt - h.lossesFt;
}

export const suctionInput = z.object({
  altitudeFt: num("Altitude", -1400, 14_000),
  waterTempF: num("Water temperature", 33.8, 180),
  liftFt: num("Suction lift", -50, 30),
  suctionLossFt: num("Suction hose loss", 0, 50),
  npshRequiredFt: num("NPSH required", 0, 60),
  marginFt: num("Safety margin", 0, 20).optional(),
});

export type SuctionVerdict = "enough" | "marginal" | "will cavitate or lose prime";

/** Default margin over the pump's NPSH required: 3 ft (common practice; a company can change it). */
export const DEFAULT_MARGIN_FT = 3;

/** Whether a pump drafting water will hold prime, with what to change when it will not. */
export function suctionCheck(input: unknown) {
  const i = parseInput(suctionInput, input);
  const margin = i.marginFt ?? DEFAULT_MARGIN_FT;
  const atmosphereFt = kpaToFtHead(atmosphereKpa(i.altitudeFt));
  const vapourFt = kpaToFtHead(vapourPressureKpa(i.waterTempF));
  const npshAvailable = npshAvailableFt({ atmosphereFt, vapourFt, liftFt: i.liftFt, lossesFt: i.suctionLossFt });
  const verdict: SuctionVerdict =
    npshAvailable >= i.npshRequiredFt + margin ? "enough" : npshAvailable >= i.npshRequiredFt ? "marginal" : "will cavitate or lose prime";
  const advice: string[] = [];
  if (verdict !== "enough") {
    const short = i.npshRequiredFt + margin - npshAvailable;
    if (i.liftFt > 0) advice.push(`Shorten the lift by at least ${Math.ceil(short)} ft (move the rig closer to the water or lower).`);
    if (i.suctionLossFt > 0) advice.push("Use a shorter or wider suction hose and clear the strainer to cut suction loss.");
    if (i.waterTempF > 60) advice.push("Draw cooler water: warm water boils at the pump inlet sooner.");
  }
  // USDA NRCS Nebraska NE-ENG-76: total suction head no more than 22 ft; under 20 recommended; 15 preferred.
  const totalSuctionFt = i.liftFt + i.suctionLossFt;
  const liftNote =
    totalSuctionFt > 22
      ? "Total suction head is over 22 ft, beyond what NE-ENG-76 allows for drafting."
      : totalSuctionFt > 20
        ? "Total suction head is over the 20 ft NE-ENG-76 recommends (15 ft preferred)."
        : null;
  return {
    atmosphereFt,
    vapourFt,
    npshAvailableFt: npshAvailable,
    npshRequiredFt: i.npshRequiredFt,
    marginFt: margin,
    verdict,
    advice,
    liftNote,
    altitudeM: ftToM(i.altitudeFt),
    waterTempC: fToC(i.waterTempF),
    vapourSource: ANTOINE_SOURCE,
  };
}
