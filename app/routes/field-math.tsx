import { useTranslation } from "react-i18next";
import { Link } from "react-router";
import { PageTitle } from "~/components/ui/page-title";
import { FIELD_MATH_SCREENS } from "~/lib/field-math/screens";
import { requireUser } from "~/services/guards.server";
import { serverOrPhone } from "~/components/offline/server-or-phone";
import type { Route } from "./+types/field-math";

export async function loader({ request, context }: Route.LoaderArgs) {
  await requireUser({ request, context });
  return {};
}

/** Nothing to fetch but the sign-in check: with no signal the kept page still opens. */
export async function clientLoader({ serverLoader }: Route.ClientLoaderArgs) {
  return serverOrPhone(serverLoader, () => ({}));
}

export default function FieldMath() {
  const { t } = useTranslation();
  return (
    <>
      <PageTitle lead={t("fm.index.lead")}>{t("fm.index.title")}</PageTitle>
      <ul className="grid gap-3 sm:grid-cols-2">
        {FIELD_MATH_SCREENS.map((s) => (
          <li key={s.id}>
            <Link to={s.id} className="flex min-h-20 flex-col justify-center rounded-lg border-2 border-ink bg-paper px-4 py-3 text-ink no-underline">
              <span className="text-xl font-bold">{t(`fm.screens.${s.id}.title`)}</span>
              <span>{t(`fm.screens.${s.id}.lead`)}</span>
            </Link>
          </li>
        ))}
      </ul>
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Field math · Tankside" }];
