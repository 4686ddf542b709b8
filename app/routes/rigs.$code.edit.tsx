import { parseForm } from "~/lib/forms/parse";
import { data, redirect } from "react-router";
import { RigForm } from "~/components/rig-form";
import { PageTitle } from "~/components/ui/page-title";
import { toFieldErrors } from "~/lib/forms/errors";
import { rigInputSchema } from "~/lib/rigs/schema";
import { requirePermission } from "~/services/guards.server";
import { findRig, updateRig } from "~/services/rigs.server";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/rigs.$code.edit";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "edit-rigs");
  const rig = await findRig(user, params.code);
  // The form's fields only: the record's id, company, retired flag and timestamps are not edited here.
  const { id: _id, companyId: _company, retired: _retired, createdAt: _created, updatedAt: _updated, ...editable } = rig;
  return { rig: { ...editable, notes: editable.notes ?? undefined } };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "edit-rigs");
  const submission = parseForm(await readForm(request), rigInputSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const saved = await updateRig(user, params.code, submission.value);
  if (!saved.ok) return data(submission.reply({ fieldErrors: toFieldErrors(saved.fieldErrors) }), { status: 400 });
  return redirect(`/rigs/${saved.code}`);
}

export default function EditRig({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <>
      <PageTitle lead={loaderData.rig.name}>Edit {loaderData.rig.code}</PageTitle>
      <RigForm defaultValue={loaderData.rig} lastResult={actionData} submitLabel="Save changes" />
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Edit rig · Tankside" }];
