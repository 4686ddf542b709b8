import type { z } from "zod";

/** `{ field: message }` from a zod error: the first message for each field, named by its path. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) out[issue.path.join(".") || "body"] ??= issue.message;
  return out;
}

/** `{ field: "message" }` → conform's `{ field: ["message"] }`. */
export const toFieldErrors = (errors: Record<string, string | undefined>): Record<string, string[]> =>
  Object.fromEntries(Object.entries(errors).map(([k, v]) => [k, v ? [v] : []]));
