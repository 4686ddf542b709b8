import { Form, Link } from "react-router";
import { PageTitle } from "~/components/ui/page-title";
import { fmt, ftToM, galToL, inToMm } from "~/lib/field-math/units";
import { cardStateLabel, outcomeLabel } from "~/lib/vocabulary";
import { recentRigCases } from "~/services/cases.server";
import { cardsOnRig, type CardDone } from "~/services/cards.server";
import { fail, requirePermission, requireUser } from "~/services/guards.server";
import { ConfirmAction } from "~/components/ui/confirm-action";
import { findRig, setRigRetired } from "~/services/rigs.server";
import { serviceLines } from "~/services/service.server";
import { serviceCounts } from "~/lib/rigs/service";
import { useTimes } from "~/components/use-time-zone";
import { readForm } from "~/services/read-request.server";
import { can } from "~/lib/permissions";
import { serverOrPhoneRig } from "~/components/offline/server-or-phone";
import { useOnline } from "~/components/offline/use-online";
import { walkRigOf } from "~/lib/rigs/specs";
import type { KitRig } from "~/lib/walk/kept";
import type { Route } from "./+types/rigs.$code";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const found = await findRig(user, params.code);
  const rig: RigView = { ...walkRigOf(found), mount: found.mount, pumpKind: found.pumpKind, retired: found.retired, notes: found.notes };
  const [cases, cards, service] = await Promise.all([
    recentRigCases(user, found.id),
    cardsOnRig(user, found.id, { limit: 8 }),
    serviceLines(user, { rigId: found.id }),
  ]);
  return {
    rig,
    canEdit: can(user, "edit-rigs"),
    canReadCases: can(user, "read-cases"),
    cases,
    cards,
    service: serviceCounts(service) as ReturnType<typeof serviceCounts> | null,
    fromPhone: false,
  };
}

type RigView = KitRig & { retired: boolean; notes: string | null };

/** With no signal, the rig's specs come from what the phone keeps (its recent cases need signal). */
export async function clientLoader({ params, serverLoader }: Route.ClientLoaderArgs) {
  return serverOrPhoneRig(serverLoader, params.code, (kept) => {
    const rig: RigView = { ...kept, retired: false, notes: null };
    return { rig, canEdit: false, canReadCases: false, cases: [], cards: [] as CardDone[], service: null, fromPhone: true };
  });
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "edit-rigs");
  const form = await readForm(request);
  const intent = form.get("intent");
  if (intent !== "retire" && intent !== "reinstate") fail(400, "Say what to do: retire or reinstate.");
  if (intent === "retire" && form.get("confirmed") !== "yes") fail(400, "Confirm retiring the rig.");
  await setRigRetired(user, params.code, intent === "retire");
  return { ok: true };
}

