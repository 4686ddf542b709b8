import { data, Form, Link, useNavigation } from "react-router";
import { ErrorList } from "~/components/ui/error-list";
import { ParetoChart, TrendChart } from "~/components/board/charts";
import { PageTitle } from "~/components/ui/page-title";
import { boardQuerySchema, type BoardQuery } from "~/lib/stats/board-query";
import { fmt } from "~/lib/field-math/units";
import { shortLabel } from "~/lib/format";
import { boardFor, jobBoardFor } from "~/services/board.server";
import { JobsSection } from "~/components/board/jobs-section";
import { careFor } from "~/services/care.server";
import { CareSection } from "~/components/board/care-section";
import { sendDigest } from "~/services/digest.server";
import { refusal, requirePermission } from "~/services/guards.server";
import { readQuery } from "~/services/read-request.server";
import { causeList } from "~/services/guides.server";
import { listRigs } from "~/services/rigs.server";
import { useTimes } from "~/components/use-time-zone";
import { can } from "~/lib/permissions";
import { serviceToDo } from "~/services/service.server";
import { ServiceToDo } from "~/components/service-to-do";
import type { Route } from "./+types/board";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "read-board");
  // A window the form got wrong keeps the person on the board: the default window, the message beside the form.
  let formError: string | null = null;
  let q: BoardQuery;
  try {
    q = readQuery(request, boardQuerySchema, "the window");
  } catch (thrown) {
    formError = refusal(thrown)?.error ?? null;
    if (!formError) throw thrown;
    q = boardQuerySchema.parse({});
  }
  const [board, rigs, service, care, jobs] = await Promise.all([
    boardFor(user, q),
    listRigs(user, { includeRetired: true }),
    serviceToDo(user),
    careFor(user, q),
    jobBoardFor(user, q),
  ]);
  return {
    board,
    formError,
    window: { from: q.fromDay, to: q.toDay, rig: q.rigCode ?? "", repeatDays: q.repeatDays },
    rigs: rigs.map((r) => r.code),
    causeNames: Object.fromEntries(causeList().map((c) => [c.code, c.name])),
    canSendDigest: can(user, "send-digest"),
    service,
    care,
    jobs,
  };
}

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "send-digest");
  // Said only once the mail server has taken it; a refusal is said as such, never a 500.
  const result = await sendDigest(user.companyId);
  return result.mailFailed ? data(result, { status: 502 }) : result;
}

const h = (v: number | null, digits = 0) => (v === null ? "—" : fmt(v, digits));

