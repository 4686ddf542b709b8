import { DataTypes, type QueryInterface } from "sequelize";

/**
 * Routine service by engine hours and by calendar: each rig's rules (every N hours, every N days,
 * or whichever first) and every time one was done, with the hour meter read then.
 */
export async function up(qi: QueryInterface) {
  const ref = (model: string, onDelete = "CASCADE") => ({ type: DataTypes.INTEGER.UNSIGNED, references: { model, key: "id" }, onDelete });
  await qi.createTable("service_rules", {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    company_id: { ...ref("companies"), allowNull: false },
    rig_id: { ...ref("rigs"), allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    every_hours: { type: DataTypes.DECIMAL(6, 1), allowNull: true },
    every_days: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    retired: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("service_rules", ["company_id", "rig_id"], { name: "service_rules_company_rig" });
  await qi.createTable("service_records", {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    company_id: { ...ref("companies"), allowNull: false },
    rig_id: { ...ref("rigs"), allowNull: false },
    rule_id: { ...ref("service_rules"), allowNull: false },
    done_at: { type: DataTypes.DATE(3), allowNull: false },
    engine_hours: { type: DataTypes.DECIMAL(8, 1), allowNull: true },
    done_by: { ...ref("users", "SET NULL"), allowNull: true },
    note: { type: DataTypes.STRING(500), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("service_records", ["rule_id", "done_at"], { name: "service_records_rule_done" });
}

export async function down(qi: QueryInterface) {
  await qi.dropTable("service_records");
  await qi.dropTable("service_rules");
}
