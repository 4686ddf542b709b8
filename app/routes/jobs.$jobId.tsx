import { Form, Link, useNavigation } from "react-router";
import { JobProgressView } from "~/components/jobs/job-progress";
import { ConfirmAction } from "~/components/ui/confirm-action";
import { DoneNote } from "~/components/ui/done-note";
import { ErrorList } from "~/components/ui/error-list";
import { PageTitle } from "~/components/ui/page-title";
import { useTimes } from "~/components/use-time-zone";
import { MATERIAL_KIND_LABELS } from "~/lib/field-math/load-rules";
import { fmt, ftToM } from "~/lib/field-math/units";
import { formatDay } from "~/lib/format";
import { jobPlanSchema } from "~/lib/jobs/schema";
import { siteLine } from "~/lib/jobs/today";
import { parseForm } from "~/lib/forms/parse";
import { can } from "~/lib/permissions";
import { fail, refused, refusedForm, requirePermission } from "~/services/guards.server";
import { jobDetail, planJob, plannablePeople, setJobClosed, todayIn } from "~/services/jobs.server";
import { readForm } from "~/services/read-request.server";
import { listRigs } from "~/services/rigs.server";
import type { Route } from "./+types/jobs.$jobId";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "read-jobs");
  const detail = await jobDetail(user, Number(params.jobId));
  const canManage = can(user, "manage-jobs");
  const [rigs, people] = canManage ? await Promise.all([listRigs(user), plannablePeople(user)]) : [[], []];
  return {
    ...detail,
    today: todayIn(user.timeZone),
    canManage,
    canReadCases: can(user, "read-cases"),
    rigs: rigs.map((r) => ({ code: r.code, name: r.name })),
    people,
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "manage-jobs");
  const form = await readForm(request);
  const intent = form.get("intent");
  const id = Number(params.jobId);
  if (intent === "plan") {
    const submission = parseForm(form, jobPlanSchema);
    if (submission.status !== "success") return refusedForm(submission);
    const planned = await planJob(user, id, submission.value);
    return planned.ok ? { done: "plan" as const } : refused(409, planned.error);
  }
  if (intent === "close" || intent === "reopen") {
    if (intent === "close" && form.get("confirmed") !== "yes") fail(400, "Confirm closing the job.");
    await setJobClosed(user, id, intent === "close");
    return { done: intent };
  }
  fail(400, "Say what to do: plan, close or reopen.");
}

