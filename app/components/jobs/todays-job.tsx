import { Link } from "react-router";
import { useTranslation } from "react-i18next";
import { useTimes } from "~/components/use-time-zone";
import { siteLine, type JobSummary, type PlanDay } from "~/lib/jobs/today";

/** The crew's home: where they are working today, with whom and on which rigs. */
export function TodaysJob({ job, day, personId }: { job: JobSummary; day: PlanDay | null; personId: number }) {
  const site = siteLine(job);
  const others = day?.people.filter((p) => p.id !== personId).map((p) => p.name) ?? [];
  const { t } = useTranslation();
  const { number } = useTimes();
  return (
    <section aria-labelledby="todays-job-h" className="mb-4 rounded-lg border-4 border-ink bg-paper p-4">
      <h2 id="todays-job-h" className="text-sm font-bold tracking-wide uppercase">
        {t("job.today")}
      </h2>
      <Link to={`/jobs/${job.id}`} className="text-2xl font-bold">
        {job.name}
      </Link>
      <p>
        {job.customer}
        {site ? ` · ${site}` : ""}
        {job.elevationFt !== null ? t("job.elevation", { ft: number(job.elevationFt) }) : ""}
      </p>
      {day ? (
        <p className="mt-1 font-bold">
          {day.rigCodes.length ? t("job.rigs", { codes: day.rigCodes.join(", ") }) : t("job.noRig")}
          {others.length ? t("job.with", { names: others.join(", ") }) : t("job.justYou")}
        </p>
      ) : null}
      <p className="mt-1">{t("job.acresLeft", { acres: number(job.remainingAcres, 2) })}</p>
    </section>
  );
}
