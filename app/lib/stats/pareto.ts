export interface CauseAggregate {
  cause: string;
  count: number;
  /** Of `count`, the cases handed off with this cause suspected, not found (0 when not known). */
  suspected?: number;
  downtimeHours: number;
}

export interface ParetoRow extends CauseAggregate {
  share: number;
  cumulativeShare: number;
  downtimeShare: number;
}

/** Causes, most frequent first, with each one's share and the running share (ends at 1). */
export function pareto(rows: CauseAggregate[]): ParetoRow[] {
  const total = rows.reduce((s, r) => s + r.count, 0);
  const downtime = rows.reduce((s, r) => s + r.downtimeHours, 0);
  let running = 0;
  return [...rows]
    .sort((a, b) => b.count - a.count || b.downtimeHours - a.downtimeHours || a.cause.localeCompare(b.cause))
    .map((r) => {
      running += r.count;
      return {
        ...r,
        share: total ? r.count / total : 0,
        cumulativeShare: total ? running / total : 0,
        downtimeShare: downtime ? r.downtimeHours / downtime : 0,
      };
    });
}
