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

export async function closeDb(): Promise<void> {
  if (instance) await instance.close();
  instance = undefined;
}
