import { data, Form, Link, useNavigation } from "react-router";
import { EmailField } from "~/components/email-field";
import { z } from "zod";
import { emailAddress } from "~/lib/people/schema";
import { RESET_MINUTES } from "~/lib/mail/reset";
import { startResetRequest } from "~/services/password-reset.server";
import { readForm } from "~/services/read-request.server";
import { checkLinkRequest } from "~/services/throttle.server";
import type { Route } from "./+types/forgot";

const emailSchema = z.object({ email: emailAddress("your") });

export async function action({ request }: Route.ActionArgs) {
  const form = await readForm(request);
  const parsed = emailSchema.safeParse({ email: form.get("email") ?? "" });
  if (!parsed.success) return data({ error: parsed.error.issues[0].message, sent: false }, { status: 400 });
  await checkLinkRequest(request);
  // Answered before any lookup or mail, so a known and an unknown address take the same time and get the same words.
  startResetRequest(parsed.data.email);
  return { error: null, sent: true };
}

export default function Forgot({ actionData }: Route.ComponentProps) {
  const busy = useNavigation().state !== "idle";
  return (
    <main className="mx-auto max-w-md px-4 py-8">
      <h1 className="text-3xl font-bold">Forgot your password?</h1>
      {actionData?.sent ? (
        <p role="status" className="mt-4 rounded-md border-2 border-ink bg-paper p-3 text-lg">
          If that address signs in to Tankside, a link to choose a new password is on its way. It works once, for {RESET_MINUTES} minutes. No mail? Ask your
          company's admin.
        </p>
      ) : (
        <Form method="post" className="mt-6 space-y-4 rounded-lg border-2 border-ink bg-paper p-5" noValidate>
          <p>Enter the e-mail you sign in with; we send a link to choose a new one.</p>
          <EmailField error={actionData?.error} />
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
