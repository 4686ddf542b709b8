import { CALCULATORS, isCalculator } from "~/lib/calc";
import { CalcInputError } from "~/lib/calc/validate";
import { fail, notFound, requireUser } from "~/services/guards.server";
import { requirePost } from "~/services/read-request.server";
import type { Route } from "./+types/api.calc.$kind";

/** POST /api/calc/{hose|suction|load|torque}: JSON in, JSON out; a bad field is named in a 400. */
export async function action({ request, params, context }: Route.ActionArgs) {
  await requireUser({ request, context });
  requirePost(request);
  if (!isCalculator(params.kind)) notFound(`Calculator ${params.kind}`);
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    fail(400, "The body must be JSON.");
  }
  try {
    return Response.json(CALCULATORS[params.kind](body));
  } catch (error) {
    if (error instanceof CalcInputError) fail(400, `Check ${Object.keys(error.fields).join(", ")}.`, error.fields);
    throw error;
  }
}
