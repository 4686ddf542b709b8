import type { Answer } from "../vocabulary";

/** One answer as stored or kept: which step, what, when. */
export interface HeldAnswer {
  stepId: string;
  answer: Answer;
  at: string;
}

/**
 * The answers a walk still stands by, in order: "went back a step" takes back the answer
 * before it (so an item answered, undone and answered again counts once, as last answered).
 */
export function heldAnswers<T extends HeldAnswer>(events: readonly T[]): T[] {
  const held: T[] = [];
  for (const e of events) {
    if (e.answer === "BACK") held.pop();
    else held.push(e);
  }
  return held;
}

/** Items of a card answered "can't do it" among the answers it stands by: a complete card has none. */
export const cardGaps = (events: readonly HeldAnswer[]) => heldAnswers(events).filter((e) => e.answer === "CANT").length;

/** Whether an answer says the item is so: yes to a check, done to a task. */
export const affirms = (answer: Answer) => answer === "YES" || answer === "DONE";
