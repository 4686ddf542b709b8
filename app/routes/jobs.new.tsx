import { data, redirect } from "react-router";
import { JobForm, STARTER_JOB } from "~/components/job-form";
import { PageTitle } from "~/components/ui/page-title";
import { parseForm } from "~/lib/forms/parse";
import { jobInputSchema } from "~/lib/jobs/schema";
import { requirePermission } from "~/services/guards.server";
import { createJob, todayIn } from "~/services/jobs.server";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/jobs.new";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "manage-jobs");
  return { today: todayIn(user.timeZone) };
}

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "manage-jobs");
  const submission = parseForm(await readForm(request), jobInputSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  return redirect(`/jobs/${await createJob(user, submission.value)}`);
}

export default function NewJob({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <>
      <PageTitle lead="The site, its spec and its dates. Put rigs and crew on it by day from its page.">New job</PageTitle>
      <JobForm lastResult={actionData} submitLabel="Save job" defaultValue={{ ...STARTER_JOB, startsOn: loaderData.today }} />
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "New job · Tankside" }];
