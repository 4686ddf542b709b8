import { Form, Link } from "react-router";
import { z } from "zod";
import { JobProgressView } from "~/components/jobs/job-progress";
import { ButtonLink } from "~/components/ui/button-link";
import { PageTitle } from "~/components/ui/page-title";
import { useTimes } from "~/components/use-time-zone";
import { siteLine } from "~/lib/jobs/today";
import { formatDay } from "~/lib/format";
import { can } from "~/lib/permissions";
import { requirePermission } from "~/services/guards.server";
import { listJobs, planAhead } from "~/services/jobs.server";
import { readQuery } from "~/services/read-request.server";
import type { Route } from "./+types/jobs";

const SHOW = { open: "Open jobs", closed: "Closed jobs", all: "All jobs" } as const;
const querySchema = z.object({ show: z.enum(["open", "closed", "all"], { error: "show must be open, closed or all" }).default("open") });

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "read-jobs");
  const { show } = readQuery(request, querySchema);
  const [jobs, { plan }] = await Promise.all([listJobs(user, { show }), planAhead(user, 1)]);
  return { jobs, show, today: plan, canManage: can(user, "manage-jobs"), personId: user.id };
}

export default function Jobs({ loaderData }: Route.ComponentProps) {
  const { jobs, show, today, canManage, personId } = loaderData;
  const times = useTimes();
  return (
    <>
      <PageTitle lead="Each site with its spec, who is on it today, and how far it has got.">Jobs</PageTitle>
      {canManage ? (
        <ButtonLink to="/jobs/new" className="mb-4 sm:w-60">
          New job
        </ButtonLink>
      ) : null}
      <Form method="get" className="mb-4 flex items-end gap-3">
        <label className="font-bold">
          Show
          <select name="show" defaultValue={show} className="mt-1 block min-h-12 rounded-md border-2 border-ink bg-paper px-2">
            {Object.entries(SHOW).map(([k, v]) => (
              <option key={k} value={k}>
                {v}
              </option>
            ))}
          </select>
        </label>
        <button type="submit" className="min-h-12 rounded-md bg-go px-4 font-bold text-white">
          Show
        </button>
      </Form>
      {jobs.length === 0 ? <p className="rounded-md bg-paper p-4">No {show === "all" ? "" : `${show} `}jobs yet.</p> : null}
      <ul className="space-y-3">
        {jobs.map((job) => {
          const on = today.find((p) => p.jobId === job.id);
          const site = siteLine(job);
          return (
            <li key={job.id} className={`rounded-lg border-2 bg-paper p-4 ${job.closedAt ? "border-dashed border-rule" : "border-ink"}`}>
              <Link to={`/jobs/${job.id}`} className="text-2xl font-bold">
                {job.name}
              </Link>
              <p>
                {job.customer}
                {site ? ` · ${site}` : ""}
              </p>
              <p>
                Dates: {formatDay(job.startsOn)}
                {job.endsOn ? ` to ${formatDay(job.endsOn)}` : ""}
                {job.closedAt ? ` · closed ${times.date(job.closedAt)}` : ""}
              </p>
              {on ? (
                <p className="mt-1 font-bold">Today: {[...on.rigCodes, ...on.people.map((p) => (p.id === personId ? "you" : p.name))].join(", ")}</p>
              ) : null}
              <div className="mt-2">
                <JobProgressView progress={job.progress} brief closed={job.closedAt !== null} />
              </div>
            </li>
          );
        })}
      </ul>
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Jobs · Tankside" }];
