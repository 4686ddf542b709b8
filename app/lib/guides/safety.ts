import { edges } from "./graph";
import type { Guide, StepMeta } from "./schema";

/**
 * The safety model the checker enforces (domain: "Safety"). A safety step is a shut-down stop
 * with a checklist of what it isolates; a step that puts energy back ends every stop before it;
 * a hands-on step needs, on every path that reaches it, a stop since the last restart that
 * covers each hazard it names. Words follow OSHA 29 CFR 1910.147's energy-control idea; the
 * employer's procedure and the maker's manual come first.
 */

/** What a shut-down stop can isolate, in the order the crew does it. */
export const CHECKLIST_ITEMS = [
  "clutch-out",
  "engine-off-key-out",
  "moving-parts-stopped",
  "pressure-relieved",
  "hot-parts-cooled",
  "controls-tagged",
  "suction-closed",
  "hydraulics-relieved",
] as const;
export type ChecklistItem = (typeof CHECKLIST_ITEMS)[number];

/** The lines the crew reads on a stop. */
export const CHECKLIST_LABELS: Record<ChecklistItem, string> = {
  "clutch-out": "Pump clutch out (disengaged).",
  "engine-off-key-out": "Engine off, key out and in your pocket.",
  "moving-parts-stopped": "Agitator and pump have stopped turning.",
  "pressure-relieved": "Pressure let off the pump and hose, away from people.",
  "hot-parts-cooled": "Hot parts (engine, exhaust, pump casing) have cooled.",
  "controls-tagged": "Controls tagged so nobody starts the rig.",
  "suction-closed": "Suction valve closed, or the tank run down below this part.",
  "hydraulics-relieved": "Hydraulic pressure let off: agitator control worked both ways with the engine off.",
};

/** A stop with no checklist means these: older guide files stay valid. */
export const STANDARD_STOP: readonly ChecklistItem[] = ["clutch-out", "engine-off-key-out", "moving-parts-stopped", "pressure-relieved", "controls-tagged"];

/** No stop may leave these out: without them nothing is shut down. */
export const CORE_STOP: readonly ChecklistItem[] = ["clutch-out", "engine-off-key-out", "moving-parts-stopped"];

/** What a hands-on step may name as its hazards, and the checklist item that must be in force for each. */
export const HAZARDS = ["wet-side", "trapped-pressure", "hot-parts", "hydraulic-line"] as const;
export type Hazard = (typeof HAZARDS)[number];

export const HAZARD_NEEDS: Record<Hazard, { item: ChecklistItem; words: string }> = {
  "wet-side": { item: "suction-closed", words: "opens the wet side (pump, take-off, suction piping, clamp or drain with slurry behind it)" },
  "trapped-pressure": { item: "pressure-relieved", words: "opens a line that can hold pressure behind a plug" },
  "hot-parts": { item: "hot-parts-cooled", words: "puts hands on parts that run hot" },
  "hydraulic-line": { item: "hydraulics-relieved", words: "opens a hydraulic hose or fitting" },
};

// Words that put energy back: the checker does not trust an unticked box on a step that says them.
const SOUNDS_ENERGIZING = /\b(restart|start the engine|engage the (pump|clutch)|switch the (pump )?clutch on|run (it|the pump|the agitator)|refill and run)\b/i;

/** Whether a step's prompt says it puts energy back (restart, run, engage) — then it must be marked `energizes`. */
export const soundsEnergizing = (prompt: string) => SOUNDS_ENERGIZING.test(prompt);

/** What a stop isolates: its own checklist, or the standard five when it lists none. */
export const checklistOf = (meta: Pick<StepMeta, "checklist">): readonly ChecklistItem[] => {
  const listed = Array.isArray(meta.checklist) ? meta.checklist.filter((i): i is ChecklistItem => CHECKLIST_ITEMS.includes(i)) : [];
  return listed.length ? listed : STANDARD_STOP;
};

const hazardsOf = (step: Guide["states"][string]): Hazard[] =>
  Array.isArray(step.meta.hazards) ? step.meta.hazards.filter((h): h is Hazard => HAZARDS.includes(h)) : [];

export interface SafetyFinding {
  step: string;
  message: string;
}

type InForce = Set<ChecklistItem>;

/**
 * For each reachable step, what is isolated on arrival on *every* path that reaches it (a must-analysis:
 * the meet of two paths is what both have). A stop adds its checklist; a step that puts energy back
 * clears everything.
 */
