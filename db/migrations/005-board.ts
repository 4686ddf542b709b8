import { DataTypes, type QueryInterface } from "sequelize";

export async function up(qi: QueryInterface) {
  // A hand-off stays "open" on the board until a supervisor marks it dealt with.
  await qi.addColumn("cases", "handoff_resolved_at", { type: DataTypes.DATE(3), allowNull: true });
  await qi.addColumn("cases", "handoff_resolved_by", {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
    references: { model: "users", key: "id" },
    onDelete: "SET NULL",
  });
  // Covering indexes for the board's grouped queries: they read the index, not the rows.
  await qi.addIndex("cases", ["rig_id", "opened_at", "outcome", "engine_hours", "closed_at"], { name: "cases_board_rig" });
  await qi.addIndex("cases", ["company_id", "opened_at", "cause_code", "rig_id", "outcome", "closed_at"], { name: "cases_board_company" });
  await qi.addIndex("cases", ["company_id", "outcome", "handoff_resolved_at"], { name: "cases_open_handoffs" });
}

export async function down(qi: QueryInterface) {
  await qi.removeIndex("cases", "cases_open_handoffs");
  await qi.removeIndex("cases", "cases_board_company");
  await qi.removeIndex("cases", "cases_board_rig");
  await qi.removeColumn("cases", "handoff_resolved_by");
  await qi.removeColumn("cases", "handoff_resolved_at");
}
