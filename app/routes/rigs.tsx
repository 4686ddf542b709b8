import { Link } from "react-router";
import { ButtonLink } from "~/components/ui/button-link";
import { PageTitle } from "~/components/ui/page-title";
import { requireUser } from "~/services/guards.server";
import { listRigs } from "~/services/rigs.server";
import { can } from "~/lib/permissions";
import type { Route } from "./+types/rigs";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  return { rigs: await listRigs(user, { includeRetired: true }), canEdit: can(user, "edit-rigs") };
}

export default function Rigs({ loaderData }: Route.ComponentProps) {
  const { rigs, canEdit } = loaderData;
  return (
    <>
      <PageTitle lead={`${rigs.filter((r) => !r.retired).length} in service`}>Rigs</PageTitle>
      {canEdit ? (
        <ButtonLink to="/rigs/new" className="mb-4 sm:w-60">
          Add a rig
        </ButtonLink>
      ) : null}
      <ul className="space-y-3">
        {rigs.map((rig) => (
          <li key={rig.code} className={`rounded-lg border-2 bg-paper p-4 ${rig.retired ? "border-dashed border-rule" : "border-ink"}`}>
            <Link to={`/rigs/${rig.code}`} className="text-2xl font-bold">
              {rig.code}
            </Link>
            <p>
              {rig.name} · {rig.mount} · {rig.tankGal.toLocaleString("en-US")} gal · {rig.engineHours.toLocaleString("en-US")} engine h
              {rig.retired ? " · retired" : ""}
            </p>
          </li>
        ))}
      </ul>
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Rigs · Tankside" }];
