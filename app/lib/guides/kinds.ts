/** The step kinds, widgets and components a guide may name: plain lists, free of zod (the walk-through loads them). */
export const STEP_KINDS = ["check", "task", "safety", "fixed", "handoff"] as const;
export type StepKind = (typeof STEP_KINDS)[number];
export const FINAL_KINDS: readonly StepKind[] = ["fixed", "handoff"];

/** Field-math widgets a step may show (built by the field-math screens). */
export const FIELD_MATH_WIDGETS = ["hose-friction", "suction-head", "load-sheet", "fiber-check", "torque", "tip-choice"] as const;

export const COMPONENTS = [
  "pump",
  "suction",
  "sump",
  "agitator",
  "hose",
  "nozzle",
  "valve",
  "engine",
  "clutch",
  "hydraulics",
  "tank",
  "lubrication",
  "material",
  "operation",
] as const;

export const isFinalKind = (kind: StepKind) => FINAL_KINDS.includes(kind);
