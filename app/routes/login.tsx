import { useMemo } from "react";
import { useTranslation } from "react-i18next";
import { data, Form, Link, redirect, useNavigation } from "react-router";
import { FormField, inputClass } from "~/components/forms/form-field";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { signInSchema } from "~/lib/people/schema";
import { getFormProps, getInputProps } from "@conform-to/react";
import { ErrorList } from "~/components/ui/error-list";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../../seeds/demo-people";
import { EmailField } from "~/components/forms/email-field";
import { authenticator, SignInError } from "~/services/auth.server";
import { env } from "~/services/env.server";
import { currentUser } from "~/services/guards.server";
import { landingFor } from "~/lib/navigation";
import { safeRedirect } from "~/lib/forms/safe-redirect";
import { signInCookie } from "~/services/session.server";
import { settleLanguage } from "~/services/account.server";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/login";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await currentUser({ request, context });
  if (user) throw redirect(landingFor(user.role));
  const e = env();
  const showDemo = e.SHOW_DEMO_SIGNINS === "1" || (e.NODE_ENV !== "production" && e.SHOW_DEMO_SIGNINS !== "0");
  return {
    redirectTo: safeRedirect(new URL(request.url).searchParams.get("redirectTo")) ?? "",
    demo: showDemo ? { password: DEMO_PASSWORD, people: DEMO_PEOPLE.map(({ email, role }) => ({ email, role })) } : null,
  };
}

export async function action({ request }: Route.ActionArgs) {
  const form = await readForm(request.clone());
  try {
    const person = await authenticator.authenticate("form", request);
    await settleLanguage(person.id, request.headers.get("Accept-Language"));
    // Where they were going, else where their role starts the day (the board for supervisors).
    return redirect(safeRedirect(form.get("redirectTo")) ?? landingFor(person.role), { headers: await signInCookie(request, person.id) });
  } catch (error) {
    // Throttled: the same words and status for every address, with how long to wait.
    if (error instanceof Response && error.status === 429) {
      const body = (await error.json()) as { error: string };
      return data({ error: body.error, fields: {} as SignInError["fields"], email: String(form.get("email") ?? "") }, { status: 429, headers: error.headers });
    }
    if (error instanceof SignInError) {
      return data({ error: error.message, fields: error.fields, email: String(form.get("email") ?? "") }, { status: error.status });
    }
    throw error;
  }
}

export default function Login({ loaderData, actionData }: Route.ComponentProps) {
  const busy = useNavigation().state !== "idle";
  // The server's answer (wrong password, throttled) is shown above the fields; its field messages beside them.
  // Made once per answer: conform applies a new lastResult object every time it sees one.
  const lastResult = useMemo(
    () =>
      actionData
        ? {
            status: "error" as const,
            initialValue: { email: actionData.email },
            error: Object.fromEntries(Object.entries(actionData.fields ?? {}).map(([k, v]) => [k, v ? [v] : []])),
          }
        : null,
    [actionData],
  );
  const [form, fields] = useCheckedForm(signInSchema, { lastResult });
  const { t } = useTranslation();
  return (
    <main className="mx-auto max-w-md px-4 py-8">
      <h1 className="text-3xl font-bold">Tankside</h1>
      <p className="mt-1 text-lg">{t("login.lead")}</p>
      {/* A whole-page load: the next page is drawn in the person's own language, not the browser's. */}
      <Form method="post" reloadDocument {...getFormProps(form)} className="mt-6 space-y-4 rounded-lg border-2 border-ink bg-paper p-5">
        <input type="hidden" name="redirectTo" value={loaderData.redirectTo} />
        {actionData?.error ? <ErrorList error={actionData.error} /> : null}
        <EmailField field={fields.email} label={t("login.email")} />
        <FormField field={fields.password} label={t("login.password")}>
          <input {...getInputProps(fields.password, { type: "password" })} autoComplete="current-password" className={inputClass} />
        </FormField>
        <button type="submit" disabled={busy} className="min-h-14 w-full rounded-md bg-go text-lg font-bold text-white">
          {busy ? t("login.signingIn") : t("login.signIn")}
        </button>
        <p>
          <Link to="/forgot" className="font-bold underline">
            {t("login.forgot")}
          </Link>
        </p>
      </Form>
      {loaderData.demo ? (
        <section aria-labelledby="demo-heading" className="mt-6 rounded-lg border-2 border-dashed border-rule bg-paper p-4">
          <h2 id="demo-heading" className="font-bold">
            {t("login.demo")}
          </h2>
          <p className="mt-1">
            {t("login.demoPassword")} <code className="font-bold">{loaderData.demo.password}</code>
          </p>
          <ul className="mt-2 space-y-1">
            {loaderData.demo.people.map((p) => (
              <li key={p.email}>
                <code>{p.email}</code> — {p.role}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </main>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Sign in · Tankside" }];
