import { data } from "react-router";
import { ChoosePasswordForm } from "~/components/choose-password-form";
import { LinkPage } from "~/components/link-page";
import { ROLE_LABELS } from "~/lib/people/roles";
import { setPasswordFromLink } from "~/services/password-link.server";
import { acceptInvite, checkInvite } from "~/services/people.server";
import type { Route } from "./+types/join.$token";

/** Where an invitation link lands: choose a password once, then straight in. */
export async function loader({ params }: Route.LoaderArgs) {
  const check = await checkInvite(params.token);
  if (!check.ok) return data({ invite: null, message: check.message }, { status: 410 });
  const { name, email, role } = check.invite;
  return { invite: { name, email, role, company: check.company }, message: null };
}

export const action = ({ request, params }: Route.ActionArgs) => setPasswordFromLink(request, (password) => acceptInvite(params.token, password));

export default function Join({ loaderData, actionData }: Route.ComponentProps) {
  const invite = loaderData.invite;
  return (
    <LinkPage message={actionData?.message ?? loaderData.message} usable={!!invite} otherwise={{ to: "/login", label: "Go to sign-in" }}>
      {invite ? (
        <>
          <p className="mt-1 text-lg">
            Welcome, {invite.name}. {invite.company} has added you as {ROLE_LABELS[invite.role].toLowerCase()}; choose a password to sign in with{" "}
            <span className="break-all">{invite.email}</span>.
          </p>
          <ChoosePasswordForm lastResult={actionData?.result} submitLabel="Choose password and sign in" />
        </>
      ) : null}
    </LinkPage>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Join · Tankside" }, { name: "referrer", content: "no-referrer" }];
