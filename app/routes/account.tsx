import { parseForm } from "~/lib/form-parse";
import { data } from "react-router";
import { ChoosePasswordForm } from "~/components/choose-password-form";
import { DoneNote } from "~/components/ui/done-note";
import { PageTitle } from "~/components/ui/page-title";
import { toFieldErrors } from "~/lib/form-errors";
import { changePasswordSchema } from "~/lib/people-schema";
import { ROLE_LABELS } from "~/lib/roles";
import { changePassword } from "~/services/account.server";
import { requireUser } from "~/services/guards.server";
import { signInCookie } from "~/services/session.server";
import type { Route } from "./+types/account";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  return { name: user.name, email: user.email, role: user.role, company: user.companyName };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireUser(request);
  const submission = parseForm(await request.formData(), changePasswordSchema);
  const hidden = { hideFields: ["current", "password", "confirm"] };
  if (submission.status !== "success") return data({ result: submission.reply(hidden), message: null }, { status: 400 });
  const changed = await changePassword(user, submission.value.current, submission.value.password);
  if (!changed.ok) return data({ result: submission.reply({ ...hidden, fieldErrors: toFieldErrors(changed.fieldErrors) }), message: null }, { status: 400 });
  // This phone stays signed in with the new epoch; every other one is signed out.
  return data(
    { result: submission.reply({ resetForm: true }), message: "Password changed. Any other phone or computer signed in as you has been signed out." },
    { headers: await signInCookie(request, user.id) },
  );
}

export default function Account({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <>
      <PageTitle lead={`${loaderData.email} · ${ROLE_LABELS[loaderData.role]} at ${loaderData.company}. Your admin can change your role.`}>
        {loaderData.name}
      </PageTitle>
      <DoneNote message={actionData?.message} />
      <h2 className="text-2xl font-bold">Change your password</h2>
      <ChoosePasswordForm lastResult={actionData?.result} submitLabel="Change password" askCurrent />
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Your account · Tankside" }];
