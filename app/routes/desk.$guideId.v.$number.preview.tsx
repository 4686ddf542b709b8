import { Link } from "react-router";
import { ErrorList } from "~/components/ui/error-list";
import { PreviewWalk } from "~/components/desk/preview-walk";
import { PageTitle } from "~/components/ui/page-title";
import { validateGuide } from "~/lib/guides/validate";
import { localizeGuide } from "~/lib/guides/translations";
import type { Language } from "~/lib/i18n/languages";
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
  // The guide's text in the language asked for (?lang=es): steps with no up-to-date Spanish show marked, as crews see them.
  const lang: Language = new URL(request.url).searchParams.get("lang") === "es" ? "es" : "en";
  const shown = guide ? localizeGuide(guide, lang) : null;
  return {
    guideId: v.guide.id,
    title: v.guide.title,
    number,
    lang,
    guide: shown?.guide ?? null,
    inEnglish: shown?.inEnglish ?? [],
    problems: problems.map((p) => `${p.step ? `step "${p.step}": ` : ""}${p.message}`),
  };
}

export default function Preview({ loaderData: d }: Route.ComponentProps) {
  return (
    <>
      <PageTitle lead={`Version ${d.number}, as the crew will see it. No case is made.`}>Preview: {d.title}</PageTitle>
      <p className="mb-3 flex flex-wrap gap-x-4">
        <Link to={`/desk/${d.guideId}/v/${d.number}`}>Back to the editor</Link>
        {d.lang === "es" ? <Link to="?lang=en">Preview in English</Link> : <Link to="?lang=es">Preview in Spanish</Link>}
      </p>
      {d.guide ? (
        <PreviewWalk key={d.lang} guide={d.guide} lang={d.lang} inEnglish={d.inEnglish} />
      ) : (
        <ErrorList error="Fix these first: a guide with problems cannot be walked." problems={d.problems} />
      )}
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Preview · Guide desk · Tankside" }];
