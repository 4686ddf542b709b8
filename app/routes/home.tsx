import { Link } from "react-router";
import { PageTitle } from "~/components/ui/page-title";
import { forEveryone, navFor } from "~/lib/navigation";
import { ROLE_LABELS } from "~/lib/people/roles";
import { hiddenSections } from "~/services/env.server";
import { lastRigIdFor } from "~/services/cases.server";
import { requireUser } from "~/services/guards.server";
import { listRigs } from "~/services/rigs.server";
import { PhoneReadiness } from "~/components/offline/phone-readiness";
import { serverOrPhone } from "~/components/offline/server-or-phone";
import type { Route } from "./+types/home";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const [rigs, lastRigId] = await Promise.all([listRigs(user), lastRigIdFor(user)]);
  // The rig this person worked on last comes first: it is usually the one acting up again.
  rigs.sort((a, b) => Number(b.id === lastRigId) - Number(a.id === lastRigId));
  return {
    personId: user.id,
    role: user.role,
    firstName: user.name.split(" ")[0],
    rigs: rigs.map((r): HomeRig => ({ id: r.id, code: r.code, name: r.name, tankGal: r.tankGal, mount: r.mount })),
    lastRigId,
    hidden: hiddenSections(),
  };
}

type HomeRig = { id: number; code: string; name: string; tankGal: number; mount: string };

/** With no signal, the rigs come from what the phone keeps. */
export async function clientLoader({ serverLoader }: Route.ClientLoaderArgs) {
  return serverOrPhone(serverLoader, (kit) => ({
    personId: kit.person.id,
    role: kit.person.role,
    firstName: kit.person.name.split(" ")[0],
    rigs: kit.rigs.map((r) => ({ id: 0, code: r.code, name: r.name, tankGal: r.tankGal, mount: r.mount })),
    lastRigId: null,
    hidden: kit.hidden,
  }));
}

export default function Home({ loaderData }: Route.ComponentProps) {
  const { rigs, role, firstName, lastRigId, hidden, personId } = loaderData;
  const more = navFor(role).filter((item) => !forEveryone(item) && !hidden.includes(item.to));
  return (
    <>
      <PageTitle lead="Pick the rig that is acting up.">Hi {firstName}. Which rig?</PageTitle>
      <PhoneReadiness personId={personId} />
      {rigs.length === 0 ? (
        <p className="rounded-md bg-paper p-4">Your company has no active rigs yet. An admin can add them under Rigs.</p>
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
                  {rig.id === lastRigId ? <span className="ml-2 text-base font-normal">(your last rig)</span> : null}
                </span>
                <span>
                  {rig.name} · {rig.tankGal.toLocaleString("en-US")} gal {rig.mount}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
      {more.length ? (
        <section aria-labelledby="more-h" className="mt-8 rounded-lg bg-paper p-4">
          <h2 id="more-h" className="text-xl font-bold">
            Also yours as {ROLE_LABELS[role].toLowerCase()}
          </h2>
          <ul className="mt-2 space-y-2">
            {more.map((item) => (
              <li key={item.to}>
                <Link to={item.to} className="text-lg font-bold">
                  {item.label}
                </Link>
                <span className="block">{item.about}</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Tankside" }];
