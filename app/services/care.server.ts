import { QueryTypes } from "sequelize";
import { isoInZone } from "~/lib/format";
import { careFigures, type CareFigures } from "~/lib/stats/care";
import type { BoardWindow } from "./board.server";
import { reports } from "./db.server";
import type { SessionUser } from "./guards.server";
import { keptReport } from "./report-cache.server";

// Readings this long before the window measure its first days (a rig idle longer starts unmeasured).
const LOOK_BACK_DAYS = 30;
const iso = (v: unknown) => (v instanceof Date ? v.toISOString() : new Date(String(v)).toISOString());
const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

/**
 * The board's "what skipped care costs": cards, faults, hour readings and services of the
 * company (and rig) for the window, finished by the pure `careFigures`.
 */
export async function careFor(user: SessionUser, w: BoardWindow, now = new Date()): Promise<CareFigures> {
  return keptReport(user.companyId, "care", w, async () => {
    const params = {
      company: user.companyId,
      from: w.from,
      to: w.to,
      back: new Date(w.from.getTime() - LOOK_BACK_DAYS * 86_400_000),
      rig: w.rigCode ?? null,
    };
    const q = <T extends object>(sql: string) => reports().query<T>(sql, { replacements: params, type: QueryTypes.SELECT });
    const rigScope = "(:rig IS NULL OR r.code = :rig)";
    const [rigs, readings, cards, faults, rules, done] = await Promise.all([
      q<{ id: number; code: string; has_hour_meter: number }>(
        `SELECT r.id, r.code, r.has_hour_meter FROM rigs r WHERE r.company_id = :company AND r.retired = 0 AND ${rigScope} ORDER BY r.code`,
      ),
      q<{ rig_id: number; at: Date; hours: string }>(
        `SELECT c.rig_id, IF(c.kind = 'card', c.opened_at, c.closed_at) AS at, c.engine_hours AS hours
           FROM cases c JOIN rigs r ON r.id = c.rig_id
          WHERE c.company_id = :company AND c.engine_hours IS NOT NULL AND c.opened_at >= :back AND c.opened_at < :to AND ${rigScope}
         UNION ALL
         SELECT s.rig_id, s.done_at, s.engine_hours FROM service_records s JOIN rigs r ON r.id = s.rig_id
          WHERE s.company_id = :company AND s.engine_hours IS NOT NULL AND s.done_at >= :back AND s.done_at < :to AND ${rigScope}`,
      ),
      q<{ rig_id: number; slug: string; at: Date; outcome: string; gaps: number | null }>(
        `SELECT c.rig_id, g.slug, c.opened_at AS at, c.outcome, c.card_gaps AS gaps
           FROM cases c JOIN rigs r ON r.id = c.rig_id JOIN guide_versions v ON v.id = c.guide_version_id JOIN guides g ON g.id = v.guide_id
          WHERE c.company_id = :company AND c.kind = 'card' AND c.opened_at >= :back AND c.opened_at < :to AND ${rigScope}`,
      ),
      q<{ rig_id: number; at: Date; hours: string | null }>(
        `SELECT c.rig_id, c.opened_at AS at, c.engine_hours AS hours FROM cases c JOIN rigs r ON r.id = c.rig_id
          WHERE c.company_id = :company AND c.kind = 'fix' AND c.outcome IN ('fixed', 'handoff') AND c.opened_at >= :from AND c.opened_at < :to AND ${rigScope}`,
      ),
      q<{ id: number; rig_id: number; name: string; every_hours: string | null; every_days: number | null; created_at: Date }>(
        `SELECT s.id, s.rig_id, s.name, s.every_hours, s.every_days, s.created_at FROM service_rules s JOIN rigs r ON r.id = s.rig_id
          WHERE s.company_id = :company AND s.retired = 0 AND ${rigScope}`,
      ),
      q<{ rule_id: number; at: Date; hours: string | null }>(
        `SELECT s.rule_id, s.done_at AS at, s.engine_hours AS hours FROM service_records s JOIN rigs r ON r.id = s.rig_id
          WHERE s.company_id = :company AND s.done_at < :to AND ${rigScope}`,
      ),
    ]);
    const zone = user.timeZone;
    const lastDay = new Date(Math.min(now.getTime(), w.to.getTime() - 1));
    return careFigures({
      rigs: rigs.map((r) => ({ id: Number(r.id), code: String(r.code), hasHourMeter: Boolean(Number(r.has_hour_meter)) })),
      readings: readings.map((r) => ({ rigId: Number(r.rig_id), at: iso(r.at), hours: Number(r.hours) })),
      cards: cards.map((c) => ({ rigId: Number(c.rig_id), slug: String(c.slug), at: iso(c.at), complete: c.outcome === "fixed" && Number(c.gaps ?? 0) === 0 })),
      faults: faults.map((f) => ({ rigId: Number(f.rig_id), at: iso(f.at), hours: num(f.hours) })),
      rules: rules.map((r) => ({
        id: Number(r.id),
        rigId: Number(r.rig_id),
        name: String(r.name),
        everyHours: num(r.every_hours),
        everyDays: num(r.every_days),
        since: iso(r.created_at),
      })),
      done: done.map((d) => ({ ruleId: Number(d.rule_id), at: iso(d.at), hours: num(d.hours) })),
      zone,
      // The board's window is whole days, named as the form names them.
      fromDay: w.from.toISOString().slice(0, 10),
      toDay: w.to.toISOString().slice(0, 10),
      today: isoInZone(lastDay, zone).slice(0, 10),
    });
  });
}
