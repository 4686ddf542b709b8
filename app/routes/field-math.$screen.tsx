import { useTranslation } from "react-i18next";
import { Form, useSubmit } from "react-router";
import { HoseMath } from "~/components/field-math/hose";
import { LoadCardMath } from "~/components/field-math/load-card";
import { RateMath } from "~/components/field-math/rate";
import { TipMath } from "~/components/field-math/tip";
import { SuctionMath } from "~/components/field-math/suction";
import { TorqueMath } from "~/components/field-math/torque";
import { PageTitle } from "~/components/ui/page-title";
import { fieldMathScreen } from "~/lib/field-math/screens";
import { notFound, requireUser } from "~/services/guards.server";
import { rigSpecsFor } from "~/services/rigs.server";
import { loadRulesFor } from "~/services/company.server";
import { DEFAULT_LOAD_RULES } from "~/lib/field-math/load-rules";
import { serverOrPhone } from "~/components/offline/server-or-phone";
import { rigSpecsOf } from "~/lib/rigs/specs";
import { lastRigOnPhone } from "~/lib/walk/kept";
import { lastRigCodeFor } from "~/services/cases.server";
import { openJobSummaries, planAhead } from "~/services/jobs.server";
import { jobOn, keptJobAt, type JobSummary } from "~/lib/jobs/today";
import type { Route } from "./+types/field-math.$screen";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const screen = fieldMathScreen(params.screen);
  if (!screen) notFound("That field-math screen");
  const [rigs, rules, lastRig, jobs, upcoming] = await Promise.all([
    rigSpecsFor(user),
    loadRulesFor(user),
    lastRigCodeFor(user),
    openJobSummaries(user),
    planAhead(user, 1),
  ]);
  const query = new URL(request.url).searchParams;
  // The rig asked for, else the one this person last worked on (usually the one at hand), else the first.
  const wanted = query.get("rig")?.toUpperCase() ?? lastRig;
  const rig = rigs.find((r) => r.code === wanted) ?? rigs[0] ?? null;
  // Plans of open jobs only: a rig still on a job closed today falls back to its person's job.
  const open = upcoming.plan.filter((p) => jobs.some((j) => j.id === p.jobId));
  const job = chosenJob(query.get("job"), jobs, () => jobOn(open, upcoming.today, { rigCode: rig?.code, personId: user.id }));
  if (job === undefined) notFound(`Job ${query.get("job")}`);
  return {
    screen,
    rigs: rigs.map((r) => ({ code: r.code, name: r.name })),
    rig: rig ? { ...rig, job } : null,
    rules,
    jobs: jobs.map(({ id, name }) => ({ id, name })),
  };
}

/** With no signal, the rigs come from what the phone keeps: the math itself runs on the phone. */
export async function clientLoader({ request, params, serverLoader }: Route.ClientLoaderArgs) {
  return serverOrPhone(serverLoader, (kit) => {
    const screen = fieldMathScreen(params.screen);
    if (!screen) return null;
    const query = new URL(request.url).searchParams;
    const wanted = query.get("rig")?.toUpperCase() ?? lastRigOnPhone(window.localStorage, kit.madeAt) ?? kit.lastRigCode;
    const rig = kit.rigs.find((r) => r.code === wanted) ?? kit.rigs[0] ?? null;
    const jobs = kit.jobs?.jobs ?? [];
    const job = chosenJob(
      query.get("job"),
      jobs,
      () => keptJobAt(kit.jobs, new Date(), kit.person.timeZone, { rigCode: rig?.code, personId: kit.person.id })?.id ?? null,
    );
    return {
      screen,
      rigs: kit.rigs.map((r) => ({ code: r.code, name: r.name })),
      rig: rig ? { ...rigSpecsOf(rig), job: job ?? null } : null,
      rules: kit.loadRules ?? DEFAULT_LOAD_RULES,
      jobs: jobs.map(({ id, name }) => ({ id, name })),
    };
  });
}

/**
 * The job the screen works to: the one asked for ("none" for none), else today's job of the rig.
 * Undefined when the one asked for is not an open job of the company.
 */
function chosenJob(asked: string | null, jobs: JobSummary[], todays: () => number | null): JobSummary | null | undefined {
  if (asked === "none") return null;
  if (asked) return jobs.find((j) => String(j.id) === asked);
  const id = todays();
  return jobs.find((j) => j.id === id) ?? null;
}

/** The screens that work to a job: the load card (spec, area left) and the suction check (the site's elevation). */
const JOB_SCREENS = new Set(["load", "suction"]);

const SCREENS = { load: LoadCardMath, tip: TipMath, hose: HoseMath, suction: SuctionMath, torque: TorqueMath, rate: RateMath };

export default function FieldMathScreen({ loaderData }: Route.ComponentProps) {
  const { t } = useTranslation();
  const { screen, rigs, rig, rules, jobs } = loaderData;
  const submit = useSubmit();
  const Screen = SCREENS[screen.id];
  return (
    <>
      {/* The printed load card carries its own heading: job, date and rig. */}
      <div className={screen.id === "load" ? "print:hidden" : undefined}>
        <PageTitle lead={t(`fm.screens.${screen.id}.lead`)}>{t(`fm.screens.${screen.id}.title`)}</PageTitle>
      </div>
      {rigs.length && screen.id !== "rate" ? (
        <Form
          method="get"
          className="no-print mb-4 space-y-3"
          onChange={(e) => {
            // A new rig brings its own job for today: the job chosen for the old rig does not follow it.
            const form = new FormData(e.currentTarget);
            if ((e.target as HTMLElement).id === "rig") form.delete("job");
            submit(form, { method: "get" });
          }}
        >
          <label htmlFor="rig" className="block font-bold">
            {t("fm.screen.fromRig")}
          </label>
          <select id="rig" name="rig" defaultValue={rig?.code} className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg">
            {rigs.map((r) => (
              <option key={r.code} value={r.code}>
                {r.code} · {r.name}
              </option>
            ))}
          </select>
          {JOB_SCREENS.has(screen.id) && jobs.length ? (
            <div>
              <label htmlFor="job" className="block font-bold">
                {t("fm.screen.job")}
              </label>
              {/* Keyed on the rig and its job: a new rig brings its own job, and the box must show it. */}
              <select
                key={`${rig?.code}:${rig?.job?.id ?? "none"}`}
                id="job"
                name="job"
                defaultValue={rig?.job ? String(rig.job.id) : "none"}
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
              >
                <option value="none">{t("fm.screen.noJob")}</option>
                {jobs.map((j) => (
                  <option key={j.id} value={String(j.id)}>
                    {j.name}
                  </option>
                ))}
              </select>
            </div>
          ) : null}
          <noscript>
            <button className="mt-2 min-h-12 rounded-md border-2 border-ink px-3 font-bold">{t("fm.screen.useRig")}</button>
          </noscript>
        </Form>
      ) : null}
      {/* Re-mount on a new rig so every field starts from that rig's specs. */}
      <Screen key={`${rig?.code ?? "none"}:${rig?.job?.id ?? "none"}`} rig={rig ?? undefined} rules={rules} />
      {screen.id === "load" ? (
        <button type="button" onClick={() => window.print()} className="no-print mt-4 min-h-14 w-full rounded-md bg-go text-lg font-bold text-white">
          {t("fm.screen.print")}
        </button>
      ) : null}
    </>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.screen.title ?? "Field math"} · Tankside` }];
