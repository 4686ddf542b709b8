import { DataTypes, type QueryInterface } from "sequelize";

/**
 * Cookie sessions cannot be deleted on the server, so each carries the person's session epoch
 * from when they signed in; a new password, or a sign-in turned off, moves the epoch on and
 * every older cookie stops working.
 */
export async function up(qi: QueryInterface) {
  await qi.addColumn("users", "session_epoch", { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
}

export async function down(qi: QueryInterface) {
  await qi.removeColumn("users", "session_epoch");
}
