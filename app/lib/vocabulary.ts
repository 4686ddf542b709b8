/**
 * Tankside's one vocabulary: the answers a crew gives, the outcomes of a case and the statuses of
 * a guide version, each with the words people read. Buttons, case pages, e-mails, CSV, the desk,
 * zod schemas and the database enums all take them from here.
 */

/** Every answer a walk-through stores; BACK undoes the one before it. */
export const ANSWERS = ["YES", "NO", "DONE", "CANT", "ACK", "BACK"] as const;
export type Answer = (typeof ANSWERS)[number];

/** The answers a guide step can take (BACK is the walk's, not a step's). */
export const STEP_ANSWERS = ["YES", "NO", "DONE", "CANT", "ACK"] as const;
export type StepAnswer = (typeof STEP_ANSWERS)[number];

/** Which answers each step kind takes, in the order they are offered; final kinds take none. */
export const ANSWERS_BY_KIND = {
  check: ["YES", "NO"],
  task: ["DONE", "CANT"],
  safety: ["ACK"],
  fixed: [],
  handoff: [],
} as const satisfies Record<string, readonly StepAnswer[]>;

/** One label for each answer, wherever it is shown: button, case page, e-mail, CSV, desk. */
export const ANSWER_LABELS: Record<Answer, string> = {
  YES: "Yes",
  NO: "No",
  DONE: "Done",
  CANT: "Can't do it",
  ACK: "Machine is shut down and locked out",
  BACK: "Went back a step",
};

/** The mark beside each answer, so Yes and No differ in more than their place and colour. */
export const ANSWER_MARKS: Record<Answer, string> = { YES: "✓", NO: "✕", DONE: "✓", CANT: "✕", ACK: "■", BACK: "↩" };

export const answerLabel = (answer: string) => ANSWER_LABELS[answer as Answer] ?? answer;

export const OUTCOMES = ["open", "fixed", "handoff", "abandoned"] as const;
export type Outcome = (typeof OUTCOMES)[number];
/** The outcomes a close may set. */
export const CLOSE_OUTCOMES = ["fixed", "handoff", "abandoned"] as const;
export type CloseOutcome = (typeof CLOSE_OUTCOMES)[number];
export const OUTCOME_LABELS: Record<Outcome, string> = { open: "Open", fixed: "Fixed", handoff: "Handed off", abandoned: "Abandoned" };
export const outcomeLabel = (outcome: string) => OUTCOME_LABELS[outcome as Outcome] ?? outcome;

/** A case is a fix (a guide walked for a fault) or a rig card (a routine walked); only fixes are faults. */
export const CASE_KINDS = ["fix", "card"] as const;
export type CaseKind = (typeof CASE_KINDS)[number];
/** A card's ends read as the routine's state: its "fixed" end is the card complete, its hand-off the rig not ready. */
export const CARD_OUTCOME_LABELS: Record<Outcome, string> = { open: "Under way", fixed: "Complete", handoff: "Rig not ready", abandoned: "Stopped part-way" };
/** A closed card with every item done; one with items answered "can't do it" is complete with gaps. */
export function cardStateLabel(outcome: Outcome, gaps: number | null): string {
  if (outcome === "fixed" && gaps) return `Complete with ${gaps} item${gaps === 1 ? "" : "s"} not done`;
  return CARD_OUTCOME_LABELS[outcome];
}
/** The outcome's words for either kind of case. */
export const caseOutcomeLabel = (kind: CaseKind, outcome: Outcome, gaps: number | null = null) =>
  kind === "card" ? cardStateLabel(outcome, gaps) : outcomeLabel(outcome);

export const VERSION_STATUSES = ["draft", "in_review", "published", "retired"] as const;
export type VersionStatus = (typeof VERSION_STATUSES)[number];
export const STATUS_LABELS: Record<VersionStatus, string> = { draft: "Draft", in_review: "In review", published: "Published", retired: "Retired" };
export const statusLabel = (status: string) => STATUS_LABELS[status as VersionStatus] ?? status;

/** Whether a case's cause was found (a fixed end) or suspected by the crew at a hand-off; null with no cause. */
export const causeBasis = (outcome: Outcome, causeCode: string | null): "found" | "suspected" | null =>
  causeCode === null ? null : outcome === "handoff" ? "suspected" : "found";
