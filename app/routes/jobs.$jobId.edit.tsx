import { data, redirect } from "react-router";
import { JobForm } from "~/components/job-form";
import { PageTitle } from "~/components/ui/page-title";
import { parseForm } from "~/lib/forms/parse";
import { jobInputSchema } from "~/lib/jobs/schema";
import { requirePermission } from "~/services/guards.server";
import { jobInput, updateJob } from "~/services/jobs.server";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/jobs.$jobId.edit";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "manage-jobs");
  return { job: await jobInput(user, Number(params.jobId)) };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "manage-jobs");
  const submission = parseForm(await readForm(request), jobInputSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  await updateJob(user, Number(params.jobId), submission.value);
  return redirect(`/jobs/${params.jobId}`);
}

export default function EditJob({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <>
      <PageTitle lead={loaderData.job.customer}>Edit {loaderData.job.name}</PageTitle>
      <JobForm defaultValue={loaderData.job} lastResult={actionData} submitLabel="Save changes" />
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Edit job · Tankside" }];
