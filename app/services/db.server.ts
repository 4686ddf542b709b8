import { db } from "../../db/index";

export * from "../../db/models";
/** The one Sequelize instance, bound when the server first imports a service. */
export const sequelize = db();
