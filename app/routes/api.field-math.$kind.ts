import { FIELD_MATH_KINDS, isFieldMathKind } from "~/lib/field-math";
import { FieldMathInputError } from "~/lib/field-math/validate";
import { loadRulesFor } from "~/services/company.server";
import { fail, notFound, requireUser } from "~/services/guards.server";
import { requirePost } from "~/services/read-request.server";
import type { Route } from "./+types/api.field-math.$kind";

/** POST /api/field-math/{hose|suction|load|load-card|tip|rate|torque}: JSON in, JSON out; a bad field is named in a 400. */
export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requireUser({ request, context });
  requirePost(request);
  if (!isFieldMathKind(params.kind)) notFound(`Calculator ${params.kind}`);
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    fail(400, "The body must be JSON.");
  }
  try {
    return Response.json(FIELD_MATH_KINDS[params.kind](body, await loadRulesFor(user)));
  } catch (error) {
    if (error instanceof FieldMathInputError) fail(400, `Check ${Object.keys(error.fields).join(", ")}.`, error.fields);
    throw error;
  }
}
