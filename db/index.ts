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

const closers: (() => Promise<void>)[] = [];

/** Something else that holds database connections (the throttle's pool) closes with the database. */
export function onDbClose(close: () => Promise<void>) {
  closers.push(close);
}

export async function closeDb(): Promise<void> {
  await Promise.all(closers.splice(0).map((c) => c()));
  if (instance) await instance.close();
  instance = undefined;
}
