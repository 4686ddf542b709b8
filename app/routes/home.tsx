import { Link } from "react-router";
import { PageTitle } from "~/components/ui/page-title";
import { hasRole } from "~/lib/roles";
import { lastRigIdFor } from "~/services/cases.server";
import { requireUser } from "~/services/guards.server";
import { listRigs } from "~/services/rigs.server";
import type { Route } from "./+types/home";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const [rigs, lastRigId] = await Promise.all([listRigs(user), lastRigIdFor(user)]);
  // The rig this person worked on last comes first: it is usually the one acting up again.
  rigs.sort((a, b) => Number(b.id === lastRigId) - Number(a.id === lastRigId));
  return { role: user.role, firstName: user.name.split(" ")[0], rigs, lastRigId };
}

export default function Home({ loaderData }: Route.ComponentProps) {
  const { rigs, role, firstName, lastRigId } = loaderData;
  return (
    <>
      <PageTitle lead="Pick the rig that is acting up.">Hi {firstName}. Which rig?</PageTitle>
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
      {hasRole(role, "trainer") ? (
        <section className="mt-8 rounded-lg bg-paper p-4">
          <h2 className="text-xl font-bold">For {role === "trainer" ? "trainers" : role === "admin" ? "admins" : "supervisors"}</h2>
          <p className="mt-1">
            {role === "admin"
              ? "Add, edit and retire rigs from the Rigs page."
              : role === "trainer"
                ? "The guide desk, where you write and version the troubleshooting guides, is coming next."
                : "The fault board and the case list, for recurring faults by rig, are coming next."}
          </p>
        </section>
      ) : null}
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Tankside" }];
