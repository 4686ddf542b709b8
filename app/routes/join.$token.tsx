import { parseWithZod } from "@conform-to/zod/v4";
import { data, Link, redirect } from "react-router";
import { ChoosePasswordForm } from "~/components/choose-password-form";
import { choosePasswordSchema } from "~/lib/people-schema";
import { ROLE_LABELS } from "~/lib/roles";
import { acceptInvite, checkInvite } from "~/services/people.server";
import { signInCookie } from "~/services/session.server";
import type { Route } from "./+types/join.$token";

/** Where an invitation link lands: choose a password once, then straight in. */
export async function loader({ params }: Route.LoaderArgs) {
  const check = await checkInvite(params.token);
  if (!check.ok) return data({ invite: null, message: check.message }, { status: 410 });
  const { name, email, role } = check.invite;
  return { invite: { name, email, role, company: check.company }, message: null };
}

export async function action({ request, params }: Route.ActionArgs) {
  const submission = parseWithZod(await request.formData(), { schema: choosePasswordSchema });
  if (submission.status !== "success") return data({ result: submission.reply({ hideFields: ["password", "confirm"] }), message: null }, { status: 400 });
  const joined = await acceptInvite(params.token, submission.value.password);
  if (!joined.ok) return data({ result: null, message: joined.message }, { status: 410 });
  return redirect("/", { headers: await signInCookie(request, joined.userId) });
}

export default function Join({ loaderData, actionData }: Route.ComponentProps) {
  const invite = loaderData.invite;
  const message = actionData?.message ?? loaderData.message;
  return (
    <main className="mx-auto max-w-md px-4 py-8">
      <h1 className="text-3xl font-bold">Tankside</h1>
      {message ? (
        <p role="alert" className="mt-4 rounded-md border-2 border-stop bg-paper p-3 font-bold text-stop">
          {message}
        </p>
      ) : null}
      {invite && !actionData?.message ? (
        <>
          <p className="mt-1 text-lg">
            Welcome, {invite.name}. {invite.company} has added you as {ROLE_LABELS[invite.role].toLowerCase()}; choose a password to sign in with{" "}
            <span className="break-all">{invite.email}</span>.
          </p>
          <ChoosePasswordForm lastResult={actionData?.result} submitLabel="Choose password and sign in" />
        </>
      ) : (
        <p className="mt-4">
          <Link to="/login" className="font-bold underline">
            Go to sign-in
          </Link>
        </p>
      )}
    </main>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Join · Tankside" }, { name: "referrer", content: "no-referrer" }];
