import { DataTypes, type QueryInterface } from "sequelize";

const table = { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" };
const ref = (model: string, allowNull = false, onDelete = "CASCADE") => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model, key: "id" },
  onDelete,
});
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up(qi: QueryInterface) {
  await qi.createTable(
    "cases",
    {
      // Made on the phone, so a resent "start" never makes a second case.
      id: { type: DataTypes.CHAR(36), primaryKey: true },
      company_id: ref("companies"),
      rig_id: ref("rigs"),
      guide_version_id: ref("guide_versions", false, "RESTRICT"),
      opened_by: ref("users", true, "SET NULL"),
      opened_at: { type: DataTypes.DATE(3), allowNull: false },
      closed_at: { type: DataTypes.DATE(3), allowNull: true },
      engine_hours: { type: DataTypes.DECIMAL(8, 1), allowNull: true },
      outcome: { type: DataTypes.ENUM("open", "fixed", "handoff", "abandoned"), allowNull: false, defaultValue: "open" },
      final_step: { type: DataTypes.STRING(80), allowNull: true },
      cause_code: { type: DataTypes.STRING(60), allowNull: true },
      safety_ack_at: { type: DataTypes.DATE(3), allowNull: true },
      note: { type: DataTypes.TEXT, allowNull: true },
      ...timestamps,
    },
    table,
  );
  await qi.addIndex("cases", ["company_id", "opened_at"]);
  await qi.addIndex("cases", ["company_id", "rig_id", "opened_at"]);
  await qi.addIndex("cases", ["company_id", "cause_code", "opened_at"]);
  await qi.addIndex("cases", ["opened_by", "opened_at"]);
  await qi.createTable(
    "case_events",
    {
      id: { type: DataTypes.CHAR(36), primaryKey: true },
      case_id: { type: DataTypes.CHAR(36), allowNull: false, references: { model: "cases", key: "id" }, onDelete: "CASCADE" },
      seq: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      step_id: { type: DataTypes.STRING(80), allowNull: false },
      answer: { type: DataTypes.ENUM("YES", "NO", "DONE", "CANT", "ACK", "BACK"), allowNull: false },
      at: { type: DataTypes.DATE(3), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    table,
  );
  await qi.addIndex("case_events", ["case_id", "seq"], { unique: true, name: "case_events_case_seq" });
  await qi.createTable(
    "case_photos",
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      case_id: { type: DataTypes.CHAR(36), allowNull: false, references: { model: "cases", key: "id" }, onDelete: "CASCADE" },
      step_id: { type: DataTypes.STRING(80), allowNull: true },
      storage_key: { type: DataTypes.STRING(255), allowNull: false },
      content_type: { type: DataTypes.STRING(60), allowNull: false },
      bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      uploaded_by: ref("users", true, "SET NULL"),
      ...timestamps,
    },
    table,
  );
  await qi.addIndex("case_photos", ["case_id"]);
}

export async function down(qi: QueryInterface) {
  await qi.dropTable("case_photos");
  await qi.dropTable("case_events");
  await qi.dropTable("cases");
}
