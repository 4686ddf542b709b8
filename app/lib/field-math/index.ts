import { hoseFriction } from "./hose";
import { loadSheet } from "./load-sheet";
import { suctionCheck } from "./suction";
import { convertTorque } from "./torque";

/** The calculators the API offers, by the name in its path. */
export const FIELD_MATH_KINDS = {
  hose: hoseFriction,
  suction: suctionCheck,
  load: loadSheet,
  torque: convertTorque,
} as const;

export type FieldMathKind = keyof typeof FIELD_MATH_KINDS;
export const isFieldMathKind = (name: string): name is FieldMathKind => name in FIELD_MATH_KINDS;
