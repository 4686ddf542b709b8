import type { CaseKind, Outcome } from "~/lib/vocabulary";
import { QueryTypes } from "sequelize";
import { ownedBy, usableGuideSql } from "./tenancy.server";
import { PAGE_SIZE, type CaseFilters } from "~/lib/cases/filters";
import { startOfDayIn } from "~/lib/format";

const nextDay = (day: string) => new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
import { Job, reports, Rig, User } from "./db.server";
import { jobLabel } from "~/lib/jobs/today";
import { keptReport } from "./report-cache.server";
import type { SessionUser } from "./guards.server";

const ORDER: Record<CaseFilters["sort"], string> = {
  opened: "c.opened_at",
  duration: "duration",
  rig: "r.code",
  guide: "g.title",
  cause: "c.cause_code",
  outcome: "c.outcome",
  person: "u.name",
};

export interface CaseRow {
  id: string;
  rigCode: string;
  guideTitle: string;
  causeCode: string | null;
  outcome: Outcome;
  kind: CaseKind;
  /** On a card: items not done. */
  cardGaps: number | null;
  person: string | null;
  /** The job it happened on, if any. */
  jobName: string | null;
  openedAt: string;
  durationSeconds: number | null;
}

function where(user: SessionUser, f: CaseFilters) {
  const replacements = {
    company: user.companyId,
    kind: f.kind,
    rig: f.rig ?? null,
    guide: f.guide ?? null,
    cause: f.cause ?? null,
    outcome: f.outcome ?? null,
    person: f.person ?? null,
    job: f.job ?? null,
    // Days are the company's own: "to" includes the whole of its day.
    from: f.from ? startOfDayIn(f.from, user.timeZone) : null,
    to: f.to ? startOfDayIn(nextDay(f.to), user.timeZone) : null,
  };
  const sql = `FROM cases c JOIN rigs r ON r.id = c.rig_id JOIN guide_versions v ON v.id = c.guide_version_id JOIN guides g ON g.id = v.guide_id
    LEFT JOIN users u ON u.id = c.opened_by LEFT JOIN jobs j ON j.id = c.job_id
    WHERE c.company_id = :company AND c.kind = :kind AND (:rig IS NULL OR r.code = :rig) AND (:guide IS NULL OR g.slug = :guide)
      AND (:cause IS NULL OR c.cause_code = :cause) AND (:outcome IS NULL OR c.outcome = :outcome) AND (:person IS NULL OR c.opened_by = :person)
      AND (:job IS NULL OR c.job_id = :job)
      AND (:from IS NULL OR c.opened_at >= :from) AND (:to IS NULL OR c.opened_at < :to)`;
  return { sql, replacements };
}

const toRow = (r: Record<string, unknown>): CaseRow => ({
  id: String(r.id),
  rigCode: String(r.code),
  guideTitle: String(r.title),
  causeCode: (r.cause_code as string) ?? null,
  outcome: String(r.outcome) as Outcome,
  kind: String(r.kind) as CaseKind,
  cardGaps: r.card_gaps === null || r.card_gaps === undefined ? null : Number(r.card_gaps),
  person: (r.name as string) ?? null,
  jobName: (r.job_name as string) ?? null,
  openedAt: new Date(r.opened_at as string).toISOString(),
  durationSeconds: r.duration === null ? null : Number(r.duration),
});

/** One page of the company's cases, filtered and sorted on the server. */
export async function listCases(user: SessionUser, f: CaseFilters, { limit = PAGE_SIZE, all = false } = {}): Promise<{ rows: CaseRow[]; total: number }> {
  // The CSV (all rows) is read fresh; a page of the table is kept while nothing it shows has changed.
  if (all) return readCases(user, f, limit, all);
  return keptReport(user.companyId, "cases", { f, limit, timeZone: user.timeZone }, () => readCases(user, f, limit, all));
}

async function readCases(user: SessionUser, f: CaseFilters, limit: number, all: boolean) {
  const { sql, replacements } = where(user, f);
  const order = `${ORDER[f.sort]} ${f.dir === "asc" ? "ASC" : "DESC"}, c.opened_at DESC, c.id`;
  const page = all ? "LIMIT 50000" : `LIMIT ${limit} OFFSET ${(f.page - 1) * limit}`;
  const [rows, count] = await Promise.all([
    reports().query<Record<string, unknown>>(
      `SELECT c.id, r.code, g.title, c.cause_code, c.outcome, c.kind, c.card_gaps, u.name, j.name AS job_name, c.opened_at, TIMESTAMPDIFF(SECOND, c.opened_at, c.closed_at) AS duration ${sql} ORDER BY ${order} ${page}`,
      { replacements, type: QueryTypes.SELECT },
    ),
    all ? Promise.resolve([{ n: 0 }]) : reports().query<{ n: number }>(`SELECT COUNT(*) AS n ${sql}`, { replacements, type: QueryTypes.SELECT }),
  ]);
  return { rows: rows.map(toRow), total: Number(count[0].n) };
}

/** What the filter menus offer: the company's rigs, people and the guides they can use. */
export async function caseFilterOptions(user: SessionUser) {
  return keptReport(user.companyId, "case-filters", null, () => readFilterOptions(user));
}

async function readFilterOptions(user: SessionUser) {
  const [rigs, people, jobs, guides] = await Promise.all([
    Rig.findAll({ where: ownedBy(user), attributes: ["code"], order: [["code", "ASC"]] }),
    User.findAll({ where: ownedBy(user), attributes: ["id", "name"], order: [["name", "ASC"]] }),
    Job.findAll({ where: ownedBy(user), attributes: ["id", "name", "startsOn"], order: [["startsOn", "DESC"]] }),
    reports().query<{ slug: string; title: string }>(`SELECT DISTINCT g.slug, g.title FROM guides g WHERE ${usableGuideSql("g")} ORDER BY g.title`, {
      replacements: { company: user.companyId },
      type: QueryTypes.SELECT,
    }),
  ]);
  return {
    rigs: rigs.map((r) => r.code),
    people: people.map((p) => ({ id: p.id, name: p.name })),
    jobs: jobs.map((j) => ({ id: j.id, name: jobLabel(j) })),
    guides,
  };
}
