import { parseWithZod } from "@conform-to/zod/v4";
import { data, Link, redirect } from "react-router";
import { ChoosePasswordForm } from "~/components/choose-password-form";
import { choosePasswordSchema } from "~/lib/people-schema";
import { checkReset, completeReset } from "~/services/password-reset.server";
import { signInCookie } from "~/services/session.server";
import type { Route } from "./+types/reset.$token";

/** Where a "forgot your password" link lands: a new password once, then straight in. */
export async function loader({ params }: Route.LoaderArgs) {
  const check = await checkReset(params.token);
  if (!check.ok) return data({ name: null, message: check.message }, { status: 410 });
  return { name: check.name, message: null };
}

export async function action({ request, params }: Route.ActionArgs) {
  const submission = parseWithZod(await request.formData(), { schema: choosePasswordSchema });
  if (submission.status !== "success") return data({ result: submission.reply({ hideFields: ["password", "confirm"] }), message: null }, { status: 400 });
  const done = await completeReset(params.token, submission.value.password);
  if (!done.ok) return data({ result: null, message: done.message }, { status: 410 });
  return redirect("/", { headers: await signInCookie(request, done.userId) });
}

export default function Reset({ loaderData, actionData }: Route.ComponentProps) {
  const message = actionData?.message ?? loaderData.message;
  return (
    <main className="mx-auto max-w-md px-4 py-8">
      <h1 className="text-3xl font-bold">Tankside</h1>
      {message ? (
        <p role="alert" className="mt-4 rounded-md border-2 border-stop bg-paper p-3 font-bold text-stop">
          {message}
        </p>
      ) : null}
      {loaderData.name && !actionData?.message ? (
        <>
          <p className="mt-1 text-lg">{loaderData.name}, choose a new password.</p>
          <ChoosePasswordForm lastResult={actionData?.result} submitLabel="Save password and sign in" />
        </>
      ) : (
        <p className="mt-4">
          <Link to="/forgot" className="font-bold underline">
            Ask for a new link
          </Link>
        </p>
      )}
    </main>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "New password · Tankside" }, { name: "referrer", content: "no-referrer" }];
