import { appliedRate } from "./applied-rate";
import { hoseFriction } from "./hose";
import { loadCard } from "./load-card";
import type { LoadRules } from "./load-rules";
import { loadSheet } from "./load-sheet";
import { suctionCheck } from "./suction";
import { tipChoice } from "./tip-choice";
import { convertTorque } from "./torque";

/** The calculators the API offers, by the name in its path; the load card works to the company's rules. */
export const FIELD_MATH_KINDS: Record<string, (input: unknown, rules: LoadRules) => unknown> = {
  hose: hoseFriction,
  suction: suctionCheck,
  load: loadSheet,
  "load-card": loadCard,
  tip: tipChoice,
  rate: appliedRate,
  torque: convertTorque,
};

export const isFieldMathKind = (name: string) => Object.hasOwn(FIELD_MATH_KINDS, name);
