import { ANSWERS_BY_KIND } from "../vocabulary";
import type { Guide } from "../guides/schema";
import type { Stepper } from "./next-step";

export interface WalkAnswer {
  seq: number;
  stepId: string;
  answer: string;
}

/** Does this answer belong to this step of this guide version? BACK fits any step. */
export function answerFits(guide: Guide, stepId: string, answer: string): string | null {
  const step = guide.states[stepId];
  if (!step) return `step "${stepId}" is not in this guide version`;
  if (answer === "BACK") return null;
  const allowed: readonly string[] = ANSWERS_BY_KIND[step.meta.kind];
  if (!allowed.includes(answer)) {
    return allowed.length ? `a ${step.meta.kind} step takes ${allowed.join(" or ")}, not ${answer}` : `step "${stepId}" is an end and takes no answers`;
  }
  return null;
}

/**
 * The steps a walk-through has visited, by replaying its answers in `seq` order on the
 * guide's machine (or the phone's lookup of it); BACK undoes the answer before it. The last
 * step is where the crew is.
 */
export function replayWalk(steps: Stepper, answers: WalkAnswer[]): string[] {
  return replayFrom(
    steps,
    [steps.initial],
    [...answers].sort((x, y) => x.seq - y.seq),
  );
}

/** Goes on from a path already replayed with answers that come after it (in order): an answer costs one step, not the whole walk. */
export function replayFrom(steps: Stepper, from: string[], answers: WalkAnswer[]): string[] {
  const path = [...from];
  for (const a of answers) {
    if (a.answer === "BACK") {
      if (path.length > 1) path.pop();
      continue;
    }
    const here = path[path.length - 1];
    if (a.stepId !== here) continue; // an answer for another step (e.g. sent twice) moves nothing
    const to = steps.next(here, a.answer);
    if (to !== here) path.push(to);
  }
  return path;
}
