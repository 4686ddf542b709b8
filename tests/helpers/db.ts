import { db } from "../../db/index";
import { rebuildBoardRollups } from "~/services/board-rollups.server";
import { migrateUp } from "../../db/migrate";
import { seedAll } from "../../seeds/seed-all";

/** Empties every table (keeping the schema), so each test file starts clean. */
export async function resetDatabase({ seed = true } = {}) {
  const sequelize = db();
  await migrateUp(sequelize);
  const [rows] = await sequelize.query("SHOW TABLES");
  const tables = (rows as Record<string, string>[]).map((r) => Object.values(r)[0]).filter((t) => t !== "schema_migrations");
  await sequelize.transaction(async (transaction) => {
    await sequelize.query("SET FOREIGN_KEY_CHECKS = 0", { transaction });
    for (const t of tables) await sequelize.query(`TRUNCATE TABLE \`${t}\``, { transaction });
    await sequelize.query("SET FOREIGN_KEY_CHECKS = 1", { transaction });
  });
  if (seed) await seedAll({ log: () => {} });
}

/** Cases made straight through the model skip the board's rollups, as a bulk import does; this brings them up to date. */
export const rebuildRollups = () => rebuildBoardRollups(db());
