import { Form, Link } from "react-router";
import { PageTitle } from "~/components/ui/page-title";
import { caseFiltersSchema, filtersToSearch, PAGE_SIZE, type CaseFilters } from "~/lib/cases/filters";
import { formatDuration } from "~/lib/format";
import { CARD_OUTCOME_LABELS, caseOutcomeLabel, OUTCOME_LABELS } from "~/lib/vocabulary";
import { caseFilterOptions, listCases } from "~/services/case-list.server";
import { requirePermission } from "~/services/guards.server";
import { readQuery } from "~/services/read-request.server";
import { causeList } from "~/services/guides.server";
import { useTimes } from "~/components/use-time-zone";
import type { Route } from "./+types/cases";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "read-cases");
  const filters = readQuery(request, caseFiltersSchema, "the filters");
  const [{ rows, total }, options] = await Promise.all([listCases(user, filters), caseFilterOptions(user)]);
  return { rows, total, filters, options, causes: causeList().map((c) => ({ code: c.code, name: c.name })) };
}

const COLUMNS: { key: CaseFilters["sort"]; label: string }[] = [
  { key: "rig", label: "Rig" },
  { key: "guide", label: "Guide" },
  { key: "cause", label: "Cause" },
  { key: "outcome", label: "Outcome" },
  { key: "person", label: "Who" },
  { key: "opened", label: "Opened" },
  { key: "duration", label: "Took" },
];

export default function Cases({ loaderData }: Route.ComponentProps) {
  const times = useTimes();
  const { rows, total, filters, options, causes } = loaderData;
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));
  const causeName = new Map(causes.map((c) => [c.code, c.name]));
  const cards = filters.kind === "card";
  const select = "mt-1 block min-h-12 w-full rounded-md border-2 border-ink bg-paper px-2";
  return (
    <>
      <PageTitle lead={`${total.toLocaleString("en-US")} ${cards ? "card" : "case"}${total === 1 ? "" : "s"} match.`}>
        {cards ? "Rig cards" : "Cases"}
      </PageTitle>
      <Form method="get" className="grid grid-cols-2 gap-3 rounded-lg border-2 border-ink bg-paper p-3 sm:grid-cols-4">
        <label className="font-bold">
          Show
          <select name="kind" defaultValue={filters.kind} className={select}>
            <option value="fix">Fixes (faults)</option>
            <option value="card">Rig cards</option>
          </select>
        </label>
        <FilterSelect label="Rig" name="rig" value={filters.rig} options={options.rigs.map((r) => [r, r])} />
        <FilterSelect label="Guide" name="guide" value={filters.guide} options={options.guides.map((g) => [g.slug, g.title])} />
        {cards ? null : <FilterSelect label="Cause" name="cause" value={filters.cause} options={causes.map((c) => [c.code, c.name])} />}
        <FilterSelect label="Outcome" name="outcome" value={filters.outcome} options={Object.entries(cards ? CARD_OUTCOME_LABELS : OUTCOME_LABELS)} />
        <FilterSelect label="Person" name="person" value={filters.person} options={options.people.map((p) => [String(p.id), p.name])} all="Anyone" />
        <FilterSelect label="Job" name="job" value={filters.job} options={options.jobs.map((j) => [String(j.id), j.name])} all="Any job" />
        <label className="font-bold">
          From
          <input type="date" name="from" defaultValue={filters.from ?? ""} className={select} />
        </label>
        <label className="font-bold">
          To
          <input type="date" name="to" defaultValue={filters.to ?? ""} className={select} />
        </label>
        <input type="hidden" name="sort" value={filters.sort} />
        <input type="hidden" name="dir" value={filters.dir} />
        <button type="submit" className="col-span-2 min-h-12 self-end rounded-md bg-go font-bold text-white sm:col-span-1">
          Filter
        </button>
      </Form>
      <p className="mt-3">
        <a href={`/cases/export?${filtersToSearch(filters, { page: undefined })}`} download className="font-bold">
          Download these {total.toLocaleString("en-US")} {cards ? "cards" : "cases"} as CSV
        </a>
      </p>
      <div className="mt-3 overflow-x-auto rounded-lg border-2 border-ink bg-paper" tabIndex={0} role="region" aria-label="Cases table">
        <table className="w-full min-w-[44rem] border-collapse text-left">
          <thead>
            <tr className="border-b-2 border-ink">
              {COLUMNS.map((col) => {
                const active = filters.sort === col.key;
                const dir = active && filters.dir === "desc" ? "asc" : "desc";
                return (
                  <th key={col.key} scope="col" aria-sort={active ? (filters.dir === "asc" ? "ascending" : "descending") : undefined} className="p-2">
                    <Link to={`?${filtersToSearch(filters, { sort: col.key, dir, page: 1 })}`} className="font-bold">
                      {col.label}
                      {active ? (filters.dir === "asc" ? " ↑" : " ↓") : ""}
                    </Link>
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} className="border-b border-rule">
                <td className="p-2 font-bold whitespace-nowrap">{r.rigCode}</td>
                <td className="p-2">
                  <Link to={`/cases/${r.id}`}>{r.guideTitle}</Link>
                </td>
                <td className="p-2">{r.causeCode ? (causeName.get(r.causeCode) ?? r.causeCode) : "—"}</td>
                <td className="p-2">{caseOutcomeLabel(r.kind, r.outcome, r.cardGaps)}</td>
                <td className="p-2">{r.person ?? "—"}</td>
                <td className="p-2">{times.dateTime(r.openedAt)}</td>
                <td className="p-2">{r.durationSeconds === null ? "open" : formatDuration(r.durationSeconds * 1000)}</td>
              </tr>
            ))}
            {rows.length === 0 ? (
              <tr>
                <td colSpan={7} className="p-3">
                  No cases match these filters.
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <nav aria-label="Pages" className="mt-3 flex items-center justify-between gap-2">
        {filters.page > 1 ? (
          <Link
            to={`?${filtersToSearch(filters, { page: filters.page - 1 })}`}
            className="flex min-h-12 items-center rounded-md border-2 border-ink bg-paper px-4 font-bold"
          >
            Previous
          </Link>
        ) : (
          <span />
        )}
        <span>
          Page {filters.page} of {pages}
        </span>
        {filters.page < pages ? (
          <Link
            to={`?${filtersToSearch(filters, { page: filters.page + 1 })}`}
            className="flex min-h-12 items-center rounded-md border-2 border-ink bg-paper px-4 font-bold"
          >
            Next
          </Link>
        ) : (
          <span />
        )}
      </nav>
    </>
  );
}

/** One filter: a labelled select whose first choice means "no filter". */
function FilterSelect({
  label,
  name,
  value,
  options,
  all = "All",
}: {
  label: string;
  name: string;
  value?: string | number;
  options: [string, string][];
  all?: string;
}) {
  return (
    <label className="font-bold">
      {label}
      <select name={name} defaultValue={value ?? ""} className="mt-1 block min-h-12 w-full rounded-md border-2 border-ink bg-paper px-2">
        <option value="">{all}</option>
        {options.map(([v, text]) => (
          <option key={v} value={v}>
            {text}
          </option>
        ))}
      </select>
    </label>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Cases · Tankside" }];
