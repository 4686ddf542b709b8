import { QueryTypes } from "sequelize";
import { buildBoard, type Board, type BoardAggregates } from "~/lib/stats/board";
import { foldMix, foldRigWeeks } from "~/lib/stats/board-rows";
import { jobBoard, type JobBoardRow } from "~/lib/stats/job-board";
import { DEFAULT_REPEAT_DAYS, type RepeatChain } from "~/lib/stats/repeats";
import { reports } from "./db.server";
import { keptReport } from "./report-cache.server";
import type { SessionUser } from "./guards.server";

export interface BoardWindow {
  from: Date;
  to: Date;
  rigCode?: string;
  repeatDays?: number;
}

// Seconds come back whole and are divided here: SQL division would round to 4 decimals.
const n = (v: unknown) => (v === null || v === undefined ? 0 : Number(v));
const iso = (v: unknown) => (v instanceof Date ? v.toISOString() : new Date(String(v)).toISOString());

/** Day ranges as the rollups store them: whole months from month rows, the days at either edge from day rows. */
function periods(from: Date, to: Date) {
  const ymd = (t: Date) => t.toISOString().slice(0, 10);
  for (const t of [from, to]) if (t.getTime() % 86_400_000) throw new Error(`The board's window must start and end at midnight UTC (got ${t.toISOString()})`);
  const firstWhole = from.getUTCDate() === 1 ? from : new Date(Date.UTC(from.getUTCFullYear(), from.getUTCMonth() + 1, 1));
  const lastWhole = new Date(Date.UTC(to.getUTCFullYear(), to.getUTCMonth(), 1));
  // No whole month inside: every day comes from day rows.
  const [mFrom, mTo] = firstWhole < lastWhole ? [firstWhole, lastWhole] : [from, from];
  return { from: ymd(from), to: ymd(to), mFrom: ymd(mFrom), mTo: ymd(mTo) };
}
const inPeriods =
  "(b.span = 'month' AND b.period >= :mFrom AND b.period < :mTo OR b.span = 'day' AND (b.period >= :from AND b.period < :mFrom OR b.period >= :mTo AND b.period < :to))";

/**
 * The board's aggregates for one company and window, read from the rollups kept as cases
 * open and close (board-rollups.server.ts), so the cost follows rigs, people and months rather
 * than the number of cases; the numbers are then finished by the pure stats module.
 * The window runs from midnight to midnight UTC.
 */
