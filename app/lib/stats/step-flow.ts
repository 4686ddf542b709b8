import { machineSteps, type GuideMachine } from "../guides/compile";
import { replayWalk } from "../walk/replay";

export interface FlowCase {
  outcome: string;
  finalStep: string | null;
  openedAt: string;
  events: { seq: number; stepId: string; answer: string; at: string }[];
}

export interface StepFlow {
  stepId: string;
  reached: number;
  answers: Record<string, number>;
  abandonedHere: number;
  endedHere: number;
  medianSeconds: number | null;
}

const median = (xs: number[]) => {
  if (!xs.length) return null;
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

/** How crews actually went through a guide: per step, how many got there, how they answered, where they stopped, and how long they took. */
export function stepFlow(machine: GuideMachine, stepIds: string[], cases: FlowCase[]): StepFlow[] {
  const flow = new Map<string, { reached: Set<number>; answers: Record<string, number>; abandonedHere: number; endedHere: number; times: number[] }>(
    stepIds.map((id) => [id, { reached: new Set(), answers: {}, abandonedHere: 0, endedHere: 0, times: [] }]),
  );
  cases.forEach((c, index) => {
    const events = [...c.events].sort((a, b) => a.seq - b.seq);
    let since = Date.parse(c.openedAt);
    for (const e of events) {
      const f = flow.get(e.stepId);
      if (!f) continue;
      f.reached.add(index);
      f.answers[e.answer] = (f.answers[e.answer] ?? 0) + 1;
      f.times.push(Math.max(0, (Date.parse(e.at) - since) / 1000));
      since = Date.parse(e.at);
    }
    const path = replayWalk(machineSteps(machine), events);
    const last = path[path.length - 1];
    const f = flow.get(last);
    if (!f) return;
    f.reached.add(index);
    if (c.outcome === "abandoned" || c.outcome === "open") f.abandonedHere += c.outcome === "abandoned" ? 1 : 0;
    else f.endedHere += 1;
  });
  return stepIds.map((stepId) => {
    const f = flow.get(stepId)!;
    return { stepId, reached: f.reached.size, answers: f.answers, abandonedHere: f.abandonedHere, endedHere: f.endedHere, medianSeconds: median(f.times) };
  });
}
