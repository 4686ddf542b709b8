import { z } from "zod";
import { COMPONENTS } from "./schema";

/** ISO 14224 Annex B failure-mode codes our causes map to, where one fits. */
export const ISO_14224_MODES = ["FTS", "FTO", "FTC", "PLU", "LOO", "HIO", "ERO", "ELU", "ELP", "INL", "VIB", "NOI", "OHE", "PDE", "STD", "BRD"] as const;

export const causeSchema = z.strictObject({
  code: z.string().regex(/^[a-z][a-z0-9-]*$/),
  name: z.string().min(1),
  component: z.enum(COMPONENTS),
  iso14224: z.enum(ISO_14224_MODES).nullable(),
  /** Where the mapping comes from ("from memory" until checked against the standard's table). */
  isoNote: z.string().optional(),
  /** The name in other languages (the crew's end card reads it). */
  names: z
    .strictObject({ es: z.string().min(1) })
    .partial()
    .optional(),
});

export const causeListSchema = z.array(causeSchema).superRefine((list, ctx) => {
  const seen = new Set<string>();
  list.forEach((c, i) => {
    if (seen.has(c.code)) ctx.addIssue({ code: "custom", path: [i, "code"], message: `duplicate cause code ${c.code}` });
    seen.add(c.code);
  });
});

export type Cause = z.infer<typeof causeSchema>;
