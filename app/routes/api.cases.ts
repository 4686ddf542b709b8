import { startCaseSchema } from "~/lib/cases/schema";
import { startCase } from "~/services/cases.server";
import { requireUser } from "~/services/guards.server";
import { readJson, requirePost } from "~/services/read-request.server";
import type { Route } from "./+types/api.cases";

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requireUser({ request, context });
  requirePost(request);
  const body = await readJson(request, startCaseSchema);
  const { id, created } = await startCase(user, body);
  return Response.json({ id }, { status: created ? 201 : 200 });
}
