import { hoseFriction } from "./hose";
import { loadSheet } from "./load-sheet";
import { suctionCheck } from "./suction";
import { convertTorque } from "./torque";

/** The calculators the API offers, by the name in its path. */
export const CALCULATORS = {
  hose: hoseFriction,
  suction: suctionCheck,
  load: loadSheet,
  torque: convertTorque,
} as const;

export type CalculatorName = keyof typeof CALCULATORS;
export const isCalculator = (name: string): name is CalculatorName => name in CALCULATORS;
