import type { Sequelize } from "sequelize";
import { createSequelize } from "./connection";
import { initModels } from "./models";

export * from "./models";

let instance: Sequelize | undefined;

/** The process's one Sequelize instance, built from DATABASE_URL on first use. */
export function db(): Sequelize {
  if (!instance) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set");
    instance = createSequelize(url);
    initModels(instance);
  }
  return instance;
}

let reports: Sequelize | undefined;

/** Comma-separated `mariadb://` URLs of read replicas (DATABASE_REPLICA_URLS), none when unset. */
const replicaUrls = () =>
  (process.env.DATABASE_REPLICA_URLS ?? "")
    .split(",")
    .map((u) => u.trim())
    .filter(Boolean);

/**
 * Where reports read (the board, the cases table and its CSV, the digest): the read replicas when
 * there are any, else the one instance. Everything else, above all what a person has just written
 * and reads back, goes to the primary through `db()`.
 */
export function reportsDb(): Sequelize {
  if (!replicaUrls().length) return db();
  reports ??= createSequelize(process.env.DATABASE_URL!, { replicas: replicaUrls() });
  return reports;
}

const closers: (() => Promise<void>)[] = [];

/** Something else that holds database connections (the throttle's pool) closes with the database. */
export function onDbClose(close: () => Promise<void>) {
  closers.push(close);
}

export async function closeDb(): Promise<void> {
  await Promise.all(closers.splice(0).map((c) => c()));
  if (reports) await reports.close();
  if (instance) await instance.close();
  instance = undefined;
  reports = undefined;
}
