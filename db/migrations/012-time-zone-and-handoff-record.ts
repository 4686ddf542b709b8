import { DataTypes, type QueryInterface } from "sequelize";

/**
 * Each company works in its own time zone (screens, mail and the digest show local times).
 * A hand-off keeps whom it mailed and when (so the crew's phone and a resend are told the truth,
 * and the mail goes once), and a note from whoever marked it dealt with.
 */
export async function up(qi: QueryInterface) {
  await qi.addColumn("companies", "time_zone", { type: DataTypes.STRING(64), allowNull: false, defaultValue: "America/Denver" });
  await qi.addColumn("cases", "handoff_mailed_at", { type: DataTypes.DATE(3), allowNull: true });
  await qi.addColumn("cases", "handoff_mailed_to", { type: DataTypes.STRING(1000), allowNull: true });
  await qi.addColumn("cases", "handoff_resolved_note", { type: DataTypes.STRING(1000), allowNull: true });
}

export async function down(qi: QueryInterface) {
  await qi.removeColumn("cases", "handoff_resolved_note");
  await qi.removeColumn("cases", "handoff_mailed_to");
  await qi.removeColumn("cases", "handoff_mailed_at");
  await qi.removeColumn("companies", "time_zone");
}
