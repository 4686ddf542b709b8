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
  const params = { company: companyId, from: w.from, to: w.to, rig: w.rigCode ?? null, days: repeatDays };
  const rigFilter = "AND (:rig IS NULL OR r.code = :rig)";
  const q = <T extends object>(sql: string) => sequelize.query<T>(sql, { replacements: params, type: QueryTypes.SELECT });

  const [rigs, causes, candidates, weeks, people, guides, personCauses, handoffs] = await Promise.all([
    q<Record<string, unknown>>(`
      SELECT r.code, r.has_hour_meter, COUNT(c.id) AS cases,
        SUM(c.outcome = 'fixed') AS fixed, SUM(c.outcome = 'handoff') AS handoff, SUM(c.outcome = 'abandoned') AS abandoned,
        MAX(c.engine_hours) - MIN(c.engine_hours) AS hours,
        SUM(TIMESTAMPDIFF(SECOND, c.opened_at, c.closed_at)) AS repair_seconds, COUNT(c.closed_at) AS closed
      FROM rigs r LEFT JOIN cases c ON c.rig_id = r.id AND c.opened_at >= :from AND c.opened_at < :to
      WHERE r.company_id = :company ${rigFilter}
      GROUP BY r.id, r.code, r.has_hour_meter ORDER BY r.code`),
    q<Record<string, unknown>>(`
      SELECT c.cause_code AS cause, COUNT(*) AS count, SUM(TIMESTAMPDIFF(SECOND, c.opened_at, c.closed_at)) AS downtime_seconds
      FROM cases c JOIN rigs r ON r.id = c.rig_id
      WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to AND c.cause_code IS NOT NULL ${rigFilter}
      GROUP BY c.cause_code`),
    // Only the cases that sit within the repeat window of the same cause on the same rig.
    q<Record<string, unknown>>(`
      SELECT id, code, cause_code, opened_at FROM (
        SELECT c.id, r.code, c.cause_code, c.opened_at,
          LAG(c.opened_at) OVER (PARTITION BY c.rig_id, c.cause_code ORDER BY c.opened_at) AS prev_at,
          LEAD(c.opened_at) OVER (PARTITION BY c.rig_id, c.cause_code ORDER BY c.opened_at) AS next_at
        FROM cases c JOIN rigs r ON r.id = c.rig_id
        WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to AND c.cause_code IS NOT NULL ${rigFilter}
      ) t
      WHERE (prev_at IS NOT NULL AND opened_at <= prev_at + INTERVAL :days DAY) OR (next_at IS NOT NULL AND next_at <= opened_at + INTERVAL :days DAY)`),
    q<Record<string, unknown>>(`
      SELECT DATE_FORMAT(DATE(c.opened_at) - INTERVAL WEEKDAY(c.opened_at) DAY, '%Y-%m-%d') AS week, COUNT(*) AS cases, SUM(c.outcome = 'handoff') AS handoffs
      FROM cases c JOIN rigs r ON r.id = c.rig_id
      WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to ${rigFilter}
      GROUP BY week ORDER BY week`),
    q<Record<string, unknown>>(`
      SELECT u.id, u.name, COUNT(*) AS cases, SUM(c.outcome = 'handoff') AS handoffs
      FROM cases c JOIN users u ON u.id = c.opened_by JOIN rigs r ON r.id = c.rig_id
      WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to ${rigFilter}
      GROUP BY u.id, u.name ORDER BY cases DESC`),
    q<Record<string, unknown>>(`
      SELECT c.opened_by AS uid, g.title, COUNT(*) AS count
      FROM cases c JOIN guide_versions v ON v.id = c.guide_version_id JOIN guides g ON g.id = v.guide_id JOIN rigs r ON r.id = c.rig_id
      WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to ${rigFilter}
      GROUP BY c.opened_by, g.title`),
    q<Record<string, unknown>>(`
      SELECT c.opened_by AS uid, c.cause_code AS cause, COUNT(*) AS count
      FROM cases c JOIN rigs r ON r.id = c.rig_id
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
    rigs: rigs.map((r) => ({
      rigCode: String(r.code),
      cases: n(r.cases), fixed: n(r.fixed), handoff: n(r.handoff), abandoned: n(r.abandoned),
      operatingHours: n(r.has_hour_meter) && r.hours !== null ? n(r.hours) : null,
      repairHours: n(r.repair_seconds) / 3600, closedCases: n(r.closed),
    })),
    causes: causes.map((c) => ({ cause: String(c.cause), count: n(c.count), downtimeHours: n(c.downtime_seconds) / 3600 })),
    repeatCandidates: candidates.map((c) => ({ caseId: String(c.id), rigCode: String(c.code), cause: String(c.cause_code), openedAt: iso(c.opened_at) })),
    weeks: weeks.map((w) => ({ weekStart: String(w.week), cases: n(w.cases), handoffs: n(w.handoffs) })),
    people: people.map((p) => ({
      name: String(p.name), cases: n(p.cases), handoffs: n(p.handoffs),
      guides: top(guides.filter((g) => n(g.uid) === n(p.id)).map((g) => ({ title: String(g.title), count: n(g.count) }))),
      causes: top(personCauses.filter((c) => n(c.uid) === n(p.id)).map((c) => ({ cause: String(c.cause), count: n(c.count) }))),
    })),
    openHandoffs: handoffs.map((h) => ({ caseId: String(h.id), rigCode: String(h.code), guideTitle: String(h.title), openedAt: iso(h.opened_at), openedBy: h.name ? String(h.name) : null })),
  };
}

export async function boardFor(user: SessionUser, w: BoardWindow): Promise<Board> {
  return buildBoard(await boardAggregates(user.companyId, w), w.repeatDays ?? 30);
}
