import { Job } from "../../db/index";
import type { JobInput } from "~/lib/jobs/schema";

/** A valid job's fields (invented site), for forms and for rows made directly. */
export const JOB_FIELDS: JobInput = {
  name: "Test slope north",
  customer: "County road department",
  address: "Mile 12, County Road 8",
  latitude: null,
  longitude: null,
  elevationFt: 7200,
  areaAcres: 4,
  passes: 1,
  waterGalPerAcre: null,
  materials: [
    { name: "Wood fiber mulch", lbPerAcre: 1500, kind: "fiber", bagLb: 50 },
    { name: "Seed mix", lbPerAcre: 120, kind: "seed", bagLb: 50 },
  ],
  startsOn: "2026-06-01",
  notes: undefined,
  endsOn: undefined,
};

/** A job made directly in the database for a company. */
export const makeJob = (companyId: number, change: Partial<JobInput> = {}) =>
  Job.create({ ...JOB_FIELDS, ...change, companyId, address: change.address ?? JOB_FIELDS.address ?? null, endsOn: change.endsOn ?? null, notes: null });
