import { Link } from "react-router";
import { useTranslation } from "react-i18next";
import { PageTitle } from "~/components/ui/page-title";
import { forEveryone, navFor } from "~/lib/navigation";
import { hiddenSections } from "~/services/env.server";
import { lastRigIdFor } from "~/services/cases.server";
import { requireUser } from "~/services/guards.server";
import { listRigs } from "~/services/rigs.server";
import { serviceToDo } from "~/services/service.server";
import { ServiceToDo } from "~/components/service-to-do";
import { PhoneReadiness } from "~/components/offline/phone-readiness";
import { serverOrPhone } from "~/components/offline/server-or-phone";
import { lastRigOnPhone } from "~/lib/walk/kept";
import { upcomingPlan } from "~/services/jobs.server";
import { jobOn, type KeptJobs } from "~/lib/jobs/today";
import { isoInZone } from "~/lib/format";
import { TodaysJob } from "~/components/jobs/todays-job";
import { useTimes } from "~/components/use-time-zone";
import { useNavText } from "~/components/ui/nav-text";
import type { Route } from "./+types/home";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const [rigs, lastRigId, service, upcoming] = await Promise.all([listRigs(user), lastRigIdFor(user), serviceToDo(user), upcomingPlan(user, 1)]);
  return {
    personId: user.id,
    role: user.role,
    firstName: user.name.split(" ")[0],
    rigs: lastFirst(
      rigs.map((r): HomeRig => ({ code: r.code, name: r.name, tankGal: r.tankGal, mount: r.mount })),
      rigs.find((r) => r.id === lastRigId)?.code ?? null,
    ),
    lastRigCode: rigs.find((r) => r.id === lastRigId)?.code ?? null,
    hidden: hiddenSections(),
    service,
    today: todaysJobFor(upcoming, upcoming.today, user.id),
  };
}

/** The job this person is on today, and that day's plan of it (rigs and people). */
function todaysJobFor(kept: KeptJobs | undefined, day: string, personId: number) {
  const id = kept ? jobOn(kept.plan, day, { personId }) : null;
  const job = kept?.jobs.find((j) => j.id === id);
  return job ? { job, day: kept!.plan.find((p) => p.day === day && p.jobId === job.id) ?? null } : null;
}

type HomeRig = { code: string; name: string; tankGal: number; mount: string };

/** The rig this person worked on last comes first: it is usually the one acting up again. */
const lastFirst = (rigs: HomeRig[], last: string | null) => [...rigs].sort((a, b) => Number(b.code === last) - Number(a.code === last));

/** With no signal, the rigs come from what the phone keeps. */
export async function clientLoader({ serverLoader }: Route.ClientLoaderArgs) {
  return serverOrPhone(serverLoader, (kit) => {
    // The last rig: one worked on with no signal since the kit was made, else the server's.
    const last = lastRigOnPhone(window.localStorage, kit.madeAt) ?? kit.lastRigCode;
    return {
      personId: kit.person.id,
      role: kit.person.role,
      firstName: kit.person.name.split(" ")[0],
      rigs: lastFirst(
        kit.rigs.map((r) => ({ code: r.code, name: r.name, tankGal: r.tankGal, mount: r.mount })),
        last,
      ),
      lastRigCode: last,
      hidden: kit.hidden,
      // What service is due needs the server's records: with no signal the list waits.
      service: [],
      today: todaysJobFor(kit.jobs, isoInZone(new Date(), kit.person.timeZone).slice(0, 10), kit.person.id),
    };
  });
}

export default function Home({ loaderData }: Route.ComponentProps) {
  const { rigs, role, firstName, lastRigCode, hidden, personId, service, today } = loaderData;
  const more = navFor(role).filter((item) => !forEveryone(item) && !hidden.includes(item.to));
  const { t } = useTranslation();
  const { number } = useTimes();
  const nav = useNavText();
  return (
    <>
      <PageTitle lead={t("home.lead")}>{t("home.title", { name: firstName })}</PageTitle>
      <PhoneReadiness personId={personId} />
      {today ? <TodaysJob job={today.job} day={today.day} personId={personId} /> : null}
      {rigs.length === 0 ? (
        <p className="rounded-md bg-paper p-4">{t("home.noRigs")}</p>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2">
          {rigs.map((rig) => (
            <li key={rig.code}>
              <Link
                to={`/rigs/${rig.code}/fix`}
                className="flex min-h-20 flex-col justify-center rounded-lg border-2 border-ink bg-paper px-4 py-3 text-ink no-underline"
              >
                <span className="text-2xl font-bold">
                  {rig.code}
                  {rig.code === lastRigCode ? <span className="ml-2 text-base font-normal">{t("home.lastRig")}</span> : null}
                </span>
                <span>{t("home.rigLine", { name: rig.name, gal: number(rig.tankGal), mount: t(`mounts.${rig.mount as "truck"}`) })}</span>
              </Link>
              <Link
                to={`/rigs/${rig.code}/cards`}
                className="mt-2 flex min-h-14 items-center rounded-lg border-2 border-ink bg-field px-4 text-lg font-bold text-ink no-underline"
              >
                {t("home.cards", { code: rig.code })}
              </Link>
            </li>
          ))}
        </ul>
      )}
      <ServiceToDo lines={service} />
      {more.length ? (
        <section aria-labelledby="more-h" className="mt-8 rounded-lg bg-paper p-4">
          <h2 id="more-h" className="text-xl font-bold">
            {t("home.also", { role: t(`roles.${role}`).toLowerCase() })}
          </h2>
          <ul className="mt-2 space-y-2">
            {more.map((item) => (
              <li key={item.to}>
                <Link to={item.to} className="text-lg font-bold">
                  {nav.label(item)}
                </Link>
                <span className="block">{nav.about(item)}</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Tankside" }];
