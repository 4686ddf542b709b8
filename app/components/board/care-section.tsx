import { fmt } from "~/lib/field-math/units";
import type { CareFigures, RateGroup } from "~/lib/stats/care";

const h = (v: number | null, digits = 1) => (v === null ? "—" : fmt(v, digits));
const rate = (g: RateGroup) => (g.ratePer100h === null ? "no engine hours" : `${h(g.ratePer100h)} (${h(g.interval!.lower)}–${h(g.interval!.upper)})`);

/** What skipped care costs: the board's section on rig cards, services overdue and cards done per week. */
export function CareSection({ care }: { care: CareFigures }) {
  const { withPreStart: yes, withoutPreStart: no } = care;
  const both = yes.ratePer100h !== null && no.ratePer100h !== null;
  const apart = both && no.interval!.lower > yes.interval!.upper;
  return (
    <section aria-labelledby="care-h" className="mt-6">
      <h2 id="care-h" className="text-2xl font-bold">
        What skipped care costs
      </h2>
      <p className="mt-1 text-lg">
        {both ? (
          <>
            Days without a complete pre-start: <strong>{h(no.ratePer100h)}</strong> faults per 100 engine hours; days with one:{" "}
            <strong>{h(yes.ratePer100h)}</strong>.{" "}
            {apart ? "The two 95 % ranges do not overlap." : "The two 95 % ranges overlap: no clear difference in this window."}
          </>
        ) : (
          "Not enough engine hours on both kinds of day in this window to compare."
        )}
      </p>
      <div className="mt-2 overflow-x-auto rounded-lg border-2 border-ink bg-paper" tabIndex={0} role="region" aria-label="Fault rate by pre-start">
        <table className="w-full min-w-[36rem] border-collapse text-left">
          <thead>
            <tr className="border-b-2 border-ink">
              {["Rig-days", "Days", "Engine h", "Faults", "Faults per 100 h (95 % range)"].map((c) => (
                <th key={c} scope="col" className="p-2">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {(
              [
                ["With a complete pre-start", yes],
                ["Missing or incomplete pre-start", no],
              ] as const
            ).map(([label, g]) => (
              <tr key={label} className="border-b border-rule">
                <th scope="row" className="p-2">
                  {label}
                </th>
                <td className="p-2">{g.days}</td>
                <td className="p-2">{h(g.hours, 0)}</td>
                <td className="p-2">{g.faults}</td>
                <td className="p-2">{rate(g)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-1 text-sm">
        A rig-day is a day a rig had a card or a fault. Its engine hours are its last hour-meter reading that day less the last reading of an earlier day (cards
        read the meter as they start){care.unmeasuredDays ? `; ${care.unmeasuredDays} rig-days had no reading to measure and are left out` : ""}. Range: exact
        Poisson (Garwood), as for the rigs above. This is an association, not proof: the rigs and days that skip the pre-start may also be the oldest rigs or
        the hardest jobs.
      </p>

      <h3 className="mt-4 text-xl font-bold">Faults with a service overdue</h3>
      <p className="text-lg">
        {care.faults ? (
          <>
            <strong>{care.faultsWithOverdue}</strong> of {care.faults} faults ({fmt((care.faultsWithOverdue / care.faults) * 100)} %) happened with at least one
            service overdue on that rig.
          </>
        ) : (
          "No faults in this window."
        )}
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

      <h3 className="mt-4 text-xl font-bold">Cards completed per rig and week</h3>
      <div className="mt-2 overflow-x-auto rounded-lg border-2 border-ink bg-paper" tabIndex={0} role="region" aria-label="Cards per rig and week">
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
                  <td key={c.week} className={`p-2 ${c.started > c.complete ? "font-bold" : ""}`}>
                    {c.complete}
                    {c.started > c.complete ? ` of ${c.started}` : ""}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-1 text-sm">Each column is a week starting Monday. “4 of 6”: six cards started, four closed complete.</p>
    </section>
  );
}
