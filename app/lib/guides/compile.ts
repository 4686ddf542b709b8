import { createMachine, transition } from "xstate";
import type { Stepper } from "../walk/next-step";
import { isFinalKind } from "./kinds";
import type { Guide } from "./schema";

/** A valid guide becomes the XState machine that drives the walk-through. */
export function compileGuide(guide: Guide) {
  return createMachine({
    id: guide.id,
    initial: guide.initial,
    states: Object.fromEntries(
      Object.entries(guide.states).map(([id, step]) => [
        id,
        isFinalKind(step.meta.kind) ? { type: "final" as const, meta: step.meta } : { on: step.on ?? {}, meta: step.meta },
      ]),
    ),
  });
}

export type GuideMachine = ReturnType<typeof compileGuide>;

/** The machine as a stepper: where XState's `transition` takes each answer (the server's and the desk's replay). */
export function machineSteps(machine: GuideMachine): Stepper {
  return {
    initial: String(machine.config.initial),
    next: (here, answer) => String(transition(machine, machine.resolveState({ value: here }), { type: answer })[0].value),
  };
}
