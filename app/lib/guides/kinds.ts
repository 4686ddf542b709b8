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

/** A guide answers a fault; a rig card walks a routine part of the day (pre-start, flush, loading, shut-down…). */
export const GUIDE_KINDS = ["guide", "card"] as const;
export type GuideKind = (typeof GUIDE_KINDS)[number];
export const guideKind = (guide: { kind?: GuideKind }): GuideKind => guide.kind ?? "guide";

/** The shipped cards in the order of the day; a company's own cards follow, by title. */
const DAY_ORDER = ["pre-start", "flush-and-purge", "loading", "shut-down-clean-out", "weekly-service", "end-of-season"];
export function inDayOrder<T extends { slug: string; title: string }>(cards: readonly T[]): T[] {
  const rank = (slug: string) => (DAY_ORDER.includes(slug) ? DAY_ORDER.indexOf(slug) : DAY_ORDER.length);
  return [...cards].sort((a, b) => rank(a.slug) - rank(b.slug) || a.title.localeCompare(b.title));
}

/**
 * Facts a rig card establishes for the day, which a guide step may ask about again ("was the
 * lubricator charged today?"): the walk then shows the card's answer and its time, pre-selected.
 */
export const DAY_CHECKS = {
  "drain-plug-in": "drain plug in",
  "suction-open": "suction valve open",
  "grease-done": "grease points done",
  "lubricator-charged": "lubricator charged",
  "hoses-clear": "hoses and tips clear",
  "valves-free": "valves move freely",
  "tank-flushed": "tank, pump and hose flushed",
  "fiber-after-half": "fiber loaded only once the tank was half full",
} as const;
export type DayCheck = keyof typeof DAY_CHECKS;
export const DAY_CHECK_KEYS = Object.keys(DAY_CHECKS) as [DayCheck, ...DayCheck[]];

/** Routine service a card item can record on the rig's service rules that name the same task. */
export const SERVICE_TASKS = {
  lubricator: "Lubricator refill (pump shaft seal)",
  grease: "Grease points",
  "pump-seal": "Pump seal inspection",
  "hydraulic-oil": "Hydraulic oil and filter",
  "engine-oil": "Engine oil and filter",
  "freeze-protection": "Drain-down and freeze protection",
} as const;
export type ServiceTask = keyof typeof SERVICE_TASKS;
export const SERVICE_TASK_KEYS = Object.keys(SERVICE_TASKS) as [ServiceTask, ...ServiceTask[]];
