import type { z } from "zod";
import { fieldErrors } from "~/lib/api";
import { fail } from "./guards.server";

/** Parses a JSON body with a schema; a bad body stops with 400 naming each bad field. */
export async function readJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    fail(400, "The body must be JSON.");
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    const fields = fieldErrors(parsed.error);
    fail(400, `Check ${Object.keys(fields).join(", ")}.`, fields);
  }
  return parsed.data;
}

export function requirePost(request: Request) {
  if (request.method !== "POST") fail(405, "Use POST.");
}
