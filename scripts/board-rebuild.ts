/**
 * `npm run board:rebuild`: rebuilds the fault board's rollups from the cases, for after a
 * bulk import or a restore (cases opened and closed in the app keep them up to date on their
 * own). Uses DATABASE_URL when set; otherwise the local MariaDB under .data/.
 */
import path from "node:path";
import { performance } from "node:perf_hooks";
import { rebuildBoardRollups } from "../app/services/board-rollups.server";
import { closeDb, db as sequelize } from "../db/index";
import { startLocalMariadb } from "../db/local-mariadb";
import { migrateUp } from "../db/migrate";

const local = process.env.DATABASE_URL
  ? null
  : await startLocalMariadb({ dir: path.resolve(".data/mariadb"), port: Number(process.env.DB_PORT ?? 3406), database: "tankside", log: () => {} });
if (local) process.env.DATABASE_URL = local.url;
try {
  await migrateUp(sequelize());
  const t = performance.now();
  await rebuildBoardRollups(sequelize());
  console.log(`Board rollups rebuilt in ${((performance.now() - t) / 1000).toFixed(1)} s.`);
} finally {
  await closeDb();
  await local?.stop();
}
