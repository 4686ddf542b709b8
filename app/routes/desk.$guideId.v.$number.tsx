import { Link } from "react-router";
import { GuideEditor, type Draft } from "~/components/desk/guide-editor";
import { ProblemsPanel } from "~/components/desk/problems-panel";
import { TreeDrawing } from "~/components/desk/tree-drawing";
import { PageTitle } from "~/components/ui/page-title";
import { checkDefinition, versionFor } from "~/services/desk.server";
import { deskParams } from "~/services/desk-params.server";
import { requireRole } from "~/services/guards.server";
import { causeList } from "~/services/guides.server";
import type { Route } from "./+types/desk.$guideId.v.$number";

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireRole(request, "trainer");
  const { guideId, number } = deskParams(params);
  const v = await versionFor(user, guideId, number);
  return { ...v, editable: v.version.status === "draft" && !v.guide.builtIn, causes: causeList(), problems: checkDefinition(v.version.definition) };
}

export default function EditVersion({ loaderData }: Route.ComponentProps) {
  const { guide, version, editable, causes, problems } = loaderData;
  return (
    <>
      <PageTitle lead={`Version ${version.number} · ${version.status.replace("_", " ")}${version.author ? ` · by ${version.author}` : ""}`}>
        {guide.title}
      </PageTitle>
      <p className="mb-3 flex flex-wrap gap-x-4">
        <Link to={`/desk/${guide.id}`}>Versions and review</Link>
        <Link to="preview">Preview as crew</Link>
        <a href={`/desk/${guide.id}/v/${version.number}/export`} download>
          Export JSON
        </a>
      </p>
      {version.reviewComment && version.status === "draft" ? (
        <p className="mb-3 rounded-md border-2 border-ink bg-caution p-3 font-bold">Reviewer: {version.reviewComment}</p>
      ) : null}
      {editable ? (
        <GuideEditor initial={version.definition as unknown as Draft} causes={causes} saveUrl={`/api/desk/${guide.id}/v/${version.number}`} />
      ) : (
        <div className="space-y-3">
          <p>This version is {version.status.replace("_", " ")} and is never changed. Open a draft from the versions page to change the guide.</p>
          <ProblemsPanel problems={problems} onSelect={() => {}} />
          <TreeDrawing states={version.definition.states} selected={null} onSelect={() => {}} />
        </div>
      )}
    </>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `Edit ${data?.guide.title ?? "guide"} · Tankside` }];
