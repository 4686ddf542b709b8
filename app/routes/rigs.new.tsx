import { parseForm } from "~/lib/forms/parse";
import { data, redirect } from "react-router";
import { RigForm } from "~/components/rig-form";
import { PageTitle } from "~/components/ui/page-title";
import { toFieldErrors } from "~/lib/forms/errors";
import { rigInputSchema } from "~/lib/rigs/schema";
import { requirePermission } from "~/services/guards.server";
import { createRig } from "~/services/rigs.server";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/rigs.new";

export async function loader({ request, context }: Route.LoaderArgs) {
  await requirePermission({ request, context }, "edit-rigs");
  return null;
}

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "edit-rigs");
  const submission = parseForm(await readForm(request), rigInputSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const saved = await createRig(user, submission.value);
  if (!saved.ok) return data(submission.reply({ fieldErrors: toFieldErrors(saved.fieldErrors) }), { status: 400 });
  return redirect(`/rigs/${saved.code}`);
}

export default function NewRig({ actionData }: Route.ComponentProps) {
  return (
    <>
      <PageTitle lead="Every field is checked before anything is saved.">Add a rig</PageTitle>
      <RigForm lastResult={actionData} submitLabel="Save rig" />
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Add a rig · Tankside" }];
