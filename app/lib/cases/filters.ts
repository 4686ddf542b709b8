import { z } from "zod";
import { CASE_KINDS, OUTCOMES } from "../vocabulary";

const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "use a date like 2026-06-01");

export const CASE_SORTS = ["opened", "duration", "rig", "guide", "cause", "outcome", "person"] as const;

/** The cases table's query string (blank values already dropped: "All" means no filter): filters, sort and page. Unknown values are named, not ignored. */
export const caseFiltersSchema = z.object({
  /** Fixes (the faults) unless rig cards are asked for: the two are never mixed in one list. */
  kind: z.enum(CASE_KINDS, { error: `kind must be one of ${CASE_KINDS.join(", ")}` }).default("fix"),
  rig: z.string().trim().toUpperCase().max(16).optional(),
  guide: z.string().trim().max(80).optional(),
  cause: z.string().trim().max(60).optional(),
  outcome: z.enum(OUTCOMES, { error: `outcome must be one of ${OUTCOMES.join(", ")}` }).optional(),
  person: z.coerce.number().int().positive().optional(),
  job: z.coerce.number({ error: "job must be a job's number" }).int("job must be a job's number").positive("job must be a job's number").optional(),
  from: day.optional(),
  to: day.optional(),
  sort: z.enum(CASE_SORTS, { error: `sort must be one of ${CASE_SORTS.join(", ")}` }).default("opened"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  page: z.coerce.number({ error: "page must be a whole number" }).int("page must be a whole number").min(1, "page starts at 1").max(100_000).default(1),
});

export type CaseFilters = z.output<typeof caseFiltersSchema>;
export const PAGE_SIZE = 25;

/** The same filters as a query string, for links that keep them (sort, page, CSV). */
export function filtersToSearch(f: Partial<CaseFilters>, change: Partial<CaseFilters> = {}): string {
  const merged = { ...f, ...change };
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(merged)) if (v !== undefined && v !== "" && v !== null) params.set(k, String(v));
  return params.toString();
}
