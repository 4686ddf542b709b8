import type { QueryInterface } from "sequelize";

/** One covering index that every grouped board query can read without touching table rows. */
export async function up(qi: QueryInterface) {
  await qi.addIndex("cases", ["company_id", "opened_at", "rig_id", "outcome", "cause_code", "opened_by", "guide_version_id", "closed_at", "engine_hours"], {
    name: "cases_board_wide",
  });
  await qi.removeIndex("cases", "cases_board_company");
  await qi.removeIndex("cases", "cases_board_people");
}

export async function down(qi: QueryInterface) {
  await qi.addIndex("cases", ["company_id", "opened_at", "cause_code", "rig_id", "outcome", "closed_at"], { name: "cases_board_company" });
  await qi.addIndex("cases", ["company_id", "opened_at", "opened_by", "guide_version_id", "outcome", "cause_code"], { name: "cases_board_people" });
  await qi.removeIndex("cases", "cases_board_wide");
}
