import { data } from "react-router";
import { ChoosePasswordForm } from "~/components/choose-password-form";
import { LinkPage } from "~/components/link-page";
import { setPasswordFromLink } from "~/services/password-link.server";
import { checkReset, completeReset } from "~/services/password-reset.server";
import type { Route } from "./+types/reset.$token";

/** Where a "forgot your password" link lands: a new password once, then straight in. */
export async function loader({ params }: Route.LoaderArgs) {
  const check = await checkReset(params.token);
  if (!check.ok) return data({ name: null, message: check.message }, { status: 410 });
  return { name: check.name, message: null };
}

export const action = ({ request, params }: Route.ActionArgs) => setPasswordFromLink(request, (password) => completeReset(params.token, password));

export default function Reset({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <LinkPage message={actionData?.message ?? loaderData.message} usable={!!loaderData.name} otherwise={{ to: "/forgot", label: "Ask for a new link" }}>
      <p className="mt-1 text-lg">{loaderData.name}, choose a new password.</p>
      <ChoosePasswordForm lastResult={actionData?.result} submitLabel="Save password and sign in" />
    </LinkPage>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "New password · Tankside" }, { name: "referrer", content: "no-referrer" }];