export async function boardAggregates(companyId: number, w: BoardWindow): Promise<BoardAggregates> {
  const repeatDays = w.repeatDays ?? DEFAULT_REPEAT_DAYS;
  const rigRows = await reports().query<{ id: number; code: string; has_hour_meter: number }>(
    "SELECT id, code, has_hour_meter FROM rigs WHERE company_id = :company AND (:rig IS NULL OR code = :rig) ORDER BY code",
    { replacements: { company: companyId, rig: w.rigCode ?? null }, type: QueryTypes.SELECT },
  );
  const codeOf = new Map(rigRows.map((r) => [Number(r.id), String(r.code)]));
  const params = {
    company: companyId,
    ...periods(w.from, w.to),
    start: w.from,
    end: w.to,
    rigId: w.rigCode ? (rigRows[0]?.id ?? -1) : null,
    days: repeatDays,
  };
  // Only when a rig is chosen: an "IS NULL OR" test would keep the optimizer off the key.
  const rigFilter = w.rigCode ? "AND b.rig_id = :rigId" : "";
  const q = <T extends object>(sql: string) => reports().query<T>(sql, { replacements: params, type: QueryTypes.SELECT });

  const [rigWeeks, mix, chains, handoffs] = await Promise.all([
    // Rigs and the weekly trend from one grouped read of the rig-day rollups.
    q<Record<string, unknown>>(`
      SELECT b.rig_id, DATE_FORMAT(b.day - INTERVAL WEEKDAY(b.day) DAY, '%Y-%m-%d') AS week, SUM(b.cases) AS cases, SUM(b.fixed) AS fixed,
        SUM(b.handoff) AS handoff, SUM(b.abandoned) AS abandoned, SUM(b.closed) AS closed, SUM(b.repair_seconds) AS repair_seconds,
        MIN(b.min_hours) AS min_hours, MAX(b.max_hours) AS max_hours
      FROM board_rig_days b WHERE b.company_id = :company AND b.day >= :from AND b.day < :to ${rigFilter}
      GROUP BY b.rig_id, week`),
    // Causes and the crew view from one grouped read of the mix rollups.
    q<Record<string, unknown>>(`
      SELECT m.*, u.name, g.title FROM (
        SELECT b.opened_by, b.guide_id, b.cause_code, SUM(b.cases) AS cases, SUM(b.handoff) AS handoffs, SUM(b.repair_seconds) AS repair_seconds
        FROM board_mix b WHERE b.company_id = :company AND ${inPeriods} ${rigFilter}
        GROUP BY b.opened_by, b.guide_id, b.cause_code
      ) m JOIN guides g ON g.id = m.guide_id LEFT JOIN users u ON u.id = m.opened_by`),
    repeatDays === DEFAULT_REPEAT_DAYS ? storedChains(params, rigFilter) : liveChains(params, w.rigCode ? "AND c.rig_id = :rigId" : ""),
    // The newest open hand-offs first, then their names: a join first would sort them all.
    q<Record<string, unknown>>(`
      SELECT h.id, r.code, g.title, h.opened_at, u.name FROM (
        SELECT c.id, c.rig_id, c.guide_version_id, c.opened_by, c.opened_at FROM cases c
        WHERE c.company_id = :company AND c.outcome = 'handoff' AND c.handoff_resolved_at IS NULL ${w.rigCode ? "AND c.rig_id = :rigId" : ""}
        ORDER BY c.opened_at DESC LIMIT 50
      ) h JOIN rigs r ON r.id = h.rig_id JOIN guide_versions v ON v.id = h.guide_version_id JOIN guides g ON g.id = v.guide_id
      LEFT JOIN users u ON u.id = h.opened_by
      ORDER BY h.opened_at DESC`),
  ]);
  const hours = (v: unknown) => (v === null || v === undefined ? null : Number(v));

  return {
    ...foldRigWeeks(
      rigWeeks.map((r) => ({
        rigId: n(r.rig_id),
        week: String(r.week),
        cases: n(r.cases),
        fixed: n(r.fixed),
        handoff: n(r.handoff),
        abandoned: n(r.abandoned),
        closed: n(r.closed),
        repairSeconds: n(r.repair_seconds),
        minHours: hours(r.min_hours),
        maxHours: hours(r.max_hours),
      })),
      rigRows.map((r) => ({ id: Number(r.id), code: String(r.code), hasHourMeter: Boolean(n(r.has_hour_meter)) })),
    ),
    ...foldMix(
      mix.map((m) => ({
        personId: n(m.opened_by),
        personName: m.name === null || m.name === undefined ? null : String(m.name),
        guideTitle: String(m.title),
        cause: m.cause_code ? String(m.cause_code) : null,
        cases: n(m.cases),
        handoffs: n(m.handoffs),
        repairSeconds: n(m.repair_seconds),
      })),
    ),
    repeatChains: chains.map(({ rigId, ...chain }) => ({ rigCode: codeOf.get(rigId) ?? "?", ...chain })),
    openHandoffs: handoffs.map((h) => ({
      caseId: String(h.id),
      rigCode: String(h.code),
      guideTitle: String(h.title),
      openedAt: iso(h.opened_at),
      openedBy: h.name ? String(h.name) : null,
    })),
  };
}

export async function boardFor(user: SessionUser, w: BoardWindow): Promise<Board> {
  return keptReport(user.companyId, "board", w, async () => buildBoard(await boardAggregates(user.companyId, w)));
}

