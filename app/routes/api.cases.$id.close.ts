import { closeCaseSchema } from "~/lib/cases/schema";
import { closeCase } from "~/services/cases.server";
import { requireUser } from "~/services/guards.server";
import { readJson, requirePost } from "~/services/read-request.server";
import type { Route } from "./+types/api.cases.$id.close";

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requireUser({ request, context });
  requirePost(request);
  const body = await readJson(request, closeCaseSchema);
  return Response.json(await closeCase(user, params.id, body));
}
