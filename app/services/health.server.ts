import { sequelize } from "./db.server";

/** Can the app reach its database right now? */
export async function databaseIsUp(): Promise<boolean> {
  try {
    await sequelize.query("SELECT 1");
    return true;
  } catch {
    return false;
  }
}
