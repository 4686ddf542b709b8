/**
 * The rig cards in the demo history: each working day a rig may get its pre-start (read at the
 * day's first start) and its shut-down clean-out (read at the end), Mondays its weekly service.
 * How often each rig's crew does them is invented for the demo (`care` in demo-fleet.ts), so the
 * board has a pattern to find: CF-03's crews often skip the pre-start, its lubricator goes uncharged,
 * and it leaks at the pump shaft far more than the rest (association in the demo by construction).
 */
import { randomUUID } from "node:crypto";
import type { CreationAttributes } from "sequelize";
import type { Guide } from "../app/lib/guides/schema";
import { affirms, cardGaps } from "../app/lib/walk/held-answers";
import type { Answer } from "../app/lib/vocabulary";
import type { Case, CaseEvent, ServiceRecord } from "../db/index";
import type { seededRandom } from "./random";

export interface DemoCardSink {
  cases: CreationAttributes<Case>[];
  events: CreationAttributes<CaseEvent>[];
  services: CreationAttributes<ServiceRecord>[];
}

type Random = ReturnType<typeof seededRandom>;
export interface DemoCard {
  versionId: number;
  definition: Guide;
}

/** Walks a card from its first step, answering each step as `choose` says, to its end. */
export function walkCard(card: Guide, choose: (stepId: string) => Answer): { steps: string[]; answers: Answer[] } {
  const steps = [card.initial];
  const answers: Answer[] = [];
  for (let id = card.initial; !card.states[id].type;) {
    const answer = choose(id);
    const next = card.states[id].on?.[answer as "YES"];
    if (!next) throw new Error(`${card.id}: ${id} takes no ${answer}`);
    answers.push(answer);
    steps.push(next);
    id = next;
  }
  return { steps, answers };
}

/** The usual answer for a step's kind: the item is so, or done. */
const usual = (card: Guide, id: string): Answer => ({ check: "YES", task: "DONE", safety: "ACK" })[card.states[id].meta.kind as "check"] as Answer;

/**
 * Saves one card walked: its case (hours read at the start), its answers spaced by each step's
 * minutes, and a service record for each item done that a rule of the rig names.
 */
export function saveCard(
  sink: DemoCardSink,
  random: Random,
  card: DemoCard,
  at: {
    companyId: number;
    rigId: number;
    openedBy: number;
    start: number;
    hours: number | null;
    rules: { id: number; task: string | null }[];
    jobId: number | null;
  },
  choose: (stepId: string) => Answer | undefined = () => undefined,
): { answers: { stepId: string; answer: Answer }[] } {
  const def = card.definition;
  const walked = walkCard(def, (id) => choose(id) ?? usual(def, id));
  const id = randomUUID();
  let t = at.start;
  const held = walked.answers.map((answer, i) => {
    t += Math.max(15_000, (def.states[walked.steps[i]].meta.minutes ?? 1) * 60_000 * (0.4 + 0.6 * random.next()));
    const e = { id: randomUUID(), caseId: id, seq: i + 1, stepId: walked.steps[i], answer, at: new Date(t), note: null };
    sink.events.push(e);
    return e;
  });
  const end = walked.steps[walked.steps.length - 1];
  const outcome = def.states[end].meta.kind as "fixed" | "handoff";
  const firstAck = held.find((e) => e.answer === "ACK")?.at ?? null;
  sink.cases.push({
    id,
    kind: "card",
    companyId: at.companyId,
    rigId: at.rigId,
    guideVersionId: card.versionId,
    openedBy: at.openedBy,
    openedAt: new Date(at.start),
    closedAt: new Date(t + 30_000),
    engineHours: at.hours,
    outcome,
    finalStep: end,
    causeCode: null,
    safetyAckAt: firstAck,
    note: null,
    cardGaps: cardGaps(held.map((e) => ({ ...e, at: e.at.toISOString() }))),
    jobId: at.jobId,
    handoffResolvedAt: outcome === "handoff" ? new Date(t + 3_600_000) : null,
  });
  for (const e of held) {
    const task = def.states[e.stepId].meta.service;
    if (!task || !affirms(e.answer)) continue;
    for (const rule of at.rules.filter((r) => r.task === task))
      sink.services.push({
        companyId: at.companyId,
        rigId: at.rigId,
        ruleId: rule.id,
        doneAt: e.at,
        engineHours: at.hours,
        doneBy: at.openedBy,
        note: null,
        caseId: id,
      });
  }
  return { answers: held.map((e) => ({ stepId: e.stepId, answer: e.answer })) };
}
