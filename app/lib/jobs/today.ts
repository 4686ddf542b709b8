import { isoInZone } from "../format";
import type { JobMaterial } from "./schema";

/** A job as a phone keeps it: what the crew's screens, the suction check and the load card need. */
export interface JobSummary {
  id: number;
  name: string;
  customer: string;
  address: string | null;
  latitude: number | null;
  longitude: number | null;
  elevationFt: number | null;
  areaAcres: number;
  passes: number;
  waterGalPerAcre: number | null;
  materials: JobMaterial[];
  /** The spec's area still to spray when the summary was made (acres, all passes). */
  remainingAcres: number;
}

/** Who and what is on one job on one day (YYYY-MM-DD in the company's calendar). */
export interface PlanDay {
  day: string;
  jobId: number;
  rigCodes: string[];
  people: { id: number; name: string }[];
}

/** The job a rig, or a person, is on that day; a rig's plan wins over a person's. */
export function jobOn(plan: PlanDay[], day: string, who: { rigCode?: string | null; personId?: number | null }): number | null {
  const that = plan.filter((p) => p.day === day);
  const byRig = who.rigCode ? that.find((p) => p.rigCodes.includes(who.rigCode!)) : undefined;
  const byPerson = who.personId ? that.find((p) => p.people.some((x) => x.id === who.personId)) : undefined;
  return (byRig ?? byPerson)?.jobId ?? null;
}

/** Where a site is, in a line: the address, else the coordinates. */
export const siteLine = (job: Pick<JobSummary, "address" | "latitude" | "longitude">) =>
  job.address ?? (job.latitude !== null && job.longitude !== null ? `${job.latitude.toFixed(5)}, ${job.longitude.toFixed(5)}` : null);

/** The jobs a phone keeps: those planned over the coming week, and their plans. */
export interface KeptJobs {
  jobs: JobSummary[];
  plan: PlanDay[];
}

/** The job a rig (or else the person) is on at a time, from what the phone keeps: the walk and field math with no signal. */
export function keptJobAt(
  kept: KeptJobs | undefined,
  at: Date,
  timeZone: string,
  who: { rigCode?: string | null; personId?: number | null },
): JobSummary | null {
  if (!kept) return null;
  const id = jobOn(kept.plan, isoInZone(at, timeZone).slice(0, 10), who);
  return kept.jobs.find((j) => j.id === id) ?? null;
}

const monthYear = new Intl.DateTimeFormat("en-US", { month: "short", year: "numeric", timeZone: "UTC" });
/** A job's name with the month it started, "Route 9 widening cut slopes (Apr 2026)": a site worked again next season is told apart. */
export const jobLabel = (job: { name: string; startsOn: string }) => `${job.name} (${monthYear.format(new Date(`${job.startsOn}T00:00:00Z`))})`;