export default function RigPage({ loaderData }: Route.ComponentProps) {
  const times = useTimes();
  const { rig, canEdit, cases, cards, service, fromPhone } = loaderData;
  // A page the phone kept earlier, opened with no signal, says so: its hours and cases may be old.
  const stale = !useOnline() && !fromPhone;
  const specs: [string, string][] = [
    ["Mount", rig.mount],
    ["Tank", `${fmt(rig.tankGal)} gal (${fmt(galToL(rig.tankGal))} L)`],
    ["Pump", rig.pumpKind],
    ["Engine hours", rig.hasHourMeter ? `${fmt(rig.engineHours, 1)} h` : "no hour meter"],
    ["Hose", `${fmt(rig.hoseLengthFt)} ft (${fmt(ftToM(rig.hoseLengthFt))} m) of ${rig.hoseDiameterIn} in (${fmt(inToMm(rig.hoseDiameterIn))} mm)`],
    ["Yard elevation", `${fmt(rig.yardElevationFt)} ft (${fmt(ftToM(rig.yardElevationFt))} m)`],
    ["Agitator mixes in", rig.agitatorMixes],
    ["Pump rated at", rig.pumpRatedGpm !== null && rig.pumpRatedPsi !== null ? `${fmt(rig.pumpRatedGpm)} gpm at ${fmt(rig.pumpRatedPsi)} psi` : "not recorded"],
    [
      "Suction the pump needs (from its curve)",
      rig.pumpNpshrFt !== null ? `${fmt(rig.pumpNpshrFt, 1)} ft (${fmt(ftToM(rig.pumpNpshrFt), 1)} m)` : "not recorded",
    ],
    ["Carrier payload rating", rig.carrierRatingLb !== null ? `${fmt(rig.carrierRatingLb)} lb` : "not recorded"],
  ];
  return (
    <>
      <PageTitle lead={rig.name}>
        {rig.code}
        {rig.retired ? <span className="ml-3 rounded bg-ink px-2 py-1 align-middle text-base text-white">retired</span> : null}
      </PageTitle>
      {rig.retired ? null : (
        <div className="mb-4 grid gap-3 sm:grid-cols-2">
          <Link to="fix" className="flex min-h-16 items-center justify-center rounded-lg bg-go text-xl font-bold text-white no-underline">
            Start a fix on {rig.code}
          </Link>
          <Link to="cards" className="flex min-h-16 items-center justify-center rounded-lg border-4 border-go bg-paper text-xl font-bold text-ink no-underline">
            Rig cards: pre-start and the day
          </Link>
          <Link
            to="label"
            className="flex min-h-16 items-center justify-center rounded-lg border-2 border-ink bg-paper text-lg font-bold text-ink no-underline"
          >
            Print the rig label
          </Link>
        </div>
      )}
      {stale ? (
        <p role="status" className="mb-4 rounded-md border-2 border-ink bg-caution px-3 py-2 font-bold">
          No signal: this page is as this phone last kept it. Engine hours and recent cases may be out of date.
        </p>
      ) : null}
      <section aria-labelledby="specs" className="rounded-lg border-2 border-ink bg-paper p-4">
        <h2 id="specs" className="text-xl font-bold">
          Specs
        </h2>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-2">
          {specs.map(([k, v]) => (
            <div key={k} className="contents">
              <dt className="font-bold">{k}</dt>
              <dd>{v}</dd>
            </div>
          ))}
        </dl>
        <h3 className="mt-4 font-bold">Nozzle tips</h3>
        {rig.nozzleTips.length ? (
          <table className="mt-1 w-full text-left">
            <thead>
              <tr>
                <th scope="col">Tip</th>
                <th scope="col">Rated reach</th>
                <th scope="col">Pattern width</th>
              </tr>
            </thead>
            <tbody>
              {rig.nozzleTips.map((tip) => (
                <tr key={tip.name}>
                  <td>{tip.name}</td>
                  <td>
                    {fmt(tip.reachFt)} ft ({fmt(ftToM(tip.reachFt), 1)} m)
                  </td>
                  <td>
                    {fmt(tip.widthFt)} ft ({fmt(ftToM(tip.widthFt), 1)} m)
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : (
          <p>No tips recorded.</p>
        )}
        {rig.notes ? <p className="mt-4 whitespace-pre-line">{rig.notes}</p> : null}
      </section>
      {service ? (
        <section aria-labelledby="service" className="mt-5 rounded-lg border-2 border-ink bg-paper p-4">
          <h2 id="service" className="text-xl font-bold">
            Service
          </h2>
          <p className={service.overdue ? "font-bold text-stop" : undefined}>
            {service.total === 0
              ? "No routine service set for this rig."
              : service.toDo === 0
                ? `All ${service.total} up to date.`
                : `${service.toDo} of ${service.total} to do${service.overdue ? `, ${service.overdue} overdue` : ""}.`}
          </p>
          <Link to={`/rigs/${rig.code}/service`} className="mt-2 flex min-h-12 items-center font-bold">
            Service for {rig.code}: what is due, record it done
          </Link>
        </section>
      ) : null}
      <section aria-labelledby="recent" className="mt-5">
        <h2 id="recent" className="text-xl font-bold">
          Recent cases
        </h2>
        {fromPhone ? (
          <p className="mt-1">No signal: recent cases show when there is signal. The specs above are as this phone last kept them.</p>
        ) : cases.length ? (
          <ul className="mt-2 space-y-2">
            {cases.map((c) => (
              <li key={c.id} className="rounded-md border-2 border-rule bg-paper p-3">
                <Link to={`/cases/${c.id}`} className="font-bold">
                  {c.guideTitle}
                </Link>
                <p>
                  {outcomeLabel(c.outcome)} · {times.dateTime(c.openedAt)} · {c.openedBy ?? "—"}
                </p>
              </li>
            ))}
          </ul>
        ) : (
          <p className="mt-1">No cases yet.</p>
        )}
      </section>
      {fromPhone ? null : (
        <section aria-labelledby="cards-h" className="mt-5">
          <h2 id="cards-h" className="text-xl font-bold">
            Recent cards
          </h2>
          {cards.length ? (
            <ul className="mt-2 space-y-2">
              {cards.map((c) => (
                <li key={c.id}>
                  {/* The whole box is the link: a small title is hard to hit with a glove. */}
                  <Link to={`/cases/${c.id}`} className="block rounded-md border-2 border-rule bg-paper p-3 text-ink no-underline">
                    <span className="font-bold underline">{c.title}</span>
                    <span className="block">
                      {cardStateLabel(c.outcome, c.gaps)} · {times.dateTime(c.openedAt)} · {c.by ?? "—"}
                      {c.engineHours !== null ? ` · ${c.engineHours.toLocaleString("en-US")} h` : ""}
                    </span>
                  </Link>
                </li>
              ))}
            </ul>
          ) : (
            <p className="mt-1">No cards yet.</p>
          )}
          {loaderData.canReadCases ? (
            <Link to={`/cases?kind=card&rig=${rig.code}`} className="mt-2 flex min-h-12 items-center font-bold">
              Every card on {rig.code}
            </Link>
          ) : null}
        </section>
      )}
      {canEdit ? (
        <div className="mt-4 flex flex-wrap gap-3">
          <Link to="edit" className="flex min-h-14 items-center rounded-md bg-go px-5 font-bold text-white no-underline">
            Edit rig
          </Link>
          {rig.retired ? (
            <Form method="post">
              <button name="intent" value="reinstate" className="min-h-14 rounded-md border-2 border-ink bg-paper px-5 font-bold">
                Put back in service
              </button>
            </Form>
          ) : (
            <ConfirmAction
              label="Retire rig"
              question={`Retire ${rig.code}? Crews can no longer start a fix on it; its cases stay on the board.`}
              confirmLabel={`Yes, retire ${rig.code}`}
              intent="retire"
            />
          )}
        </div>
      ) : null}
    </>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.rig.code ?? "Rig"} · Tankside` }];
