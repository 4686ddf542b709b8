import { SQFT_PER_ACRE } from "../field-math/units";

/** What has happened on a job so far, as the database sums it. */
export interface JobTotals {
  /** Loads sprayed, and the area and water they covered. */
  loads: number;
  areaSqFt: number;
  waterGal: number;
  /** Fixes walked on the job (faults), and the time from start to close of those closed. */
  fixes: number;
  downtimeSeconds: number;
  /** Hand-offs on the job nobody has marked dealt with. */
  openHandoffs: number;
  /** Rig cards walked on the job. */
  cards: number;
}

export interface JobProgress extends JobTotals {
  /** Area × passes: what the spec covers in all. */
  targetAcres: number;
  sprayedAcres: number;
  remainingAcres: number;
  /** Share of the target sprayed, 0–100 (over 100 when more was sprayed than the spec). */
  percent: number;
  downtimeHours: number;
}

/** A job's progress from its size and its totals: the area left is the load card's "area to cover". */
export function jobProgress(job: { areaAcres: number; passes: number }, totals: JobTotals): JobProgress {
  const targetAcres = job.areaAcres * job.passes;
  const sprayedAcres = totals.areaSqFt / SQFT_PER_ACRE;
  return {
    ...totals,
    targetAcres,
    sprayedAcres,
    remainingAcres: Math.max(0, targetAcres - sprayedAcres),
    percent: targetAcres > 0 ? (100 * sprayedAcres) / targetAcres : 0,
    downtimeHours: totals.downtimeSeconds / 3600,
  };
}

export const NO_TOTALS: JobTotals = { loads: 0, areaSqFt: 0, waterGal: 0, fixes: 0, downtimeSeconds: 0, openHandoffs: 0, cards: 0 };
