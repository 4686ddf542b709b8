import { Link } from "react-router";
import { ErrorList } from "~/components/ui/error-list";
import { PreviewWalk } from "~/components/desk/preview-walk";
import { PageTitle } from "~/components/ui/page-title";
import { validateGuide } from "~/lib/guides/validate";
import { versionFor } from "~/services/desk.server";
import { deskParams } from "~/services/desk-params.server";
import { requirePermission } from "~/services/guards.server";
import { causeList } from "~/services/guides.server";
import type { Route } from "./+types/desk.$guideId.v.$number.preview";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  const { guideId, number } = deskParams(params);
  const v = await versionFor(user, guideId, number);
  const { guide, problems } = validateGuide(v.version.definition, { causes: causeList() });
  return { guideId: v.guide.id, title: v.guide.title, number, guide, problems: problems.map((p) => `${p.step ? `step "${p.step}": ` : ""}${p.message}`) };
}

export default function Preview({ loaderData: d }: Route.ComponentProps) {
  return (
    <>
      <PageTitle lead={`Version ${d.number}, as the crew will see it. No case is made.`}>Preview: {d.title}</PageTitle>
      <p className="mb-3">
        <Link to={`/desk/${d.guideId}/v/${d.number}`}>Back to the editor</Link>
      </p>
      {d.guide ? <PreviewWalk guide={d.guide} /> : <ErrorList error="Fix these first: a guide with problems cannot be walked." problems={d.problems} />}
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Preview · Guide desk · Tankside" }];
