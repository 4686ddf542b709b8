import { z } from "zod";
import { isTimeZone } from "../format";

/** The company settings an admin may change. */
export const companySettingsSchema = z.object({
  timeZone: z
    .string({ error: "Choose the time zone your crews work in." })
    .trim()
    .refine(isTimeZone, "Choose a time zone from the list (like America/Denver)."),
});
export type CompanySettings = z.infer<typeof companySettingsSchema>;
