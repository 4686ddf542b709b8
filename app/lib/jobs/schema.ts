import { z } from "zod";
import { MATERIAL_KINDS } from "../field-math/load-rules";

/** A calendar day as forms send it (YYYY-MM-DD), in the company's own calendar. */
const day = (what: string) =>
  z
    .string({ error: `Give the ${what} as a date.` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `Give the ${what} as a date (YYYY-MM-DD).`)
    .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s), `The ${what} is not a real date.`);

/** A figure that may be left blank (blank is "not known"). */
const optionalFigure = (schema: z.ZodNumber) =>
  schema
    .nullable()
    .optional()
    .transform((v) => v ?? null);

/** One material of the job's spec, at its rate per acre: what the load card is filled from. */
export const jobMaterialSchema = z.object({
  name: z.string({ error: "Name the material." }).trim().min(1, "Name the material.").max(60, "Keep the material's name under 60 characters."),
  lbPerAcre: z
    .number({ error: "Give the rate in lb per acre." })
    .gt(0, "The rate must be more than 0 lb per acre.")
    .max(10_000, "Over 10,000 lb per acre is not a hydroseeding rate."),
  kind: z.enum(MATERIAL_KINDS, { error: `Choose what it is: ${MATERIAL_KINDS.join(", ")}.` }),
  bagLb: optionalFigure(
    z.number({ error: "Give the bag size in lb, or leave it blank." }).gt(0, "A bag must weigh more than 0 lb.").max(2000, "Over 2,000 lb is not a bag."),
  ),
});
export type JobMaterial = z.infer<typeof jobMaterialSchema>;

/** The one definition of a job's editable fields: the form, the server and the seeds use it. */
export const jobInputSchema = z
  .object({
    name: z.string({ error: "Name the site." }).trim().min(1, "Name the site.").max(120, "Keep the site's name under 120 characters."),
    customer: z.string({ error: "Name the customer." }).trim().min(1, "Name the customer.").max(120, "Keep the customer's name under 120 characters."),
    address: z.string().trim().max(300, "Keep the address under 300 characters.").optional(),
    latitude: optionalFigure(
      z
        .number({ error: "Give the latitude in decimal degrees, or leave it blank." })
        .min(-90, "Latitude runs from −90 to 90.")
        .max(90, "Latitude runs from −90 to 90."),
    ),
    longitude: optionalFigure(
      z
        .number({ error: "Give the longitude in decimal degrees, or leave it blank." })
        .min(-180, "Longitude runs from −180 to 180.")
        .max(180, "Longitude runs from −180 to 180."),
    ),
    elevationFt: optionalFigure(
      z
        .number({ error: "Give the site's elevation in feet, or leave it blank." })
        .int("Elevation is a whole number of feet.")
        .min(-300, "Elevation below −300 ft is not plausible.")
        .max(14_000, "Elevation above 14,000 ft is not plausible."),
    ),
    areaAcres: z
      .number({ error: "Give the area to cover in acres." })
      .gt(0, "The area must be more than 0 acres.")
      .max(10_000, "Over 10,000 acres is not one job."),
    passes: z
      .number({ error: "Give how many passes cover the area (1 if one)." })
      .int("Passes are a whole number.")
      .min(1, "At least one pass.")
      .max(5, "More than 5 passes is not plausible."),
    waterGalPerAcre: optionalFigure(
      z
        .number({ error: "Give the water per acre in US gallons, or leave it blank." })
        .gt(0, "Water per acre must be more than 0.")
        .max(20_000, "Over 20,000 gal per acre is not plausible."),
    ),
    materials: z
      .array(jobMaterialSchema, { error: "Add the spec's materials." })
      .min(1, "Add at least one material to the spec.")
      .max(12, "At most 12 materials."),
    startsOn: day("start date"),
    endsOn: day("end date").optional(),
    notes: z.string().trim().max(1000, "Keep notes under 1,000 characters.").optional(),
  })
  .superRefine((job, ctx) => {
    if ((job.latitude === null) !== (job.longitude === null))
      ctx.addIssue({ code: "custom", path: [job.latitude === null ? "latitude" : "longitude"], message: "Give both latitude and longitude, or neither." });
    if (job.endsOn && job.endsOn < job.startsOn) ctx.addIssue({ code: "custom", path: ["endsOn"], message: "The end date is before the start date." });
    if (!job.materials.some((m) => m.kind === "fiber") && job.waterGalPerAcre === null)
      ctx.addIssue({
        code: "custom",
        path: ["waterGalPerAcre"],
        message: "Give the water per acre, or mark one material as fiber mulch, so loads can be sized.",
      });
  });
export type JobInput = z.infer<typeof jobInputSchema>;

/** The longest run of days one plan form may set at once. */
export const PLAN_MAX_DAYS = 62;

/**
 * Who and what is on the job, day by day: the same rigs and people on every day from `from` to
 * `to`. Nothing ticked clears those days.
 */
export const jobPlanSchema = z
  .object({
    from: day("first day"),
    to: day("last day").optional(),
    rigs: z.array(z.string().trim().toUpperCase().max(16)).max(50).default([]),
    people: z.array(z.coerce.number().int().positive()).max(100).default([]),
  })
  .superRefine((plan, ctx) => {
    const to = plan.to ?? plan.from;
    if (to < plan.from) ctx.addIssue({ code: "custom", path: ["to"], message: "The last day is before the first day." });
    else if (planDays(plan.from, to).length > PLAN_MAX_DAYS)
      ctx.addIssue({ code: "custom", path: ["to"], message: `Plan at most ${PLAN_MAX_DAYS} days at once.` });
  });
export type JobPlanInput = z.infer<typeof jobPlanSchema>;

/** Every calendar day from `from` to `to`, both included (YYYY-MM-DD). */
export function planDays(from: string, to: string): string[] {
  const days: string[] = [];
  for (let t = Date.parse(`${from}T00:00:00Z`); t <= Date.parse(`${to}T00:00:00Z`) && days.length <= PLAN_MAX_DAYS; t += 86_400_000)
    days.push(new Date(t).toISOString().slice(0, 10));
  return days;
}

/** One load sprayed on a job, as the phone sends it (its own id: a resend is stored once). */
export const jobLoadSchema = z.object({
  id: z.uuid("The load's id must be a UUID."),
  rigCode: z.string().trim().toUpperCase().max(16).optional(),
  sprayedAt: z.iso.datetime({ offset: true, error: "Give when it was sprayed as an ISO time." }),
  areaSqFt: z
    .number({ error: "Give the area the load covered, in ft²." })
    .gt(0, "The area must be more than 0 ft².")
    .max(4_356_000, "Over 100 acres is not one load."),
  waterGal: z
    .number({ error: "Give the water in the load, in US gallons." })
    .gt(0, "The water must be more than 0 gal.")
    .max(6000, "Over 6,000 gal is not one load."),
});
export type JobLoadInput = z.infer<typeof jobLoadSchema>;
