import type { z } from "zod";

/** `{ field: message }` from a zod error: the first message for each field, named by its path. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) out[issue.path.join(".") || "body"] ??= issue.message;
  return out;
}

/** The JSON body of a 400: a sentence naming the bad fields, and each field's message. */
export function badRequestBody(error: z.ZodError) {
  const fields = fieldErrors(error);
  return { error: `Check ${Object.keys(fields).join(", ")}.`, fields };
}
