import { QueryTypes, Transaction, type Sequelize } from "sequelize";
import { DEFAULT_REPEAT_DAYS } from "../app/lib/stats/repeats";

/**
 * The fault board's rollups (tables made in migration 008): per rig and day, per
 * rig/person/guide/cause and day or month, and per repeat chain and day or month.
 * Every function here recomputes rows from `cases` rather than adding to them, so running
 * one twice, or after a resent case, gives the same rows.
 */

const DAY = 86_400_000;
const dayOf = (t: Date) => new Date(Math.floor(t.getTime() / DAY) * DAY);
const monthOf = (t: Date) => new Date(Date.UTC(t.getUTCFullYear(), t.getUTCMonth(), 1));
const nextMonth = (t: Date) => new Date(Date.UTC(t.getUTCFullYear(), t.getUTCMonth() + 1, 1));

interface Scope {
  companyId: number;
  transaction?: Transaction;
}

/**
 * Marks each case with the first case of its repeat chain: same rig and cause, each case
 * within the default repeat window of the one before (gaps and islands, as the board's
 * live query does it). Returns the opening time of the last case whose mark changed.
 */
async function markChains(sequelize: Sequelize, s: Scope & { rigId?: number; causeCode?: string; all?: boolean }): Promise<{ last: Date } | null> {
  const only = s.rigId === undefined ? "" : "AND rig_id = :rigId AND cause_code = :causeCode";
  // Each chain's first case through FIRST_VALUE over a running chain number (a running MAX of starts was quadratic on MariaDB 10.11).
  const chained = `
    SELECT id, FIRST_VALUE(opened_at) OVER (PARTITION BY rig_id, cause_code, chain ORDER BY opened_at, id) AS chain_at FROM (
      SELECT id, rig_id, cause_code, opened_at, SUM(starts) OVER (PARTITION BY rig_id, cause_code ORDER BY opened_at, id) AS chain FROM (
        SELECT id, rig_id, cause_code, opened_at,
          CASE WHEN LAG(opened_at) OVER (PARTITION BY rig_id, cause_code ORDER BY opened_at, id) >= opened_at - INTERVAL :days DAY THEN 0 ELSE 1 END AS starts
        FROM cases WHERE company_id = :company AND cause_code IS NOT NULL ${only}
      ) marked
    ) numbered`;
  const replacements = { company: s.companyId, rigId: s.rigId ?? null, causeCode: s.causeCode ?? null, days: DEFAULT_REPEAT_DAYS };
  const update = () =>
    sequelize.query(`UPDATE cases c JOIN (${chained}) d ON d.id = c.id SET c.repeat_chain_at = d.chain_at WHERE NOT (c.repeat_chain_at <=> d.chain_at)`, {
      replacements,
      transaction: s.transaction,
    });
  // A full rebuild refreshes every day anyway, so it need not learn which moved.
  if (s.all) return update().then(() => null);
  const [changed] = await sequelize.query<{ last: Date | null }>(
    `SELECT MAX(c.opened_at) AS last FROM cases c JOIN (${chained}) d ON d.id = c.id WHERE NOT (c.repeat_chain_at <=> d.chain_at)`,
    { replacements, type: QueryTypes.SELECT, transaction: s.transaction },
  );
  if (!changed?.last) return null;
  await update();
  return { last: new Date(changed.last) };
}

