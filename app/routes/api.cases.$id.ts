import { caseDetail } from "~/services/case-detail.server";
import { requireUser } from "~/services/guards.server";
import type { Route } from "./+types/api.cases.$id";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const detail = await caseDetail(user, params.id);
  const { guide, ...rest } = detail;
  return Response.json({ ...rest, guide: { slug: guide.slug, title: guide.title, version: guide.version } });
}
