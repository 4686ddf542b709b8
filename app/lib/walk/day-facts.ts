import type { DayCheck } from "../guides/kinds";
import type { Guide } from "../guides/schema";
import type { StepAnswer } from "../vocabulary";
import { affirms, heldAnswers, type HeldAnswer } from "./held-answers";

/** What today's cards say about one fact of the day: so or not, when, by whom, on which card. */
export interface DayFact {
  value: boolean;
  at: string;
  by: string | null;
  card: string;
}
export type DayFacts = Partial<Record<DayCheck, DayFact>>;

/** One card walked today on the rig, as the server stores it or the phone keeps it. */
export interface CardWalked {
  title: string;
  definition: Guide;
  by: string | null;
  events: readonly HeldAnswer[];
}

/**
 * The facts today's cards establish: each item that carries a day fact, as answered and still
 * stood by (an answer taken back does not count); the latest answer of the day wins (a drain plug
 * found out at 7:01 and put in at 7:03 is in).
 */
export function dayFacts(cards: readonly CardWalked[]): DayFacts {
  const facts: DayFacts = {};
  for (const card of cards) {
    for (const e of heldAnswers(card.events)) {
      const key = card.definition.states[e.stepId]?.meta.dayCheck;
      if (!key) continue;
      const before = facts[key];
      if (!before || before.at <= e.at) facts[key] = { value: affirms(e.answer), at: e.at, by: card.by, card: card.title };
    }
  }
  return facts;
}

/** Two sets of facts (the server's and the phone's own, not yet sent): the later answer of each wins. */
export function mergeDayFacts(a: DayFacts, b: DayFacts): DayFacts {
  const out: DayFacts = { ...a };
  for (const [key, fact] of Object.entries(b) as [DayCheck, DayFact][]) {
    if (!out[key] || out[key].at <= fact.at) out[key] = fact;
  }
  return out;
}

/** The answer a guide's check is offered pre-selected from today's fact (the crew still taps it). */
export const suggestedAnswer = (fact: DayFact | undefined): StepAnswer | undefined => (fact ? (fact.value ? "YES" : "NO") : undefined);
