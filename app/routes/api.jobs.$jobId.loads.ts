import { jobLoadSchema } from "~/lib/jobs/schema";
import { requirePermission } from "~/services/guards.server";
import { recordLoad } from "~/services/jobs.server";
import { readJson, requirePost } from "~/services/read-request.server";
import type { Route } from "./+types/api.jobs.$jobId.loads";

/** A load marked sprayed on the load card: stored once per phone id (201 the first time, 200 for a resend). */
export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "read-jobs");
  requirePost(request);
  const body = await readJson(request, jobLoadSchema);
  const { created } = await recordLoad(user, Number(params.jobId), body);
  return Response.json({ id: body.id, created }, { status: created ? 201 : 200 });
}
