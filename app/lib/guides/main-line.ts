import { reachable } from "./graph";
import { ANSWERS_BY_KIND } from "../vocabulary";
import type { Guide } from "./schema";

export interface LineCheck {
  stepId: string;
  /** The safety stop in front of this check, which moves with it. */
  guard: string | null;
  minutes: number;
  /** Causes this check's branch finds (and the checks after it do not). */
  causes: string[];
}

// Causes found at fixed ends only: a hand-off's cause is suspected, not found by a check.
const causesFrom = (guide: Guide, from: string) =>
  new Set(
    [...reachable(guide, from)]
      .filter((id) => guide.states[id].meta.kind === "fixed")
      .map((id) => guide.states[id].meta.cause)
      .filter((c): c is string => !!c),
  );

/**
 * The guide's main line: the checks a crew passes while the fault is still not found. At each
 * step, the answer whose branch can find causes the other cannot is where this check finds
 * them; the other answer is the way on. (A fix branch that fails usually rejoins the line, so
 * its own causes are the ones the way on cannot reach.) When both branches find causes of
 * their own, the one with more stays the way on, and on a tie the second answer (NO, CAN'T).
 */
export function mainLine(guide: Guide): LineCheck[] {
  const line: LineCheck[] = [];
  const seen = new Set<string>();
  let guard: { id: string; minutes: number } | null = null;
  let at: string | undefined = guide.initial;
  while (at && !seen.has(at)) {
    seen.add(at);
    const step: Guide["states"][string] = guide.states[at];
    const events = ANSWERS_BY_KIND[step.meta.kind] as readonly string[];
    if (events.length === 0) break;
    if (step.meta.kind === "safety") {
      guard = { id: at, minutes: step.meta.minutes ?? 0 };
      at = step.on?.ACK;
      continue;
    }
    const [a, b] = events.map((e) => step.on?.[e as "YES"]).filter((t): t is string => !!t);
    if (!a || !b) break;
    const ca = causesFrom(guide, a);
    const cb = causesFrom(guide, b);
    const onlyA = [...ca].filter((c) => !cb.has(c));
    const onlyB = [...cb].filter((c) => !ca.has(c));
    const bIsWayOn = onlyB.length === 0 || (onlyA.length > 0 && onlyB.length >= onlyA.length);
    const [causes, on] = bIsWayOn ? [onlyA, b] : [onlyB, a];
    line.push({ stepId: at, guard: guard?.id ?? null, minutes: (step.meta.minutes ?? 0) + (guard?.minutes ?? 0), causes });
    guard = null;
    at = on;
  }
  return line.filter((c) => c.causes.length > 0);
}
