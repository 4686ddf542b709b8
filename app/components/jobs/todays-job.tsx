import { Link } from "react-router";
import { fmt } from "~/lib/field-math/units";
import { siteLine, type JobSummary, type PlanDay } from "~/lib/jobs/today";

/** The crew's home: where they are working today, with whom and on which rigs. */
export function TodaysJob({ job, day, personId }: { job: JobSummary; day: PlanDay | null; personId: number }) {
  const site = siteLine(job);
  const others = day?.people.filter((p) => p.id !== personId).map((p) => p.name) ?? [];
  return (
    <section aria-labelledby="todays-job-h" className="mb-4 rounded-lg border-4 border-ink bg-paper p-4">
      <h2 id="todays-job-h" className="text-sm font-bold tracking-wide uppercase">
        Today&apos;s job
      </h2>
      <Link to={`/jobs/${job.id}`} className="text-2xl font-bold">
        {job.name}
      </Link>
      <p>
        {job.customer}
        {site ? ` · ${site}` : ""}
        {job.elevationFt !== null ? ` · elevation ${fmt(job.elevationFt)} ft` : ""}
      </p>
      {day ? (
        <p className="mt-1 font-bold">
          {day.rigCodes.length ? `Rigs: ${day.rigCodes.join(", ")}` : "No rig planned"}
          {others.length ? ` · with ${others.join(", ")}` : " · just you"}
        </p>
      ) : null}
      <p className="mt-1">{fmt(job.remainingAcres, 2)} acres left to spray.</p>
    </section>
  );
}
