import type { QueryInterface } from "sequelize";

export async function up(qi: QueryInterface) {
  // Covering index for the board's per-person and per-guide counts.
  await qi.addIndex("cases", ["company_id", "opened_at", "opened_by", "guide_version_id", "outcome", "cause_code"], { name: "cases_board_people" });
}

export async function down(qi: QueryInterface) {
  await qi.removeIndex("cases", "cases_board_people");
}
