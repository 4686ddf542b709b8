import type { Guide } from "../guides/schema";

/** Where a walk goes: its first step, and the step an answer leads to (the same step when the answer leads nowhere). */
export interface Stepper {
  initial: string;
  next(here: string, answer: string): string;
}

/**
 * The phone's stepper: the next step looked up in the guide's own `on` table. A published guide's
 * machine is exactly that table (no guards, no actions), so this answers as XState's `transition`
 * does — `tests/unit/walk/next-step.test.ts` checks every step and answer of every shipped guide —
 * without XState's code on the phone. The server and the desk keep the machine (`machineSteps`).
 */
export function guideSteps(guide: Guide): Stepper {
  return {
    initial: guide.initial,
    next: (here, answer) => {
      const step = guide.states[here];
      if (!step || step.type === "final") return here;
      return step.on?.[answer as keyof NonNullable<typeof step.on>] ?? here;
    },
  };
}
