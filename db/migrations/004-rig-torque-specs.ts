import { DataTypes, type QueryInterface } from "sequelize";

export async function up(qi: QueryInterface) {
  // The company's own tightening figures for this rig's parts, e.g. agitator bearing flange bolts.
  await qi.addColumn("rigs", "torque_specs", { type: DataTypes.JSON, allowNull: false, defaultValue: "[]" });
}

export async function down(qi: QueryInterface) {
  await qi.removeColumn("rigs", "torque_specs");
}
