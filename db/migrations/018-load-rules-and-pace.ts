import { DataTypes, type QueryInterface } from "sequelize";

/**
 * The load card works to the company's rules (fiber marks, seed limit, fiber ceiling, pace and
 * loading order; null means the shipped defaults) and to each person's own pace length.
 */
export async function up(qi: QueryInterface) {
  await qi.addColumn("companies", "load_rules", { type: DataTypes.JSON, allowNull: true });
  await qi.addColumn("users", "pace_ft", { type: DataTypes.DECIMAL(3, 1), allowNull: true });
}

export async function down(qi: QueryInterface) {
  await qi.removeColumn("users", "pace_ft");
  await qi.removeColumn("companies", "load_rules");
}
