import { data, Form, Link, useNavigation } from "react-router";
import { EmailField } from "~/components/forms/email-field";
import { getFormProps } from "@conform-to/react";
import { forgotSchema } from "~/lib/people/schema";
import { parseForm } from "~/lib/forms/parse";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { RESET_MINUTES } from "~/lib/mail/reset";
import { startResetRequest } from "~/services/password-reset.server";
import { readForm } from "~/services/read-request.server";
import { checkLinkRequest } from "~/services/throttle.server";
import type { Route } from "./+types/forgot";

export async function action({ request }: Route.ActionArgs) {
  const submission = parseForm(await readForm(request), forgotSchema);
  if (submission.status !== "success")
    return data({ error: submission.error?.email?.[0] ?? "Enter your e-mail.", result: submission.reply(), sent: false }, { status: 400 });
  await checkLinkRequest(request);
  // Answered before any lookup or mail, so a known and an unknown address take the same time and get the same words.
  startResetRequest(submission.value.email);
  return { error: null, result: null, sent: true };
}

export default function Forgot({ actionData }: Route.ComponentProps) {
  const busy = useNavigation().state !== "idle";
  const [form, fields] = useCheckedForm(forgotSchema, { lastResult: actionData?.result });
  return (
    <main className="mx-auto max-w-md px-4 py-8">
      <h1 className="text-3xl font-bold">Forgot your password?</h1>
      {actionData?.sent ? (
        <p role="status" className="mt-4 rounded-md border-2 border-ink bg-paper p-3 text-lg">
          If that address signs in to Tankside, a link to choose a new password is on its way. It works once, for {RESET_MINUTES} minutes. No mail? Ask your
          company's admin.
        </p>
      ) : (
        <Form method="post" {...getFormProps(form)} className="mt-6 space-y-4 rounded-lg border-2 border-ink bg-paper p-5">
          <p>Enter the e-mail you sign in with; we send a link to choose a new one.</p>
          <EmailField field={fields.email} />
          <button type="submit" disabled={busy} className="min-h-14 w-full rounded-md bg-go text-lg font-bold text-white">
            Send me a link
          </button>
        </Form>
      )}
      <p className="mt-4">
        <Link to="/login" className="font-bold underline">
          Back to sign-in
        </Link>
      </p>
    </main>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Forgot your password · Tankside" }];
