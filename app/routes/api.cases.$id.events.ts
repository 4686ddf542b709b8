import { eventBatchSchema } from "~/lib/cases/schema";
import { storeEvents } from "~/services/cases.server";
import { requireUser } from "~/services/guards.server";
import { readJson, requirePost } from "~/services/read-request.server";
import type { Route } from "./+types/api.cases.$id.events";

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requireUser({ request, context });
  requirePost(request);
  const { events } = await readJson(request, eventBatchSchema);
  return Response.json(await storeEvents(user, params.id, events));
}
