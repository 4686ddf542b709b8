import { z } from "zod";
import { saveDraft } from "~/services/desk.server";
import { deskParams } from "~/services/desk-params.server";
import { requirePermission } from "~/services/guards.server";
import { readJson, requirePost } from "~/services/read-request.server";
import type { Route } from "./+types/api.desk.$guideId.v.$number";

const body = z.object({ definition: z.unknown() });

/** POST a draft's whole definition; saving it twice is the same as once. Answers with the validator's problems. */
export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  requirePost(request);
  const { guideId, number } = deskParams(params);
  const { definition } = await readJson(request, body);
  return Response.json(await saveDraft(user, guideId, number, definition));
}
