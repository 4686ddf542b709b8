import { caseFiltersSchema } from "~/lib/cases/filters";
import { toCsv } from "~/lib/csv";
import { isoInZone } from "~/lib/format";
import { caseOutcomeLabel, causeBasis } from "~/lib/vocabulary";
import { listCases } from "~/services/case-list.server";
import { requirePermission } from "~/services/guards.server";
import { readQuery } from "~/services/read-request.server";
import { causeList } from "~/services/guides.server";
import type { Route } from "./+types/cases.export";

/** The filtered cases as CSV (the same filters as the table, every page). */
export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "read-cases");
  const { rows } = await listCases(user, readQuery(request, caseFiltersSchema, "the filters"), { all: true });
  const names = new Map(causeList().map((c) => [c.code, c.name]));
  const csv = toCsv(
    rows.map((r) => [
      r.id,
      r.rigCode,
      r.guideTitle,
      r.causeCode ?? "",
      r.causeCode ? (names.get(r.causeCode) ?? "") : "",
      causeBasis(r.outcome, r.causeCode) ?? "",
      caseOutcomeLabel(r.kind, r.outcome, r.cardGaps),
      r.person ?? "",
      isoInZone(r.openedAt, user.timeZone),
      r.durationSeconds ?? "",
      r.jobName ?? "",
    ]),
    ["case_id", "rig", "guide", "cause_code", "cause", "cause_basis", "outcome", "opened_by", "opened_at", "duration_seconds", "job"],
  );
  const stamp = new Date().toISOString().slice(0, 10);
  return new Response(csv, {
    headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": `attachment; filename="tankside-cases-${stamp}.csv"` },
  });
}
