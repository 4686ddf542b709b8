import { poissonInterval } from "./chi-square";

/** One job's faults over the board's window, as SQL sums them. */
export interface JobAggregate {
  jobId: number;
  name: string;
  /** When it started (YYYY-MM-DD): a site worked again next season is told apart by it. */
  startsOn: string;
  elevationFt: number | null;
  closed: boolean;
  /** Rig-days planned on the job in the window: the exposure its faults are measured against. */
  rigDays: number;
  faults: number;
  downtimeSeconds: number;
  openHandoffs: number;
  /** The cause found or suspected most often on the job, and how often. */
  topCause: { code: string; count: number } | null;
}

export interface JobBoardRow extends JobAggregate {
  downtimeHours: number;
  /** Faults per 10 rig-days, with its exact Poisson (Garwood) 95 % range; null with no rig-days planned. */
  per10RigDays: number | null;
  range: { lower: number; upper: number } | null;
  /** The other jobs' rate, and whether this job's range lies wholly above it. */
  othersPer10RigDays: number | null;
  hardOnRigs: boolean;
}

/**
 * Faults per job beside per rig: a site that is hard on rigs (long hose runs, high lift, abrasive
 * product) shows a rate per rig-day above the other jobs', with a range that clears theirs.
 */
export function jobBoard(rows: JobAggregate[]): JobBoardRow[] {
  const all = { faults: rows.reduce((s, r) => s + r.faults, 0), rigDays: rows.reduce((s, r) => s + r.rigDays, 0) };
  return rows
    .map((r) => {
      const per10 = r.rigDays ? (10 * r.faults) / r.rigDays : null;
      const range = r.rigDays ? scale(poissonInterval(r.faults), 10 / r.rigDays) : null;
      const othersDays = all.rigDays - r.rigDays;
      const others = othersDays > 0 ? (10 * (all.faults - r.faults)) / othersDays : null;
      return {
        ...r,
        downtimeHours: r.downtimeSeconds / 3600,
        per10RigDays: per10,
        range,
        othersPer10RigDays: others,
        hardOnRigs: range !== null && others !== null && range.lower > others,
      };
    })
    .sort((a, b) => (b.per10RigDays ?? -1) - (a.per10RigDays ?? -1) || b.faults - a.faults);
}

const scale = (r: { lower: number; upper: number }, k: number) => ({ lower: r.lower * k, upper: r.upper * k });
