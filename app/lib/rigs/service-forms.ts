import { z } from "zod";
import { SERVICE_TASK_KEYS } from "../guides/kinds";

/** A company's rule for one rig: every so many engine hours, days, or whichever comes first. */
export const serviceRuleSchema = z
  .object({
    name: z.string({ error: "Name the service." }).trim().min(1, "Name the service.").max(80, "Keep the name under 80 characters."),
    everyHours: z
      .number({ error: "Give the engine hours between services, or leave it blank." })
      .min(1, "At least 1 engine hour between services.")
      .max(5000, "Over 5,000 engine hours between services is not plausible.")
      .nullable()
      .optional()
      .transform((v) => v ?? null),
    everyDays: z
      .number({ error: "Give the days between services, or leave it blank." })
      .int("Give whole days.")
      .min(1, "At least 1 day between services.")
      .max(730, "Over two years between services is not plausible.")
      .nullable()
      .optional()
      .transform((v) => v ?? null),
    /** The card task that also records it (blank: by hand only). */
    task: z
      .enum(SERVICE_TASK_KEYS, { error: "Pick a card task from the list, or none." })
      .nullable()
      .optional()
      .transform((v) => v ?? null),
  })
  .refine((r) => r.everyHours !== null || r.everyDays !== null, { path: ["everyHours"], message: "Give the engine hours, the days, or both." });
export type ServiceRuleInput = z.infer<typeof serviceRuleSchema>;

/** An hour-meter reading typed on a form (blank on a rig with no meter): a service done, a card started. */
export const hourMeterReading = z
  .number({ error: "Give the hour meter reading as a number, like 2,315.5." })
  .min(0, "Engine hours cannot be negative.")
  .max(100_000, "Over 100,000 engine hours is not plausible.")
  .nullable()
  .optional()
  .transform((v) => v ?? null);

/** Recording a service done: the engine hours read at the time (blank on a rig with no meter) and a note. */
export const serviceDoneSchema = z.object({
  engineHours: hourMeterReading,
  note: z.string().trim().max(500, "Keep the note under 500 characters.").optional(),
});
