import type { z } from "zod";
import { fieldErrors } from "~/lib/forms/errors";
import { fail } from "./guards.server";

/** Stops with 400 naming each bad field, in the one shape every page and API answers errors in. */
function refuse(error: z.ZodError, what?: string): never {
  const fields = fieldErrors(error);
  // Messages that already name their field ("from must be before to") are not prefixed twice.
  const detail = Object.entries(fields).map(([k, v]) => (v.startsWith(k) ? v : `${k}: ${v}`));
  fail(400, what ? `Check ${what}: ${detail.join("; ")}.` : `Check ${Object.keys(fields).join(", ")}.`, fields);
}

/**
 * Parses a JSON body with a schema; a bad body stops with 400 naming each bad field. Only a body
 * declared as JSON is read (415 otherwise): a cross-site form can send text/plain but not that.
 */
export async function readJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
  const type = request.headers.get("Content-Type") ?? "";
  if (!/^application\/json\s*(;|$)/i.test(type)) fail(415, "Send the body as JSON (Content-Type: application/json).");
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    fail(400, "The body must be JSON.");
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) refuse(parsed.error);
  return parsed.data;
}

/**
 * The query string's values without the blank ones: a form sends every field, and a select left
 * on "All" arrives as `rig=` — that means "no filter", never "rig is empty".
 */
export function queryValues(request: Request): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of new URL(request.url).searchParams) if (v.trim() !== "") out[k] = v;
  return out;
}

/** Parses the query string with a schema (blank values dropped first); bad values stop with 400 naming each. */
export function readQuery<S extends z.ZodType>(request: Request, schema: S, what = "the filters"): z.infer<S> {
  const parsed = schema.safeParse(queryValues(request));
  if (!parsed.success) refuse(parsed.error, what);
  return parsed.data;
}

/** The form body of a page action; a body that is not a form (JSON, broken multipart) stops with 400 instead of a 500. */
export async function readForm(request: Request): Promise<FormData> {
  try {
    return await request.formData();
  } catch {
    fail(400, "Send this as a form (the body could not be read).");
  }
}

export function requirePost(request: Request) {
  if (request.method !== "POST") fail(405, "Use POST.");
}