type ChainRow = Omit<RepeatChain, "rigCode"> & { rigId: number };
type Params = Record<string, unknown>;

/** The stored form of a chain's latest cases, "id@time" newest first (times with microseconds, as MariaDB formats them). */
const latestCases = (list: unknown) =>
  String(list)
    .split(",")
    .map((entry) => {
      const [caseId, at] = entry.split("@");
      return { caseId, openedAt: new Date(at.replace(/(\.\d{3})\d*Z$/, "$1Z")).toISOString() };
    });

/** One chain as both chain queries answer it: rig, cause, count, first and last opening, latest cases. */
const chainRow = (c: Record<string, unknown>): ChainRow => ({
  rigId: n(c.rig_id),
  cause: String(c.cause_code),
  count: n(c.n),
  firstAt: iso(c.first_at),
  lastAt: iso(c.last_at),
  latest: latestCases(c.latest),
});

/**
 * Repeat chains for the default window, from the chain rollups. Periods never overlap, so
 * the latest three cases are among the newest three periods' own latest three.
 */
async function storedChains(params: Params, rigFilter: string): Promise<ChainRow[]> {
  const chains = await reports().query<Record<string, unknown>>(
    `SELECT b.rig_id, b.cause_code, SUM(b.cases) AS n, MIN(b.first_at) AS first_at, MAX(b.last_at) AS last_at,
       SUBSTRING_INDEX(GROUP_CONCAT(b.latest ORDER BY b.period DESC SEPARATOR ',' LIMIT 3), ',', 3) AS latest
     FROM board_chains b WHERE b.company_id = :company AND ${inPeriods} ${rigFilter}
     GROUP BY b.rig_id, b.cause_code, b.chain_at HAVING SUM(b.cases) > 1`,
    { replacements: params, type: QueryTypes.SELECT },
  );
  return chains.map(chainRow);
}

/**
 * Repeat chains for any other window, straight from the cases (gaps and islands): a case
 * starts a new chain unless the same cause was found on the same rig within the window
 * before it; only chains of two or more come back.
 */
async function liveChains(params: Params, rigFilter: string): Promise<ChainRow[]> {
  const rows = await reports().query<Record<string, unknown>>(
    `SELECT rig_id, cause_code, COUNT(*) AS n, MIN(opened_at) AS first_at, MAX(opened_at) AS last_at,
       GROUP_CONCAT(id, '@', DATE_FORMAT(opened_at, '%Y-%m-%dT%H:%i:%s.%fZ') ORDER BY opened_at DESC, id DESC SEPARATOR ',' LIMIT 3) AS latest
     FROM (
       SELECT id, rig_id, cause_code, opened_at, SUM(new_chain) OVER (PARTITION BY rig_id, cause_code ORDER BY opened_at, id) AS chain
       FROM (
         SELECT c.id, c.rig_id, c.cause_code, c.opened_at,
           CASE WHEN LAG(c.opened_at) OVER (PARTITION BY c.rig_id, c.cause_code ORDER BY c.opened_at, c.id) >= c.opened_at - INTERVAL :days DAY THEN 0 ELSE 1 END AS new_chain
         FROM cases c
         WHERE c.company_id = :company AND c.kind = 'fix' AND c.opened_at >= :start AND c.opened_at < :end AND c.cause_code IS NOT NULL ${rigFilter}
       ) marked
     ) chained
     GROUP BY rig_id, cause_code, chain HAVING COUNT(*) > 1`,
    { replacements: params, type: QueryTypes.SELECT },
  );
  return rows.map(chainRow);
}

/** The board's "Jobs" table, kept per company and window like the board. */
export const jobBoardFor = (user: SessionUser, w: BoardWindow): Promise<JobBoardRow[]> =>
  keptReport(user.companyId, "job-board", w, () => jobBoardRows(user.companyId, w));

/**
 * Faults, downtime and rig-days per job over the board's window (and rig), read fresh: faults from
 * the job rollup (per month and edge day, job, rig and cause), rig-days from the plan, open hand-offs from the few
 * open ones, so the cost follows jobs and days rather than cases.
 */
