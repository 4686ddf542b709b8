import { z } from "zod";
import { DEFAULT_REPEAT_DAYS } from "./repeats";

const day = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "use a date like 2026-06-01")
  .refine((s) => !Number.isNaN(Date.parse(s)), "not a real date");

/** The board's window from a query string (blank values already dropped: "All rigs" means no filter): ?from=YYYY-MM-DD&to=YYYY-MM-DD&rig=CF-03&repeatDays=30 (default: the last 365 days). */
export const boardQuerySchema = z
  .object({
    from: day.optional(),
    to: day.optional(),
    rig: z.string().trim().toUpperCase().max(16).optional(),
    repeatDays: z.coerce
      .number({ error: "repeatDays must be a number" })
      .int("repeatDays must be whole days")
      .min(1, "repeatDays must be at least 1")
      .max(365, "repeatDays must be at most 365")
      .default(DEFAULT_REPEAT_DAYS),
  })
  .transform((q, ctx) => {
    const today = new Date();
    const to = q.to ? new Date(`${q.to}T00:00:00Z`) : new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate()));
    // `to` is inclusive for people: the window ends at the start of the next day.
    const end = new Date(to.getTime() + 86_400_000);
    const from = q.from ? new Date(`${q.from}T00:00:00Z`) : new Date(end.getTime() - 365 * 86_400_000);
    if (from >= end) ctx.addIssue({ code: "custom", path: ["from"], message: "from must be before to" });
    if (end.getTime() - from.getTime() > 5 * 366 * 86_400_000) ctx.addIssue({ code: "custom", path: ["from"], message: "a window can be at most 5 years" });
    return { from, to: end, rigCode: q.rig, repeatDays: q.repeatDays, fromDay: from.toISOString().slice(0, 10), toDay: to.toISOString().slice(0, 10) };
  });

export type BoardQuery = z.output<typeof boardQuerySchema>;
