import { DataTypes, type QueryInterface } from "sequelize";

/** The language a person reads Tankside in ("en" or "es"); empty until their first sign-in picks it from the browser. */
export async function up(qi: QueryInterface) {
  await qi.addColumn("users", "language", { type: DataTypes.STRING(5), allowNull: true });
}

export async function down(qi: QueryInterface) {
  await qi.removeColumn("users", "language");
}
