import { DataTypes, type QueryInterface } from "sequelize";

/**
 * Rig cards are walked like guides and saved as cases of their own kind: `kind` keeps them out of
 * every fault figure; `from_case_id` links a fix opened from a card item back to the card;
 * `card_gaps` counts the card's items answered "can't do it" (set at close: complete means none).
 * A service rule may name the card task that records it, and a record keeps the card it came from.
 */
export async function up(qi: QueryInterface) {
  await qi.addColumn("cases", "kind", { type: DataTypes.ENUM("fix", "card"), allowNull: false, defaultValue: "fix" });
  await qi.addColumn("cases", "from_case_id", { type: DataTypes.CHAR(36), allowNull: true });
  await qi.addColumn("cases", "card_gaps", { type: DataTypes.TINYINT.UNSIGNED, allowNull: true });
  await qi.addIndex("cases", ["company_id", "kind", "rig_id", "opened_at"], { name: "cases_company_kind_rig_opened" });
  await qi.addColumn("service_rules", "task", { type: DataTypes.STRING(40), allowNull: true });
  await qi.addColumn("service_records", "case_id", { type: DataTypes.CHAR(36), allowNull: true });
  await qi.addIndex("service_records", ["company_id", "rig_id", "done_at"], { name: "service_records_company_rig_done" });
}

export async function down(qi: QueryInterface) {
  await qi.removeIndex("service_records", "service_records_company_rig_done");
  await qi.removeColumn("service_records", "case_id");
  await qi.removeColumn("service_rules", "task");
  await qi.removeIndex("cases", "cases_company_kind_rig_opened");
  await qi.removeColumn("cases", "card_gaps");
  await qi.removeColumn("cases", "from_case_id");
  await qi.removeColumn("cases", "kind");
}