export default function JobPage({ loaderData, actionData }: Route.ComponentProps) {
  const { job, progress, days, today, canManage, canReadCases, rigs, people } = loaderData;
  const times = useTimes();
  const site = siteLine(job);
  const ahead = days.filter((d) => d.day >= today);
  const past = days.filter((d) => d.day < today).reverse();
  const busy = useNavigation().state !== "idle";
  // The load card for the rig on the job today (else the last rig on it): the tank sizes the loads.
  const todaysRig = days.find((d) => d.day === today)?.rigCodes[0] ?? past[0]?.rigCodes[0] ?? ahead[0]?.rigCodes[0];
  const refusal = actionData && "error" in actionData ? actionData : null;
  return (
    <>
      <PageTitle lead={`${job.customer}${job.closedAt ? ` · closed ${times.date(job.closedAt)}` : ""}`}>{job.name}</PageTitle>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-lg border-2 border-ink bg-paper p-4">
        {site ? (
          <>
            <dt className="font-bold">Site</dt>
            <dd>
              {site}
              {job.latitude !== null && job.longitude !== null ? (
                <>
                  {" "}
                  (<a href={`geo:${job.latitude},${job.longitude}`}>open in maps</a>)
                </>
              ) : null}
            </dd>
          </>
        ) : null}
        <dt className="font-bold">Elevation</dt>
        <dd>{job.elevationFt === null ? "not recorded: the suction check asks for it" : `${fmt(job.elevationFt)} ft (${fmt(ftToM(job.elevationFt))} m)`}</dd>
        <dt className="font-bold">Dates</dt>
        <dd>
          {formatDay(job.startsOn)}
          {job.endsOn ? ` to ${formatDay(job.endsOn)}` : ", no end date set"}
        </dd>
        <dt className="font-bold">Area</dt>
        <dd>
          {fmt(job.areaAcres, 2)} acres × {job.passes} pass{job.passes === 1 ? "" : "es"}
        </dd>
        {job.waterGalPerAcre !== null ? (
          <>
            <dt className="font-bold">Water</dt>
            <dd>{fmt(job.waterGalPerAcre)} gal per acre</dd>
          </>
        ) : null}
        {job.notes ? (
          <>
            <dt className="font-bold">Notes</dt>
            <dd className="whitespace-pre-line">{job.notes}</dd>
          </>
        ) : null}
      </dl>

      <section aria-labelledby="spec-h" className="mt-6">
        <h2 id="spec-h" className="text-2xl font-bold">
          Spec per acre
        </h2>
        <ul className="mt-2 space-y-1 rounded-lg border-2 border-ink bg-paper p-4">
          {job.materials.map((m) => (
            <li key={m.name}>
              <span className="font-bold">{m.name}</span>: {fmt(m.lbPerAcre)} lb per acre · {MATERIAL_KIND_LABELS[m.kind].toLowerCase()}
              {m.bagLb ? ` · ${fmt(m.bagLb)} lb bags` : ""}
            </li>
          ))}
        </ul>
        {job.closedAt ? null : (
          <Link
            to={`/field-math/load?job=${job.id}${todaysRig ? `&rig=${todaysRig}` : ""}`}
            className="mt-3 flex min-h-14 items-center justify-center rounded-md bg-go px-4 text-lg font-bold text-white no-underline"
          >
            Load card for this job
          </Link>
        )}
      </section>

      <section aria-labelledby="progress-h" className="mt-6">
        <h2 id="progress-h" className="text-2xl font-bold">
          Progress
        </h2>
        <div className="mt-2 rounded-lg border-2 border-ink bg-paper p-4">
          <JobProgressView progress={progress} closed={job.closedAt !== null} />
          <p className="mt-2 text-sm">
            Area from the loads marked sprayed on the load card; faults, downtime (start to close of each fix) and hand-offs from the cases on this job.
          </p>
          {canReadCases ? (
            <p className="mt-2 flex flex-wrap gap-4 font-bold">
              <Link to={`/cases?job=${job.id}`}>Fixes on this job</Link>
              <Link to={`/cases?kind=card&job=${job.id}`}>Rig cards on this job</Link>
            </p>
          ) : null}
        </div>
      </section>

      <section aria-labelledby="plan-h" className="mt-6">
        <h2 id="plan-h" className="text-2xl font-bold">
          Who is on it
        </h2>
        {ahead.length === 0 ? <p className="mt-2">No days planned from today on.</p> : null}
        <PlanList days={ahead} today={today} />
        {past.length ? (
          <details className="mt-3">
            <summary className="min-h-12 cursor-pointer py-2 font-bold">Earlier days ({past.length})</summary>
            <PlanList days={past} today={today} />
          </details>
        ) : null}
      </section>

      {canManage && !job.closedAt ? (
        <section aria-labelledby="plan-form-h" className="mt-6">
          <h2 id="plan-form-h" className="text-2xl font-bold">
            Plan days
          </h2>
          <Form method="post" className="mt-2 space-y-4 rounded-lg border-2 border-ink bg-paper p-4">
            <p>
              The rigs and people ticked go on this job for every day from the first to the last, replacing what those days had. Nothing ticked clears them.
            </p>
            {refusal ? <ErrorList id="plan-error" error={refusal.error} problems={refusal.problems} /> : null}
            <DoneNote message={actionData && "done" in actionData && actionData.done === "plan" ? "Plan saved." : null} />
            <div className="grid gap-3 sm:grid-cols-2">
              <label className="block font-bold">
                First day
                <input
                  type="date"
                  name="from"
                  required
                  defaultValue={today}
                  className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
                />
              </label>
              <label className="block font-bold">
                Last day (blank: the first day only)
                <input type="date" name="to" className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg" />
              </label>
            </div>
            <fieldset>
              <legend className="font-bold">Rigs</legend>
              <div className="mt-1 grid gap-2 sm:grid-cols-2">
                {rigs.map((r) => (
                  <label key={r.code} className="flex min-h-12 items-center gap-3 rounded-md border-2 border-rule px-3">
                    <input type="checkbox" name="rigs" value={r.code} className="h-6 w-6" />
                    <span>
                      <span className="font-bold">{r.code}</span> {r.name}
                    </span>
                  </label>
                ))}
              </div>
            </fieldset>
            <fieldset>
              <legend className="font-bold">People</legend>
              <div className="mt-1 grid gap-2 sm:grid-cols-2">
                {people.map((p) => (
                  <label key={p.id} className="flex min-h-12 items-center gap-3 rounded-md border-2 border-rule px-3">
                    <input type="checkbox" name="people" value={p.id} className="h-6 w-6" />
                    <span>{p.name}</span>
                  </label>
                ))}
              </div>
            </fieldset>
            <button type="submit" name="intent" value="plan" disabled={busy} className="min-h-14 w-full rounded-md bg-go text-lg font-bold text-white">
              Save the plan for these days
            </button>
          </Form>
        </section>
      ) : null}

      {canManage ? (
        <section aria-label="Change this job" className="mt-6 space-y-3">
          <Link to={`/jobs/${job.id}/edit`} className="flex min-h-12 items-center rounded-md border-2 border-ink bg-paper px-4 font-bold no-underline">
            Edit the site, spec or dates
          </Link>
          {job.closedAt ? (
            <Form method="post">
              <button name="intent" value="reopen" className="min-h-12 w-full rounded-md border-2 border-ink bg-paper px-4 font-bold">
                Open this job again
              </button>
            </Form>
          ) : (
            <ConfirmAction
              label="Close this job"
              question={`Close ${job.name}? It leaves the crews' screens and the load card, its days after today are released for other jobs, and it takes no more plans; its cases and loads stay.`}
              confirmLabel={`Yes, close ${job.name}`}
              intent="close"
            />
          )}
        </section>
      ) : null}
    </>
  );
}

function PlanList({ days, today }: { days: { day: string; rigCodes: string[]; people: { id: number; name: string }[] }[]; today: string }) {
  if (!days.length) return null;
  return (
    <ul className="mt-2 divide-y divide-rule rounded-lg border-2 border-ink bg-paper">
      {days.map((d) => (
        <li key={d.day} className="p-3">
          <span className="font-bold">
            {d.day === today ? "Today, " : ""}
            {formatDay(d.day)}
          </span>
          <span className="block">
            {d.rigCodes.length ? d.rigCodes.join(", ") : "no rig"} · {d.people.length ? d.people.map((p) => p.name).join(", ") : "nobody planned"}
          </span>
        </li>
      ))}
    </ul>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.job.name ?? "Job"} · Tankside` }];
