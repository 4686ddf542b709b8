import { QueryTypes } from "sequelize";
import { buildBoard, type Board, type BoardAggregates } from "~/lib/stats/board";
import { sequelize } from "./db.server";
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

/**
 * The board's aggregates in a handful of grouped queries, all scoped to the company and the
 * window, on covering indexes; the numbers are then finished by the pure stats module.
 */
export async function boardAggregates(companyId: number, w: BoardWindow): Promise<BoardAggregates> {
  const repeatDays = w.repeatDays ?? 30;
  // Rigs are few: read them once, then filter and group cases by rig id alone, so each grouped
  // query runs on a covering index of `cases` without a join per row.
  const rigRows = await sequelize.query<{ id: number; code: string; has_hour_meter: number }>(
    "SELECT id, code, has_hour_meter FROM rigs WHERE company_id = :company AND (:rig IS NULL OR code = :rig) ORDER BY code",
    { replacements: { company: companyId, rig: w.rigCode ?? null }, type: QueryTypes.SELECT },
  );
  const codeOf = new Map(rigRows.map((r) => [Number(r.id), String(r.code)]));
  const params = { company: companyId, from: w.from, to: w.to, rigId: w.rigCode ? (rigRows[0]?.id ?? -1) : null, days: repeatDays };
  // Only when a rig is chosen: an "IS NULL OR" test would keep the optimizer off the index.
  const rigFilter = w.rigCode ? "AND c.rig_id = :rigId" : "";
  const q = <T extends object>(sql: string) => sequelize.query<T>(sql, { replacements: params, type: QueryTypes.SELECT });

  const [rigs, causes, chains, weeks, people, guides, personCauses, handoffs] = await Promise.all([
    q<Record<string, unknown>>(`
      SELECT c.rig_id, COUNT(*) AS cases,
        SUM(c.outcome = 'fixed') AS fixed, SUM(c.outcome = 'handoff') AS handoff, SUM(c.outcome = 'abandoned') AS abandoned,
        MAX(c.engine_hours) - MIN(c.engine_hours) AS hours,
        SUM(TIMESTAMPDIFF(SECOND, c.opened_at, c.closed_at)) AS repair_seconds, COUNT(c.closed_at) AS closed
      FROM cases c
      WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to ${rigFilter}
      GROUP BY c.rig_id`),
    q<Record<string, unknown>>(`
      SELECT c.cause_code AS cause, COUNT(*) AS count, SUM(TIMESTAMPDIFF(SECOND, c.opened_at, c.closed_at)) AS downtime_seconds
      FROM cases c
      WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to AND c.cause_code IS NOT NULL ${rigFilter}
      GROUP BY c.cause_code`),
    // Repeat chains as gaps and islands: a case starts a new chain unless the same cause was
    // found on the same rig within the window before it; only chains of two or more come back.
    q<Record<string, unknown>>(`
      SELECT rig_id, cause_code, COUNT(*) AS n, MIN(opened_at) AS first_at, MAX(opened_at) AS last_at,
        GROUP_CONCAT(id ORDER BY opened_at DESC, id DESC SEPARATOR ',' LIMIT 3) AS latest_ids,
        GROUP_CONCAT(DATE_FORMAT(opened_at, '%Y-%m-%dT%H:%i:%s.%fZ') ORDER BY opened_at DESC, id DESC SEPARATOR ',' LIMIT 3) AS latest_at
      FROM (
        SELECT id, rig_id, cause_code, opened_at, SUM(new_chain) OVER (PARTITION BY rig_id, cause_code ORDER BY opened_at, id) AS chain
        FROM (
          SELECT c.id, c.rig_id, c.cause_code, c.opened_at,
            CASE WHEN LAG(c.opened_at) OVER (PARTITION BY c.rig_id, c.cause_code ORDER BY c.opened_at, c.id) >= c.opened_at - INTERVAL :days DAY THEN 0 ELSE 1 END AS new_chain
          FROM cases c
          WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to AND c.cause_code IS NOT NULL ${rigFilter}
        ) marked
      ) chained
      GROUP BY rig_id, cause_code, chain HAVING COUNT(*) > 1`),
    q<Record<string, unknown>>(`
      SELECT DATE_FORMAT(DATE(c.opened_at) - INTERVAL WEEKDAY(c.opened_at) DAY, '%Y-%m-%d') AS week, COUNT(*) AS cases, SUM(c.outcome = 'handoff') AS handoffs
      FROM cases c
      WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to ${rigFilter}
      GROUP BY week ORDER BY week`),
    q<Record<string, unknown>>(`
      SELECT p.uid AS id, u.name, p.cases, p.handoffs FROM (
        SELECT c.opened_by AS uid, COUNT(*) AS cases, SUM(c.outcome = 'handoff') AS handoffs
        FROM cases c
        WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to ${rigFilter}
        GROUP BY c.opened_by
      ) p JOIN users u ON u.id = p.uid ORDER BY p.cases DESC`),
    q<Record<string, unknown>>(`
      SELECT p.uid, g.title, SUM(p.count) AS count FROM (
        SELECT c.opened_by AS uid, c.guide_version_id AS vid, COUNT(*) AS count
        FROM cases c
        WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to ${rigFilter}
        GROUP BY c.opened_by, c.guide_version_id
      ) p JOIN guide_versions v ON v.id = p.vid JOIN guides g ON g.id = v.guide_id
      GROUP BY p.uid, g.title`),
    q<Record<string, unknown>>(`
      SELECT c.opened_by AS uid, c.cause_code AS cause, COUNT(*) AS count
      FROM cases c
      WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to AND c.cause_code IS NOT NULL ${rigFilter}
      GROUP BY c.opened_by, c.cause_code`),
    q<Record<string, unknown>>(`
      SELECT c.id, r.code, g.title, c.opened_at, u.name
      FROM cases c JOIN rigs r ON r.id = c.rig_id JOIN guide_versions v ON v.id = c.guide_version_id JOIN guides g ON g.id = v.guide_id
      LEFT JOIN users u ON u.id = c.opened_by
      WHERE c.company_id = :company AND c.outcome = 'handoff' AND c.handoff_resolved_at IS NULL ${rigFilter}
      ORDER BY c.opened_at DESC LIMIT 50`),
  ]);

  const top = <T extends { count: number }>(xs: T[]) => xs.sort((a, b) => b.count - a.count).slice(0, 5);
  return {
    rigs: rigRows.map((rig) => {
      const r = rigs.find((x) => n(x.rig_id) === n(rig.id)) ?? {};
      return {
        rigCode: String(rig.code),
        cases: n(r.cases),
        fixed: n(r.fixed),
        handoff: n(r.handoff),
        abandoned: n(r.abandoned),
        operatingHours: n(rig.has_hour_meter) && r.hours !== null && r.hours !== undefined ? n(r.hours) : null,
        repairHours: n(r.repair_seconds) / 3600,
        closedCases: n(r.closed),
      };
    }),
    causes: causes.map((c) => ({ cause: String(c.cause), count: n(c.count), downtimeHours: n(c.downtime_seconds) / 3600 })),
    repeatChains: chains.map((c) => {
      const ids = String(c.latest_ids).split(",");
      const times = String(c.latest_at).split(",");
      return {
        rigCode: codeOf.get(n(c.rig_id)) ?? "?",
        cause: String(c.cause_code),
        count: n(c.n),
        firstAt: iso(c.first_at),
        lastAt: iso(c.last_at),
        latest: ids.map((caseId, i) => ({ caseId, openedAt: new Date(times[i].replace(/(\.\d{3})\d*Z$/, "$1Z")).toISOString() })),
      };
    }),
    weeks: weeks.map((w) => ({ weekStart: String(w.week), cases: n(w.cases), handoffs: n(w.handoffs) })),
    people: people.map((p) => ({
      name: String(p.name),
      cases: n(p.cases),
      handoffs: n(p.handoffs),
      guides: top(guides.filter((g) => n(g.uid) === n(p.id)).map((g) => ({ title: String(g.title), count: n(g.count) }))),
      causes: top(personCauses.filter((c) => n(c.uid) === n(p.id)).map((c) => ({ cause: String(c.cause), count: n(c.count) }))),
    })),
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
  return buildBoard(await boardAggregates(user.companyId, w));
}
