import { db } from "../../db/index";

export * from "../../db/models";
export { changeCase, rebuildBoardRollups } from "../../db/board-rollups";
/** The one Sequelize instance, bound when the server first imports a service. */
export const sequelize = db();
