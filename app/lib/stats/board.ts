import { pareto, type CauseAggregate, type ParetoRow } from "./pareto";
import { byWeight, type RepeatChain } from "./repeats";
import { rigFigures, type RigAggregate, type RigFigures } from "./reliability";

/** The aggregates SQL produces for one company and window; the board is computed from these alone. */
export interface BoardAggregates {
  rigs: RigAggregate[];
  causes: CauseAggregate[];
  /** Chains of the same cause on the same rig within the repeat window (SQL finds them). */
  repeatChains: RepeatChain[];
  weeks: { weekStart: string; cases: number; handoffs: number }[];
  people: { name: string; cases: number; handoffs: number; guides: { title: string; count: number }[]; causes: { cause: string; count: number }[] }[];
  openHandoffs: { caseId: string; rigCode: string; guideTitle: string; openedAt: string; openedBy: string | null }[];
}

export interface Board {
  rigs: RigFigures[];
  fleet: { cases: number; failures: number; operatingHours: number; downtimeHours: number; mtbfHours: number | null; mttrHours: number | null };
  pareto: ParetoRow[];
  repeats: RepeatChain[];
  weeks: BoardAggregates["weeks"];
  people: (BoardAggregates["people"][number] & { handoffRate: number })[];
  openHandoffs: BoardAggregates["openHandoffs"];
}

export function buildBoard(a: BoardAggregates): Board {
  const rigs = rigFigures(a.rigs);
  const failures = rigs.reduce((s, r) => s + r.failures, 0);
  const operatingHours = rigs.reduce((s, r) => s + (r.operatingHours ?? 0), 0);
  const meteredFailures = rigs.filter((r) => r.operatingHours).reduce((s, r) => s + r.failures, 0);
  const downtimeHours = rigs.reduce((s, r) => s + r.repairHours, 0);
  const closed = rigs.reduce((s, r) => s + r.closedCases, 0);
  return {
    rigs,
    fleet: {
      cases: rigs.reduce((s, r) => s + r.cases, 0),
      failures,
      operatingHours,
      downtimeHours,
      mtbfHours: meteredFailures ? operatingHours / meteredFailures : null,
      mttrHours: closed ? downtimeHours / closed : null,
    },
    pareto: pareto(a.causes),
    repeats: [...a.repeatChains].sort(byWeight),
    weeks: a.weeks,
    people: a.people.map((p) => ({ ...p, handoffRate: p.cases ? p.handoffs / p.cases : 0 })),
    openHandoffs: a.openHandoffs,
  };
}