export async function jobBoardRows(companyId: number, w: BoardWindow): Promise<JobBoardRow[]> {
  const [rig] = w.rigCode
    ? await reports().query<{ id: number }>("SELECT id FROM rigs WHERE company_id = :company AND code = :code", {
        replacements: { company: companyId, code: w.rigCode },
        type: QueryTypes.SELECT,
      })
    : [];
  // Days planned ahead are not worked yet: they are no exposure.
  const params = { company: companyId, ...periods(w.from, w.to), start: w.from, end: w.to, rig: rig?.id ?? -1, today: new Date().toISOString().slice(0, 10) };
  const onRig = (alias: string) => (w.rigCode ? `AND ${alias}.rig_id = :rig` : "");
  const q = <T extends object>(sql: string) => reports().query<T>(sql, { replacements: params, type: QueryTypes.SELECT });
  const [faults, rigDays, open] = await Promise.all([
    q<Record<string, unknown>>(`
      SELECT b.job_id, b.cause_code, SUM(b.cases) AS cases, SUM(b.repair_seconds) AS repair_seconds
      FROM board_job_mix b WHERE b.company_id = :company AND ${inPeriods} ${onRig("b")}
      GROUP BY b.job_id, b.cause_code`),
    q<Record<string, unknown>>(`
      SELECT d.job_id, COUNT(*) AS rig_days FROM job_days d
      WHERE d.company_id = :company AND d.day >= :from AND d.day < :to AND d.day <= :today AND d.rig_id IS NOT NULL ${onRig("d")} GROUP BY d.job_id`),
    q<Record<string, unknown>>(`
      SELECT c.job_id, COUNT(*) AS n FROM cases c
      WHERE c.company_id = :company AND c.outcome = 'handoff' AND c.handoff_resolved_at IS NULL AND c.opened_at >= :start AND c.opened_at < :end
        AND c.kind = 'fix' AND c.job_id IS NOT NULL ${onRig("c")} GROUP BY c.job_id`),
  ]);
  const byJob = new Map<number, { faults: number; downtime: number; top: { code: string; count: number } | null; rigDays: number; open: number }>();
  const row = (id: number) => {
    let r = byJob.get(id);
    if (!r) byJob.set(id, (r = { faults: 0, downtime: 0, top: null, rigDays: 0, open: 0 }));
    return r;
  };
  for (const f of faults) {
    const r = row(n(f.job_id));
    r.faults += n(f.cases);
    r.downtime += n(f.repair_seconds);
    if (f.cause_code && (!r.top || n(f.cases) > r.top.count)) r.top = { code: String(f.cause_code), count: n(f.cases) };
  }
  for (const d of rigDays) row(n(d.job_id)).rigDays = n(d.rig_days);
  for (const o of open) row(n(o.job_id)).open = n(o.n);
  if (!byJob.size) return [];
  const jobs = await reports().query<{ id: number; name: string; starts_on: string; elevation_ft: number | null; closed: number }>(
    "SELECT id, name, DATE_FORMAT(starts_on, '%Y-%m-%d') AS starts_on, elevation_ft, closed_at IS NOT NULL AS closed FROM jobs WHERE company_id = :company AND id IN (:ids)",
    { replacements: { company: companyId, ids: [...byJob.keys()] }, type: QueryTypes.SELECT },
  );
  return jobBoard(
    jobs.map((j) => {
      const r = byJob.get(n(j.id))!;
      return {
        jobId: n(j.id),
        name: String(j.name),
        startsOn: String(j.starts_on),
        elevationFt: j.elevation_ft === null ? null : n(j.elevation_ft),
        closed: Boolean(n(j.closed)),
        rigDays: r.rigDays,
        faults: r.faults,
        downtimeSeconds: r.downtime,
        openHandoffs: r.open,
        topCause: r.top,
      };
    }),
  );
}
