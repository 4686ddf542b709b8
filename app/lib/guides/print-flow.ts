import { ANSWERS_BY_KIND, type StepAnswer } from "../vocabulary";
import { fillRigWords } from "./rig-words";
import { checklistOf, type ChecklistItem } from "./safety";
import type { Guide, StepKind } from "./schema";

/** One box of the printed flow: a step, numbered in reading order, with where each answer goes. */
export interface PrintBox {
  n: number;
  id: string;
  kind: StepKind;
  text: string;
  minutes?: number;
  handsOn: boolean;
  /** On a stop: what it isolates (the crew ticks each). */
  checklist: ChecklistItem[];
  /** Each answer and the box it leads to. */
  answers: { answer: StepAnswer; to: number }[];
  /** On an end: the cause's name (a hand-off's is what the crew suspects). */
  cause?: string;
}

/** Guide markdown as one plain line for paper: emphasis, code and link marks off, list items joined. */
export function plainText(markdown: string): string {
  return markdown
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, "$1")
    .replace(/[*_`~]+/g, "")
    .replace(/^\s*(?:[-+]|\d+[.)])\s+/gm, "• ")
    .replace(/^#+\s*/gm, "")
    .replace(/\s*\n+\s*/g, " ")
    .trim();
}

/**
 * The guide as numbered boxes for one printed page. The order is the reading order a crew follows:
 * depth first from the first step, the first answer's way (Yes, Done) before the other, so the
 * main line reads down the page and each branch follows the box it leaves from.
 */
export function printFlow(
  guide: Guide,
  causeNames: Record<string, string>,
  rig?: Parameters<typeof fillRigWords>[1],
  lang: Parameters<typeof fillRigWords>[2] = "en",
): PrintBox[] {
  const order: string[] = [];
  const seen = new Set<string>();
  const visit = (id: string) => {
    if (seen.has(id) || !(id in guide.states)) return;
    seen.add(id);
    order.push(id);
    const step = guide.states[id];
    for (const answer of ANSWERS_BY_KIND[step.meta.kind]) {
      const to = step.on?.[answer];
      if (to) visit(to);
    }
  };
  visit(guide.initial);
  const number = new Map(order.map((id, i) => [id, i + 1]));
  return order.map((id) => {
    const { meta, on } = guide.states[id];
    const answers = (ANSWERS_BY_KIND[meta.kind] as readonly StepAnswer[]).flatMap((answer) =>
      on?.[answer] && number.has(on[answer]) ? [{ answer, to: number.get(on[answer])! }] : [],
    );
    return {
      n: number.get(id)!,
      id,
      kind: meta.kind,
      text: plainText(fillRigWords(meta.prompt, rig, lang)),
      ...(meta.minutes ? { minutes: meta.minutes } : {}),
      handsOn: !!meta.handsOn,
      checklist: meta.kind === "safety" ? [...checklistOf(meta)] : [],
      answers,
      ...(meta.cause && causeNames[meta.cause] ? { cause: causeNames[meta.cause] } : {}),
    };
  });
}
