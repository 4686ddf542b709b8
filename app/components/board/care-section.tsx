import { fmt } from "~/lib/field-math/units";
import type { CareFigures, RateGroup } from "~/lib/stats/care";

const h = (v: number | null, digits = 1) => (v === null ? "—" : fmt(v, digits));
const rate = (g: RateGroup) => (g.ratePer100h === null ? "no engine hours" : `${h(g.ratePer100h)} (${h(g.interval!.lower)}–${h(g.interval!.upper)})`);

/** Two kinds of rig-day side by side: days, engine hours, faults and the rate with its range. */
function RateTable({ label, rows }: { label: string; rows: [string, RateGroup][] }) {
  return (
    <div className="mt-2 overflow-x-auto rounded-lg border-2 border-ink bg-paper" tabIndex={0} role="region" aria-label={label}>
      <table className="w-full min-w-[30rem] border-collapse text-left">
        <thead>
          <tr className="border-b-2 border-ink">
            {["Rig-days", "Faults per 100 h (95 % range)", "Faults", "Engine h", "Days"].map((c) => (
              <th key={c} scope="col" className="p-2">
                {c}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map(([name, g]) => (
            <tr key={name} className="border-b border-rule">
              <th scope="row" className="p-2">
                {name}
              </th>
              <td className="p-2">{rate(g)}</td>
              <td className="p-2">{g.faults}</td>
              <td className="p-2">{h(g.hours, 0)}</td>
              <td className="p-2">{g.days}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Said of two groups: which rate is higher and whether the ranges overlap. */
function compare(a: RateGroup, b: RateGroup, aWords: string, bWords: string) {
  if (a.ratePer100h === null || b.ratePer100h === null) return "Not enough engine hours on both kinds of day in this window to compare.";
  const apart = a.interval!.lower > b.interval!.upper || b.interval!.lower > a.interval!.upper;
  return `${aWords}: ${h(a.ratePer100h)} faults per 100 engine hours; ${bWords}: ${h(b.ratePer100h)}. ${
    apart ? "The two 95 % ranges do not overlap." : "The two 95 % ranges overlap: no clear difference in this window."
  }`;
}

/** What skipped care costs: the board's section on rig cards, services overdue and cards done per week. */
export function CareSection({ care }: { care: CareFigures }) {
  const { withPreStart: yes, withoutPreStart: no } = care;
  return (
    <section aria-labelledby="care-h" className="mt-6">
      <h2 id="care-h" className="text-2xl font-bold">
        What skipped care costs
      </h2>
      <p className="mt-1 text-lg">{compare(no, yes, "Days without a complete pre-start", "days with one")}</p>
      <RateTable
        label="Fault rate by pre-start"
        rows={[
          ["With a complete pre-start", yes],
          ["Missing or incomplete pre-start", no],
        ]}
      />
      <p className="mt-1 text-sm">
        A rig-day is a day a rig had a card or a fault. Its engine hours are its last hour-meter reading that day less the last reading of the days before (up
        to four days back; cards read the meter as they start)
        {care.unmeasuredDays
          ? `; ${care.unmeasuredDays} rig-day${care.unmeasuredDays === 1 ? "" : "s"} had no such reading and ${care.unmeasuredDays === 1 ? "is" : "are"} left out`
          : ""}
        , so the hours here can differ a little from the rigs table above. Range: exact Poisson (Garwood), as for the rigs. This is an association, not proof:
        the rigs and days that skip the pre-start may also be the oldest rigs or the hardest jobs.
      </p>

      <h3 className="mt-4 text-xl font-bold">Services overdue</h3>
      <p className="text-lg">{compare(care.withOverdue, care.withoutOverdue, "Days with a service overdue", "days with every service up to date")}</p>
      <RateTable
        label="Fault rate by service overdue"
        rows={[
          ["A service overdue", care.withOverdue],
          ["Every service up to date", care.withoutOverdue],
        ]}
      />
      <p className="mt-1 text-lg">
        {care.faults
          ? `${care.faultsWithOverdue} of ${care.faults} faults (${fmt((care.faultsWithOverdue / care.faults) * 100)} %) happened with at least one service overdue on that rig.`
          : "No faults in this window."}
      </p>
      {care.overdueByService.length ? (
        <ul className="mt-1 list-disc pl-6 text-lg">
          {care.overdueByService.map((s) => (
            <li key={s.name}>
              {s.name}: overdue at {s.faults} fault{s.faults === 1 ? "" : "s"}
            </li>
          ))}
        </ul>
      ) : null}
      <p className="mt-1 text-sm">
        Overdue as the service list works it out, at the day&apos;s last reading (for a fault, at its own); a service never recorded is not counted as overdue.
        Again an association, not proof.
      </p>

      <h3 className="mt-4 text-xl font-bold">Pre-starts per rig and week</h3>
      <div className="mt-2 overflow-x-auto rounded-lg border-2 border-ink bg-paper" tabIndex={0} role="region" aria-label="Pre-starts per rig and week">
        <table className="w-full min-w-[40rem] border-collapse text-left">
          <thead>
            <tr className="border-b-2 border-ink">
              <th scope="col" className="p-2">
                Rig
              </th>
              {care.weeks.map((w) => (
                <th key={w} scope="col" className="p-2">
                  {w.slice(5)}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {care.cardWeeks.map((r) => (
              <tr key={r.rigCode} className="border-b border-rule">
                <th scope="row" className="p-2">
                  {r.rigCode}
                </th>
                {r.cells.map((c) => (
                  <td key={c.week} className={`p-2 ${c.preStartDays < c.workedDays ? "font-bold" : ""}`}>
                    {c.workedDays ? `${c.preStartDays} of ${c.workedDays} days` : "—"}
                    {c.otherCards ? <span className="block text-sm font-normal">+{c.otherCards} other cards</span> : null}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-1 text-sm">
        The last eight weeks of the window, newest first (weeks start on Monday; the first may be partly outside the window). “4 of 6”: of six days the rig
        worked (a card or a fault), four had a complete pre-start; “other cards” are the other cards completed that week. “—”: the rig did not work.
      </p>
    </section>
  );
}
