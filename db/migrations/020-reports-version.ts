import { DataTypes, type QueryInterface } from "sequelize";

/**
 * A counter per company, raised in the same transaction as any change its reports show (a case
 * opened, closed or resolved; a rig, person or guide changed), so a report kept in memory knows
 * with one key lookup whether it is still the truth.
 */
export async function up(qi: QueryInterface) {
  await qi.addColumn("companies", "reports_version", { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
}

export async function down(qi: QueryInterface) {
  await qi.removeColumn("companies", "reports_version");
}