export function isolationOnArrival(guide: Guide): Map<string, InForce> {
  const next = edges(guide);
  const exit = (id: string, arrival: InForce): InForce => {
    const step = guide.states[id];
    if (step.meta.kind === "safety") return new Set([...arrival, ...checklistOf(step.meta)]);
    if (step.meta.energizes) return new Set();
    return arrival;
  };
  const arrival = new Map<string, InForce>();
  if (!(guide.initial in guide.states)) return arrival;
  arrival.set(guide.initial, new Set());
  const queue = [guide.initial];
  while (queue.length) {
    const id = queue.shift()!;
    const out = exit(id, arrival.get(id)!);
    for (const t of next.get(id) ?? []) {
      const before = arrival.get(t);
      const met = before ? new Set([...before].filter((i) => out.has(i))) : new Set(out);
      if (!before || met.size !== before.size) {
        arrival.set(t, met);
        queue.push(t);
      }
    }
  }
  return arrival;
}

/** A step that puts energy back from which `target` can be reached without passing a stop (to name it in a message). */
function restartBefore(guide: Guide, target: string): string | null {
  const back = new Map<string, string[]>();
  for (const [from, targets] of edges(guide)) for (const t of targets) back.set(t, [...(back.get(t) ?? []), from]);
  const seen = new Set([target]);
  const queue = [...(back.get(target) ?? [])];
  while (queue.length) {
    const id = queue.shift()!;
    if (seen.has(id)) continue;
    seen.add(id);
    const step = guide.states[id];
    if (step.meta.kind === "safety") continue;
    if (step.meta.energizes) return id;
    queue.push(...(back.get(id) ?? []));
  }
  return null;
}

const words = (items: readonly ChecklistItem[]) => items.map((i) => CHECKLIST_LABELS[i].replace(/\.$/, "").toLowerCase()).join("; ");

/** Hands-on steps not covered by a stop on every path, or whose hazards the stop does not cover. */
export function unguardedSteps(guide: Guide): SafetyFinding[] {
  const arrival = isolationOnArrival(guide);
  const out: SafetyFinding[] = [];
  for (const [id, inForce] of arrival) {
    const step = guide.states[id];
    if (!step.meta.handsOn || step.meta.kind === "safety") continue;
    const missing = STANDARD_STOP.filter((i) => !inForce.has(i));
    if (missing.length) {
      const restart = restartBefore(guide, id);
      out.push({
        step: id,
        message: restart
          ? `is hands-on but step "${restart}" puts energy back and no safety step comes after it on the way here`
          : "is hands-on but can be reached without passing a safety step",
      });
      continue;
    }
    for (const hazard of hazardsOf(step)) {
      const need = HAZARD_NEEDS[hazard];
      if (!inForce.has(need.item)) out.push({ step: id, message: `${need.words}, but the safety step before it does not cover: ${words([need.item])}` });
    }
  }
  return out;
}

/**
 * Energizing steps reached after hands-on work with no return-to-service step in between
 * (tips, plugs, gaskets and guards back on, people clear of the stream). A warning: the
 * trainer may have a reason, but the crew should be told.
 */
export function restartsWithoutReturnToService(guide: Guide): SafetyFinding[] {
  const next = edges(guide);
  // May-analysis: true if *some* path arrives with hands-on work not yet put back together.
  const open = new Map<string, boolean>();
  if (!(guide.initial in guide.states)) return [];
  open.set(guide.initial, false);
  const queue = [guide.initial];
  while (queue.length) {
    const id = queue.shift()!;
    const step = guide.states[id];
    const after = step.meta.returnsToService ? false : open.get(id)! || !!step.meta.handsOn;
    for (const t of next.get(id) ?? []) {
      if (open.get(t) === undefined || (after && !open.get(t))) {
        open.set(t, (open.get(t) ?? false) || after);
        queue.push(t);
      }
    }
  }
  return [...open]
    .filter(([id, dirty]) => dirty && guide.states[id].meta.energizes)
    .map(([id]) => ({
      step: id,
      message:
        "puts energy back after hands-on work with no return-to-service step first (tips, plugs, gaskets and guards back on; everyone clear of the stream)",
    }));
}

const INSIDE_TANK = /\b(climb|get|step|go|crawl)\s+(in|into|inside)\s+(the\s+)?tank\b|\benter\s+the\s+tank\b/i;

/**
 * Words that send someone inside a tank (a confined space with paddles): guides reach in from outside or
 * send it to the shop. A sentence that forbids it ("never climb into the tank") is the guide doing its job.
 */
export function sendsInsideTank(text: string): boolean {
  return text.split(/(?<=[.!?])\s+|\n+/).some((sentence) => INSIDE_TANK.test(sentence) && !/\b(never|not|don't|no one|nobody)\b/i.test(sentence));
}
