import { createMachine } from "xstate";
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
