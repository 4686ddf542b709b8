import { QueryTypes, Transaction, type Sequelize } from "sequelize";
import { DEFAULT_REPEAT_DAYS } from "../lib/stats/repeats";

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
 * Marks every case of the company with the first case of its repeat chain: same rig and
 * cause, each case within the default repeat window of the one before (gaps and islands, as
 * the board's live query does it). For the full rebuild; a single close uses markChainOf.
 */
async function markAllChains(sequelize: Sequelize, s: Scope) {
  // Each chain's first case through FIRST_VALUE over a running chain number (a running MAX of starts was quadratic on MariaDB 10.11).
  const chained = `
    SELECT id, FIRST_VALUE(opened_at) OVER (PARTITION BY rig_id, cause_code, chain ORDER BY opened_at, id) AS chain_at FROM (
      SELECT id, rig_id, cause_code, opened_at, SUM(starts) OVER (PARTITION BY rig_id, cause_code ORDER BY opened_at, id) AS chain FROM (
        SELECT id, rig_id, cause_code, opened_at,
          CASE WHEN LAG(opened_at) OVER (PARTITION BY rig_id, cause_code ORDER BY opened_at, id) >= opened_at - INTERVAL :days DAY THEN 0 ELSE 1 END AS starts
        FROM cases WHERE company_id = :company AND kind = 'fix' AND cause_code IS NOT NULL
      ) marked
    ) numbered`;
  await sequelize.query(`UPDATE cases c JOIN (${chained}) d ON d.id = c.id SET c.repeat_chain_at = d.chain_at WHERE NOT (c.repeat_chain_at <=> d.chain_at)`, {
    replacements: { company: s.companyId, days: DEFAULT_REPEAT_DAYS },
    transaction: s.transaction,
  });
}

/** Recomputes every rollup row for the days from `from` up to (not including) `to`, and the months that hold them. */
async function refreshDays(sequelize: Sequelize, s: Scope, from: Date, to: Date) {
  const months = { from: monthOf(from), to: nextMonth(new Date(to.getTime() - 1)) };
  const run = (sql: string, range: { from: Date; to: Date }) =>
    sequelize.query(sql, { replacements: { company: s.companyId, from: range.from, to: range.to }, transaction: s.transaction });
  const days = { from, to };
  // Rig cards are routine, not faults: no board figure counts them.
  const caseDays = "c.company_id = :company AND c.kind = 'fix' AND c.opened_at >= :from AND c.opened_at < :to";

  await run("DELETE FROM board_rig_days WHERE company_id = :company AND day >= :from AND day < :to", days);
  // Faults from fixes only; the hour meter from every reading, rig cards' too (read each working day, they measure
  // a short window's engine hours where a few faults' readings would not).
  await run(
    `INSERT INTO board_rig_days (company_id, day, rig_id, cases, fixed, handoff, abandoned, closed, repair_seconds, min_hours, max_hours)
     SELECT c.company_id, DATE(c.opened_at), c.rig_id, SUM(c.kind = 'fix'), SUM(c.kind = 'fix' AND c.outcome = 'fixed'),
       SUM(c.kind = 'fix' AND c.outcome = 'handoff'), SUM(c.kind = 'fix' AND c.outcome = 'abandoned'), SUM(c.kind = 'fix' AND c.closed_at IS NOT NULL),
       COALESCE(SUM(IF(c.kind = 'fix', TIMESTAMPDIFF(SECOND, c.opened_at, c.closed_at), 0)), 0), MIN(c.engine_hours), MAX(c.engine_hours)
     FROM cases c WHERE c.company_id = :company AND c.opened_at >= :from AND c.opened_at < :to
     GROUP BY c.company_id, DATE(c.opened_at), c.rig_id`,
    days,
  );

  // Per job, faults as the rigs table counts them: fixed or handed off (an abandoned walk-through is not a found fault).
  await run("DELETE FROM board_job_mix WHERE company_id = :company AND span = 'day' AND period >= :from AND period < :to", days);
  await run(
    `INSERT INTO board_job_mix (company_id, span, period, job_id, rig_id, cause_code, cases, handoff, repair_seconds)
     SELECT c.company_id, 'day', DATE(c.opened_at), c.job_id, c.rig_id, COALESCE(c.cause_code, ''), COUNT(*), SUM(c.outcome = 'handoff'),
       COALESCE(SUM(TIMESTAMPDIFF(SECOND, c.opened_at, c.closed_at)), 0)
     FROM cases c WHERE ${caseDays} AND c.job_id IS NOT NULL AND c.outcome IN ('fixed', 'handoff')
     GROUP BY c.company_id, DATE(c.opened_at), c.job_id, c.rig_id, COALESCE(c.cause_code, '')`,
    days,
  );
  await run("DELETE FROM board_job_mix WHERE company_id = :company AND span = 'month' AND period >= :from AND period < :to", months);
  await run(
    `INSERT INTO board_job_mix (company_id, span, period, job_id, rig_id, cause_code, cases, handoff, repair_seconds)
     SELECT company_id, 'month', DATE_FORMAT(period, '%Y-%m-01'), job_id, rig_id, cause_code, SUM(cases), SUM(handoff), SUM(repair_seconds)
     FROM board_job_mix WHERE company_id = :company AND span = 'day' AND period >= :from AND period < :to
     GROUP BY company_id, DATE_FORMAT(period, '%Y-%m-01'), job_id, rig_id, cause_code`,
    months,
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
  id: string;
  companyId: number;
  rigId: number;
  causeCode: string | null;
  openedAt: Date;
  /** A card changes no rollup (only the reports version); absent means a fix. */
  kind?: "fix" | "card";
}

/** Raises the company's reports version (migration 020): reports kept in memory are computed afresh. */
export const raiseReportsVersion = (sequelize: Sequelize, companyId: number, transaction?: Transaction) =>
  sequelize.query("UPDATE companies SET reports_version = reports_version + 1 WHERE id = :company", { replacements: { company: companyId }, transaction });

/** The company's row lock, serialising rollup upkeep per company. Take it first: an insert's foreign-key check holds a shared lock on the same row. */
const lockCompany = (sequelize: Sequelize, companyId: number, transaction: Transaction) =>
  sequelize.query("SELECT id FROM companies WHERE id = :company FOR UPDATE", { replacements: { company: companyId }, transaction });

interface Neighbour {
  id: string;
  opened_at: Date;
  repeat_chain_at: Date | null;
}

/**
 * Marks one case that has just got its cause, looking only at its neighbours in time on the
 * same rig and cause. Its chain is the one before it if that is close enough, else its own.
 * The only other change it can make: the chain that starts right after it, if close enough,
 * now continues its chain, so that whole chain takes its mark. (A case at the very same
 * millisecond needs no care: the mark is a time, and such twins always share it.)
 */
async function markChainOf(sequelize: Sequelize, c: CaseKey & { causeCode: string }, transaction: Transaction): Promise<{ last: Date } | null> {
  const replacements = { rig: c.rigId, cause: c.causeCode, t: c.openedAt, id: c.id };
  const q = <T extends object>(sql: string, extra: Record<string, unknown> = {}) =>
    sequelize.query<T>(sql, { replacements: { ...replacements, ...extra }, type: QueryTypes.SELECT, transaction });
  const seq = "rig_id = :rig AND cause_code = :cause AND id <> :id";
  const [before, after] = await Promise.all([
    q<Neighbour>(`SELECT id, opened_at, repeat_chain_at FROM cases WHERE ${seq} AND opened_at < :t ORDER BY opened_at DESC, id DESC LIMIT 1`),
    q<Neighbour>(`SELECT id, opened_at, repeat_chain_at FROM cases WHERE ${seq} AND opened_at > :t ORDER BY opened_at, id LIMIT 1`),
  ]);

  const limit = DEFAULT_REPEAT_DAYS * DAY;
  const t = c.openedAt.getTime();
  const prev = before[0];
  const next = after[0];
  const mark = prev && t - new Date(prev.opened_at).getTime() <= limit && prev.repeat_chain_at ? new Date(prev.repeat_chain_at) : c.openedAt;
  await sequelize.query("UPDATE cases SET repeat_chain_at = :mark WHERE id = :id", { replacements: { mark, id: c.id }, transaction });
  if (!next || new Date(next.opened_at).getTime() - t > limit || !next.repeat_chain_at || new Date(next.repeat_chain_at).getTime() === mark.getTime())
    return null;
  // The next case started a chain of its own; now it continues this one, and so does the rest of its chain.
  const old = new Date(next.repeat_chain_at);
  const [{ last }] = await q<{ last: Date }>(
    "SELECT MAX(opened_at) AS last FROM cases WHERE rig_id = :rig AND cause_code = :cause AND repeat_chain_at = :old",
    { old },
  );
  await sequelize.query("UPDATE cases SET repeat_chain_at = :mark WHERE rig_id = :rig AND cause_code = :cause AND repeat_chain_at = :old", {
    replacements: { ...replacements, mark, old },
    transaction,
  });
  return { last: new Date(last) };
}

/** Recomputes the rollups one case touches: its day and month and, once it has a cause, its repeat chain and what that moved. */
async function refreshForCase(sequelize: Sequelize, c: CaseKey, transaction: Transaction): Promise<void> {
  const s = { companyId: c.companyId, transaction };
  const from = dayOf(c.openedAt);
  let to = new Date(from.getTime() + DAY);
  if (c.causeCode) {
    const moved = await markChainOf(sequelize, { ...c, causeCode: c.causeCode }, transaction);
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
    // A card is no fault, but its hour reading measures the rig's day: only its day is refreshed.
    if (changed.kind !== "card") await refreshForCase(sequelize, changed, transaction);
    else
      await refreshDays(sequelize, { companyId: changed.companyId, transaction }, dayOf(changed.openedAt), new Date(dayOf(changed.openedAt).getTime() + DAY));
    await raiseReportsVersion(sequelize, companyId, transaction);
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
      await markAllChains(sequelize, { companyId: id, transaction });
      // Everything, including rows of days that no longer have cases.
      await refreshDays(sequelize, { companyId: id, transaction }, new Date(Date.UTC(1000, 0, 1)), new Date(Date.UTC(9999, 0, 1)));
      await raiseReportsVersion(sequelize, id, transaction);
    });
  }
}
