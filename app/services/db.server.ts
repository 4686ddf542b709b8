import { ConnectionError, ConnectionAcquireTimeoutError, type Sequelize } from "sequelize";
import { data } from "react-router";
import { db, reportsDb } from "../../db/index";

export * from "../../db/models";
export { changeCase, rebuildBoardRollups } from "./board-rollups.server";

/** What every page and API answers while the database cannot be reached: 503 with a plain sentence and when to try again. */
export const DATABASE_DOWN_RETRY_SECONDS = 30;
const databaseDown = () =>
  data(
    { error: "Tankside's database is not answering right now. Your answers are kept on your phone; try again in a minute." },
    { status: 503, headers: { "Retry-After": String(DATABASE_DOWN_RETRY_SECONDS) } },
  );
const isDown = (error: unknown) => error instanceof ConnectionError || error instanceof ConnectionAcquireTimeoutError;

/**
 * The one Sequelize instance, bound when the server first imports a service. Its queries and
 * transactions turn "cannot reach the database" into that 503 (every model call goes through them),
 * so no page answers a driver's error as a 500.
 */
function guarded(sequelize: Sequelize): Sequelize {
  const query = sequelize.query.bind(sequelize);
  const transaction = sequelize.transaction.bind(sequelize);
  const rethrow = (error: unknown): never => {
    throw isDown(error) ? databaseDown() : error;
  };
  sequelize.query = ((...args: Parameters<typeof query>) => query(...args).catch(rethrow)) as typeof sequelize.query;
  sequelize.transaction = ((...args: Parameters<typeof transaction>) =>
    (transaction as (...a: unknown[]) => Promise<unknown>)(...args).catch(rethrow)) as typeof sequelize.transaction;
  return sequelize;
}

export const sequelize = guarded(db());

let reportsInstance: Sequelize | undefined;
/** Reports read here: the read replicas when DATABASE_REPLICA_URLS names any (they may lag by the replicas' delay), else the same instance. */
export function reports(): Sequelize {
  const instance = reportsDb();
  if (instance === db()) return sequelize;
  if (reportsInstance !== instance) reportsInstance = guarded(instance);
  return reportsInstance;
}
