import { DataTypes, type QueryInterface } from "sequelize";

/**
 * A photo taken with no signal waits on the phone and is sent when signal returns, maybe more
 * than once (a dropped connection after the server stored it). The phone names each photo; the
 * same name on the same case is the same photo, stored once.
 */
export async function up(qi: QueryInterface) {
  await qi.addColumn("case_photos", "phone_id", { type: DataTypes.CHAR(36), allowNull: true });
  await qi.addIndex("case_photos", ["case_id", "phone_id"], { unique: true, name: "case_photos_phone_id" });
}

export async function down(qi: QueryInterface) {
  await qi.removeIndex("case_photos", "case_photos_phone_id");
  await qi.removeColumn("case_photos", "phone_id");
}
