import { QueryTypes, type Transaction } from "sequelize";
import { raiseReportsVersion } from "./board-rollups.server";
import { reports, sequelize } from "./db.server";

/**
 * Reports (the board, the cases table) kept in memory per process, keyed by the company's reports
 * version (migration 020): fifty supervisors opening the same board cost one computation, and a
 * change the report shows raises the version, so the next request computes afresh. A kept report
 * is also dropped after a minute, for any change that forgot to raise the version.
 */
const MAX_AGE_MS = 60_000;
const MAX_ENTRIES = 500;
const kept = new Map<string, { at: number; value: Promise<unknown> }>();

/** Raises the company's reports version: call inside the transaction of any change a report shows. */
export async function reportsChanged(companyId: number, transaction?: Transaction): Promise<void> {
  await raiseReportsVersion(sequelize, companyId, transaction);
}

/** The report for this company and query: kept while the company's version stands, else computed (once for requests arriving together). */
export async function keptReport<T>(companyId: number, name: string, query: unknown, compute: () => Promise<T>): Promise<T> {
  // Read where the report reads: with a replica, its version and its rows agree.
  const [row] = await reports().query<{ v: number }>("SELECT reports_version AS v FROM companies WHERE id = :company", {
    replacements: { company: companyId },
    type: QueryTypes.SELECT,
  });
  const key = `${companyId}:${row?.v ?? 0}:${name}:${JSON.stringify(query)}`;
  const now = Date.now();
  const hit = kept.get(key);
  if (hit && now - hit.at < MAX_AGE_MS) return hit.value as Promise<T>;
  const value = compute();
  kept.delete(key); // an expired copy goes to the back of the line with its replacement
  kept.set(key, { at: now, value });
  value.catch(() => kept.get(key)?.value === value && kept.delete(key));
  // Oldest first out (a Map keeps insertion order).
  while (kept.size > MAX_ENTRIES) kept.delete(kept.keys().next().value!);
  return value;
}
