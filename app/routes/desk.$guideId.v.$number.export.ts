import { versionFor } from "~/services/desk.server";
import { deskParams } from "~/services/desk-params.server";
import { requirePermission } from "~/services/guards.server";
import type { Route } from "./+types/desk.$guideId.v.$number.export";

/** A version as a content/guides file, ready to import elsewhere or ship. */
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  const { guideId, number } = deskParams(params);
  const { guide, version } = await versionFor(user, guideId, number);
  return new Response(`${JSON.stringify(version.definition, null, 2)}\n`, {
    headers: { "Content-Type": "application/json; charset=utf-8", "Content-Disposition": `attachment; filename="${guide.slug}.v${version.number}.json"` },
  });
}