/** Recomputes every rollup row for the days from `from` up to (not including) `to`, and the months that hold them. */
async function refreshDays(sequelize: Sequelize, s: Scope, from: Date, to: Date) {
  const months = { from: monthOf(from), to: nextMonth(new Date(to.getTime() - 1)) };
  const run = (sql: string, range: { from: Date; to: Date }) =>
    sequelize.query(sql, { replacements: { company: s.companyId, from: range.from, to: range.to }, transaction: s.transaction });
  const days = { from, to };
  const caseDays = "c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to";

  await run("DELETE FROM board_rig_days WHERE company_id = :company AND day >= :from AND day < :to", days);
  await run(
    `INSERT INTO board_rig_days (company_id, day, rig_id, cases, fixed, handoff, abandoned, closed, repair_seconds, min_hours, max_hours)
     SELECT c.company_id, DATE(c.opened_at), c.rig_id, COUNT(*), SUM(c.outcome = 'fixed'), SUM(c.outcome = 'handoff'), SUM(c.outcome = 'abandoned'),
       COUNT(c.closed_at), COALESCE(SUM(TIMESTAMPDIFF(SECOND, c.opened_at, c.closed_at)), 0), MIN(c.engine_hours), MAX(c.engine_hours)
     FROM cases c WHERE ${caseDays}
     GROUP BY c.company_id, DATE(c.opened_at), c.rig_id`,
    days,
  );

  await run("DELETE FROM board_mix WHERE company_id = :company AND span = 'day' AND period >= :from AND period < :to", days);
  await run(
    `INSERT INTO board_mix (company_id, span, period, rig_id, opened_by, guide_id, cause_code, cases, handoff, repair_seconds)
     SELECT c.company_id, 'day', DATE(c.opened_at), c.rig_id, COALESCE(c.opened_by, 0), v.guide_id, COALESCE(c.cause_code, ''),
       COUNT(*), SUM(c.outcome = 'handoff'), COALESCE(SUM(TIMESTAMPDIFF(SECOND, c.opened_at, c.closed_at)), 0)
     FROM cases c JOIN guide_versions v ON v.id = c.guide_version_id WHERE ${caseDays}
     GROUP BY c.company_id, DATE(c.opened_at), c.rig_id, COALESCE(c.opened_by, 0), v.guide_id, COALESCE(c.cause_code, '')`,
    days,
  );
  await run("DELETE FROM board_mix WHERE company_id = :company AND span = 'month' AND period >= :from AND period < :to", months);
  await run(
    `INSERT INTO board_mix (company_id, span, period, rig_id, opened_by, guide_id, cause_code, cases, handoff, repair_seconds)
     SELECT company_id, 'month', DATE_FORMAT(period, '%Y-%m-01'), rig_id, opened_by, guide_id, cause_code, SUM(cases), SUM(handoff), SUM(repair_seconds)
     FROM board_mix WHERE company_id = :company AND span = 'day' AND period >= :from AND period < :to
     GROUP BY company_id, DATE_FORMAT(period, '%Y-%m-01'), rig_id, opened_by, guide_id, cause_code`,
    months,
  );

  await run("DELETE FROM board_chains WHERE company_id = :company AND span = 'day' AND period >= :from AND period < :to", days);
  await run(
    `INSERT INTO board_chains (company_id, span, period, rig_id, cause_code, chain_at, cases, first_at, last_at, latest)
     SELECT c.company_id, 'day', DATE(c.opened_at), c.rig_id, c.cause_code, c.repeat_chain_at, COUNT(*), MIN(c.opened_at), MAX(c.opened_at),
       GROUP_CONCAT(c.id, '@', DATE_FORMAT(c.opened_at, '%Y-%m-%dT%H:%i:%s.%fZ') ORDER BY c.opened_at DESC, c.id DESC SEPARATOR ',' LIMIT 3)
     FROM cases c WHERE ${caseDays} AND c.cause_code IS NOT NULL AND c.repeat_chain_at IS NOT NULL
     GROUP BY c.company_id, DATE(c.opened_at), c.rig_id, c.cause_code, c.repeat_chain_at`,
    days,
  );
  await run("DELETE FROM board_chains WHERE company_id = :company AND span = 'month' AND period >= :from AND period < :to", months);
  await run(
    `INSERT INTO board_chains (company_id, span, period, rig_id, cause_code, chain_at, cases, first_at, last_at, latest)
     SELECT company_id, 'month', DATE_FORMAT(period, '%Y-%m-01'), rig_id, cause_code, chain_at, SUM(cases), MIN(first_at), MAX(last_at),
       SUBSTRING_INDEX(GROUP_CONCAT(latest ORDER BY period DESC SEPARATOR ',' LIMIT 3), ',', 3)
     FROM board_chains WHERE company_id = :company AND span = 'day' AND period >= :from AND period < :to
     GROUP BY company_id, DATE_FORMAT(period, '%Y-%m-01'), rig_id, cause_code, chain_at`,
    months,
  );
}

export interface CaseKey {
  companyId: number;
  rigId: number;
  causeCode: string | null;
  openedAt: Date;
}

/** The company's row lock, serialising rollup upkeep per company. Take it first: an insert's foreign-key check holds a shared lock on the same row. */
const lockCompany = (sequelize: Sequelize, companyId: number, transaction: Transaction) =>
  sequelize.query("SELECT id FROM companies WHERE id = :company FOR UPDATE", { replacements: { company: companyId }, transaction });

/** Recomputes the rollups one case touches: its day and month and, once it has a cause, its repeat chain and what that moved. */
async function refreshForCase(sequelize: Sequelize, c: CaseKey, transaction: Transaction): Promise<void> {
  const s = { companyId: c.companyId, transaction };
  const from = dayOf(c.openedAt);
  let to = new Date(from.getTime() + DAY);
  if (c.causeCode) {
    // A late close can join the chain after it to the one before; only cases after this one can move.
    const moved = await markChains(sequelize, { ...s, rigId: c.rigId, causeCode: c.causeCode });
    if (moved) to = new Date(Math.max(to.getTime(), dayOf(moved.last).getTime() + DAY));
  }
  await refreshDays(sequelize, s, from, to);
}

/**
 * Opens or closes a case and keeps the board's rollups right in the same transaction:
 * `change` writes the case and returns which one it was. Read committed, so the
 * recomputation sees what other closes of the company have committed before it.
 */
export async function changeCase<T extends CaseKey>(sequelize: Sequelize, companyId: number, change: (transaction: Transaction) => Promise<T>): Promise<T> {
  return sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, async (transaction) => {
    await lockCompany(sequelize, companyId, transaction);
    const changed = await change(transaction);
    await refreshForCase(sequelize, changed, transaction);
    return changed;
  });
}

/** Rebuilds every rollup from the cases: after seeding, bulk imports, or when in doubt. Only the given company when one is named. */
export async function rebuildBoardRollups(sequelize: Sequelize, companyId?: number): Promise<void> {
  const companies =
    companyId === undefined
      ? (await sequelize.query<{ id: number }>("SELECT id FROM companies ORDER BY id", { type: QueryTypes.SELECT })).map((r) => Number(r.id))
      : [companyId];
  for (const id of companies) {
    await sequelize.transaction(async (transaction) => {
      await lockCompany(sequelize, id, transaction);
      await markChains(sequelize, { companyId: id, transaction, all: true });
      // Everything, including rows of days that no longer have cases.
      await refreshDays(sequelize, { companyId: id, transaction }, new Date(Date.UTC(1000, 0, 1)), new Date(Date.UTC(9999, 0, 1)));
    });
  }
}
