import { fail, requirePermission } from "~/services/guards.server";
import { takeBackLoad } from "~/services/jobs.server";
import type { Route } from "./+types/api.jobs.$jobId.loads.$loadId";

/** DELETE: a load marked sprayed by mistake, taken back (by its marker within the hour, or a supervisor). */
export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "read-jobs");
  if (request.method !== "DELETE") fail(405, "Take a load back with DELETE.");
  await takeBackLoad(user, Number(params.jobId), params.loadId);
  return Response.json({ id: params.loadId, takenBack: true });
}
