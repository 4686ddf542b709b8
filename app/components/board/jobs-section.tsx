import { Link } from "react-router";
import { fmt } from "~/lib/field-math/units";
import { jobLabel } from "~/lib/jobs/today";
import type { JobBoardRow } from "~/lib/stats/job-board";

const h = (v: number | null, digits = 1) => (v === null ? "—" : fmt(v, digits));

/** "A, B and C": names that may hold commas themselves, joined so they stay apart. */
const listed = (names: string[]) => (names.length > 1 ? `${names.slice(0, -1).join("; ")} and ${names.at(-1)}` : (names[0] ?? ""));

/** Faults and downtime per job, beside the rigs table: which sites are hard on rigs. Jobs with no fault are counted, not listed. */
export function JobsSection({ jobs, causeName }: { jobs: JobBoardRow[]; causeName: (code: string) => string }) {
  const hard = jobs.filter((j) => j.hardOnRigs);
  const shown = jobs.filter((j) => j.faults > 0);
  const quiet = jobs.filter((j) => j.faults === 0);
  return (
    <section aria-labelledby="jobs-h" className="mt-6">
      <h2 id="jobs-h" className="text-2xl font-bold">
        Jobs
      </h2>
      {jobs.length === 0 ? (
        <p>No job had rigs planned or faults in this window.</p>
      ) : (
        <>
          {hard.length ? (
            <p className="mt-1 rounded-md border-4 border-stop bg-paper p-3 text-lg">
              Hard on rigs: <strong>{listed(hard.map(jobLabel))}</strong>, with more faults per rig-day than the other jobs
              {hard[0].topCause ? ` (most often ${causeName(hard[0].topCause.code).toLowerCase()} at the first)` : ""}.
            </p>
          ) : null}
          {shown.length ? (
            <div className="mt-2 overflow-x-auto rounded-lg border-2 border-ink bg-paper" tabIndex={0} role="region" aria-label="Jobs table">
              <table className="w-full min-w-[46rem] border-collapse text-left">
                <thead>
                  <tr className="border-b-2 border-ink">
                    {[
                      "Job",
                      "Elevation",
                      "Rig-days",
                      "Faults",
                      "Per 10 rig-days (95 % range)",
                      "Downtime",
                      "Most frequent cause",
                      "Open hand-offs",
                      "Flag",
                    ].map((c) => (
                      <th key={c} scope="col" className="p-2">
                        {c}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {shown.map((j) => (
                    <tr key={j.jobId} className={`border-b border-rule ${j.hardOnRigs ? "bg-caution" : ""}`}>
                      <th scope="row" className="p-2">
                        <Link to={`/jobs/${j.jobId}`}>{jobLabel(j)}</Link>
                        {j.closed ? " (closed)" : ""}
                      </th>
                      <td className="p-2">{j.elevationFt === null ? "—" : `${fmt(j.elevationFt)} ft`}</td>
                      <td className="p-2">{j.rigDays}</td>
                      <td className="p-2">{j.faults}</td>
                      <td className="p-2">{j.per10RigDays === null ? "no rig planned" : `${h(j.per10RigDays)} (${h(j.range!.lower)}–${h(j.range!.upper)})`}</td>
                      <td className="p-2">{h(j.downtimeHours)} h</td>
                      <td className="p-2">{j.topCause ? `${causeName(j.topCause.code)} (${j.topCause.count})` : "—"}</td>
                      <td className="p-2">{j.openHandoffs}</td>
                      <td className="p-2 font-bold">{j.hardOnRigs ? `Hard on rigs (others ${h(j.othersPer10RigDays)})` : ""}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
          {quiet.length ? (
            <p className="mt-2">
              {quiet.length} other job{quiet.length === 1 ? "" : "s"} had no fault ({quiet.reduce((s, j) => s + j.rigDays, 0)} rig-days).
            </p>
          ) : null}
          <p className="mt-1 text-sm">
            Faults: fixed or handed off, on the job the rig was planned on that day. Rig-days: each rig planned on the job on each day of the window up to
            today. Range: exact Poisson (Garwood); a job is flagged when its whole range lies above the other jobs&apos; rate.
          </p>
        </>
      )}
    </section>
  );
}