export default function BoardPage({ loaderData, actionData }: Route.ComponentProps) {
  const times = useTimes();
  const { board, window, rigs, causeNames, canSendDigest } = loaderData;
  const busy = useNavigation().state !== "idle";
  const name = (code: string) => causeNames[code] ?? code;
  const flagged = board.rigs.filter((r) => r.outOfLine);
  const worst = [...board.rigs].filter((r) => r.ratePer100h !== null).sort((a, b) => b.ratePer100h! - a.ratePer100h!)[0];
  const topCause = board.pareto[0];
  return (
    <>
      <PageTitle lead={`${window.from} to ${window.to}${window.rig ? ` · ${window.rig}` : " · all rigs"} · ${board.fleet.cases.toLocaleString("en-US")} cases`}>
        Fault board
      </PageTitle>

      <section aria-label="What to act on" className="grid gap-3 sm:grid-cols-2">
        <div className="rounded-lg border-4 border-stop bg-paper p-4">
          <h2 className="text-lg font-bold">Look at first</h2>
          {flagged.length ? (
            <p className="text-xl">
              <strong>{flagged.map((r) => r.rigCode).join(", ")}</strong> fail{flagged.length === 1 ? "s" : ""} more often than the rest of the fleet
              {flagged[0].ratePer100h !== null ? ` (${h(flagged[0].ratePer100h, 1)} vs ${h(flagged[0].fleetRatePer100h, 1)} per 100 engine hours)` : ""}.
            </p>
          ) : window.rig && worst ? (
            // One rig alone has no fleet to stand out from: say its rate, and where to compare it.
            <p className="text-xl">
              {worst.rigCode}: {h(worst.ratePer100h, 1)} faults per 100 engine hours. Choose “All rigs” to compare it with the fleet.
            </p>
          ) : worst ? (
            <p className="text-xl">
              No rig stands out from the fleet. Highest rate: {worst.rigCode}, {h(worst.ratePer100h, 1)} per 100 h.
            </p>
          ) : (
            <p>No engine hours recorded in this window.</p>
          )}
          <p className="mt-1 text-sm">A flag is a prompt to look, not a verdict: it means the rig's whole 95 % range sits above the others' rate.</p>
        </div>
        <div className="rounded-lg border-4 border-ink bg-paper p-4">
          <h2 className="text-lg font-bold">Most common cause</h2>
          {topCause ? (
            <p className="text-xl">
              <strong>{name(topCause.cause)}</strong>: {topCause.count} cases ({fmt(topCause.share * 100)} %), {h(topCause.downtimeHours, 1)} h of downtime.
            </p>
          ) : (
            <p>No causes found in this window.</p>
          )}
          <p className="mt-1 text-sm">Worth a word at the next tailgate meeting, or a guide change.</p>
        </div>
      </section>

      <section aria-labelledby="handoffs-h" className="mt-4">
        <h2 id="handoffs-h" className="text-2xl font-bold">
          Open hand-offs{board.openHandoffs.length ? ` (${board.openHandoffs.length})` : ""}
        </h2>
        {board.openHandoffs.length === 0 ? <p>None waiting.</p> : null}
        <ul className="mt-2 space-y-2">
          {board.openHandoffs.slice(0, 15).map((o) => (
            <li key={o.caseId} className="rounded-md border-2 border-rule bg-paper p-3">
              <Link to={`/cases/${o.caseId}`}>
                {o.rigCode} · {o.guideTitle}
              </Link>{" "}
              — {times.dateTime(o.openedAt)}
              {o.openedBy ? `, ${o.openedBy}` : ""}
            </li>
          ))}
        </ul>
        {board.openHandoffs.length > 15 ? (
          <p className="mt-1">
            …and {board.openHandoffs.length - 15} more: <Link to="/cases?outcome=handoff">every hand-off</Link>.
          </p>
        ) : null}
      </section>

      {loaderData.formError ? (
        <div className="mt-4">
          <ErrorList error={`${loaderData.formError} Showing the last 365 days instead.`} />
        </div>
      ) : null}
      <Form method="get" className="mt-4 grid grid-cols-2 gap-3 rounded-lg border-2 border-ink bg-paper p-3 sm:grid-cols-5">
        <label className="font-bold">
          From
          <input type="date" name="from" defaultValue={window.from} className="mt-1 block min-h-12 w-full rounded-md border-2 border-ink px-2" />
        </label>
        <label className="font-bold">
          To
          <input type="date" name="to" defaultValue={window.to} className="mt-1 block min-h-12 w-full rounded-md border-2 border-ink px-2" />
        </label>
        <label className="font-bold">
          Rig
          <select name="rig" defaultValue={window.rig} className="mt-1 block min-h-12 w-full rounded-md border-2 border-ink bg-paper px-2">
            <option value="">All rigs</option>
            {rigs.map((r) => (
              <option key={r}>{r}</option>
            ))}
          </select>
        </label>
        <label className="font-bold">
          Repeat window (days)
          <input
            name="repeatDays"
            inputMode="numeric"
            defaultValue={window.repeatDays}
            className="mt-1 block min-h-12 w-full rounded-md border-2 border-ink px-2"
          />
        </label>
        <button type="submit" className="col-span-2 min-h-12 self-end rounded-md bg-go font-bold text-white sm:col-span-1">
          Show
        </button>
      </Form>

      {/* After what failed and who is waiting: service that is due is the next thing to plan. */}
      <ServiceToDo lines={loaderData.service} />
      <section aria-labelledby="rigs-h" className="mt-6">
        <h2 id="rigs-h" className="text-2xl font-bold">
          Rigs
        </h2>
        <div className="mt-2 overflow-x-auto rounded-lg border-2 border-ink bg-paper" tabIndex={0} role="region" aria-label="Rigs table">
          <table className="w-full min-w-[46rem] border-collapse text-left">
            <thead>
              <tr className="border-b-2 border-ink">
                {[
                  "Rig",
                  "Cases",
                  "Fixed / handed off / abandoned",
                  "Engine h",
                  "MTBF",
                  "MTTR",
                  "Downtime",
                  "Availability",
                  "Faults per 100 h (95 % range)",
                  "Flag",
                ].map((c) => (
                  <th key={c} scope="col" className="p-2">
                    {c}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {board.rigs.map((r) => (
                <tr key={r.rigCode} className={`border-b border-rule ${r.outOfLine ? "bg-caution" : ""}`}>
                  <th scope="row" className="p-2">
                    <Link to={`/rigs/${r.rigCode}`}>{r.rigCode}</Link>
                  </th>
                  <td className="p-2">{r.cases}</td>
                  <td className="p-2">
                    {r.fixed} / {r.handoff} / {r.abandoned}
                  </td>
                  <td className="p-2">{r.operatingHours === null ? "no meter" : h(r.operatingHours)}</td>
                  <td className="p-2">{r.mtbfHours === null ? "—" : `${h(r.mtbfHours, 1)} h`}</td>
                  <td className="p-2">{r.mttrHours === null ? "—" : `${h(r.mttrHours * 60)} min`}</td>
                  <td className="p-2">{h(r.repairHours, 1)} h</td>
                  <td className="p-2">{r.availability === null ? "—" : `${fmt(r.availability * 100, 2)} %`}</td>
                  <td className="p-2">
                    {r.ratePer100h === null ? "—" : `${h(r.ratePer100h, 1)} (${h(r.rateInterval!.lower, 1)}–${h(r.rateInterval!.upper, 1)})`}
                  </td>
                  <td className="p-2 font-bold">{r.outOfLine ? `Above fleet (${h(r.fleetRatePer100h, 1)})` : ""}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <p className="mt-1 text-sm">
          MTBF: engine hours ÷ fixed and handed-off cases; MTTR: mean time from opening to closing a case; availability = MTBF ÷ (MTBF + MTTR) (ISO 14224
          definitions). Range: exact Poisson (Garwood).
        </p>
      </section>

      <JobsSection jobs={loaderData.jobs} causeName={name} />

      <CareSection care={loaderData.care} />

      <section aria-labelledby="pareto-h" className="mt-6">
        <h2 id="pareto-h" className="text-2xl font-bold">
          Causes, most frequent first
        </h2>
        <p>Found at a fixed end, or suspected by the crew at a hand-off (the shop confirms those); the table says how many of each were suspected.</p>
        <ParetoChart
          rows={board.pareto
            .slice(0, 12)
            .map((p) => ({ label: shortLabel(name(p.cause).split(" (")[0], 26), count: p.count, cumulative: Math.round(p.cumulativeShare * 1000) / 10 }))}
        />
        <details className="rounded-md border-2 border-rule bg-paper p-3">
          <summary className="min-h-12 cursor-pointer py-2 font-bold">All {board.pareto.length} causes as a table</summary>
          <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Causes table">
            <table className="w-full min-w-[30rem] border-collapse text-left [&_td]:p-2 [&_th]:p-2">
              <thead>
                <tr className="border-b-2 border-ink">
                  <th scope="col">Cause</th>
                  <th scope="col">Cases</th>
                  <th scope="col">Of them suspected</th>
                  <th scope="col">Share</th>
                  <th scope="col">Running</th>
                  <th scope="col">Downtime</th>
                </tr>
              </thead>
              <tbody>
                {board.pareto.map((p) => (
                  <tr key={p.cause} className="border-b border-rule">
                    <td>{name(p.cause)}</td>
                    <td>{p.count}</td>
                    <td>{p.suspected ?? 0}</td>
                    <td>{fmt(p.share * 100, 1)} %</td>
                    <td>{fmt(p.cumulativeShare * 100, 1)} %</td>
                    <td>{h(p.downtimeHours, 1)} h</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </details>
      </section>

      <section aria-labelledby="repeats-h" className="mt-6">
        <h2 id="repeats-h" className="text-2xl font-bold">
          Repeats: same cause, same rig, within {window.repeatDays} days
        </h2>
        {board.repeats.length === 0 ? <p>None in this window.</p> : null}
        <ul className="mt-2 space-y-2">
          {board.repeats.slice(0, 20).map((g) => (
            <li key={`${g.rigCode}-${g.cause}-${g.firstAt}`} className="rounded-md border-2 border-rule bg-paper p-3">
              <p className="font-bold">
                {g.rigCode}: {name(g.cause)} — {g.count} times
              </p>
              <p className="text-sm">
                {times.date(g.firstAt)} to {times.date(g.lastAt)}. Latest:{" "}
                {g.latest.map((c, i) => (
                  <span key={c.caseId}>
                    {i ? ", " : ""}
                    <Link to={`/cases/${c.caseId}`}>{times.date(c.openedAt)}</Link>
                  </span>
                ))}
                . <Link to={`/cases?rig=${g.rigCode}&cause=${g.cause}&from=${g.firstAt.slice(0, 10)}&to=${g.lastAt.slice(0, 10)}`}>All of them</Link>
              </p>
            </li>
          ))}
        </ul>
        {board.repeats.length > 20 ? <p className="mt-1">…and {board.repeats.length - 20} more chains.</p> : null}
      </section>

      <section aria-labelledby="trend-h" className="mt-6">
        <h2 id="trend-h" className="text-2xl font-bold">
          Cases per week
        </h2>
        <TrendChart weeks={board.weeks} />
        <details className="rounded-md border-2 border-rule bg-paper p-3">
          <summary className="min-h-12 cursor-pointer py-2 font-bold">Weeks as a table</summary>
          <table className="w-full text-left [&_td]:p-1 [&_th]:p-1">
            <thead>
              <tr>
                <th scope="col">Week of</th>
                <th scope="col">Cases</th>
                <th scope="col">Hand-offs</th>
              </tr>
            </thead>
            <tbody>
              {board.weeks.map((w) => (
                <tr key={w.weekStart}>
                  <td>{w.weekStart}</td>
                  <td>{w.cases}</td>
                  <td>{w.handoffs}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      </section>

      <section aria-labelledby="crew-h" className="mt-6">
        <h2 id="crew-h" className="text-2xl font-bold">
          People
        </h2>
        <p className="text-sm">What each person meets, for training — not for blame.</p>
        <ul className="mt-2 grid gap-2 sm:grid-cols-2">
          {board.people.map((p) => (
            <li key={p.name} className="rounded-md border-2 border-rule bg-paper p-3">
              <p className="font-bold">
                {p.name}: {p.cases} cases, {fmt(p.handoffRate * 100)} % handed off
              </p>
              <p className="text-sm">Guides: {p.guides.map((g) => `${g.title} (${g.count})`).join(", ")}</p>
              <p className="text-sm">Causes: {p.causes.map((c) => `${name(c.cause)} (${c.count})`).join(", ") || "—"}</p>
            </li>
          ))}
        </ul>
      </section>

      <p className="mt-6">
        <a href={`/api/board?from=${window.from}&to=${window.to}${window.rig ? `&rig=${window.rig}` : ""}&repeatDays=${window.repeatDays}`}>
          These figures as JSON
        </a>
      </p>
      {canSendDigest ? (
        <Form method="post" className="mt-4">
          <button type="submit" disabled={busy} className="min-h-14 rounded-md border-2 border-ink bg-paper px-4 font-bold">
            Send the weekly digest now
          </button>
          {actionData ? (
            <p role="status" className="mt-2 font-bold">
              {actionData.mailFailed
                ? "The mail server did not take the digest: nothing was sent. Try again later."
                : `Digest sent to ${actionData.sentTo.join(", ") || "no one (no supervisors)"}.`}
            </p>
          ) : null}
        </Form>
      ) : null}
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Fault board · Tankside" }];
