import { DataTypes, type QueryInterface } from "sequelize";

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const companyRef = {
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: "companies", key: "id" },
  onDelete: "CASCADE",
};
const table = { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" };

export async function up(qi: QueryInterface) {
  await qi.createTable(
    "companies",
    {
      id,
      name: { type: DataTypes.STRING(120), allowNull: false },
      slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
      ...timestamps,
    },
    table,
  );
  await qi.createTable(
    "users",
    {
      id,
      company_id: companyRef,
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      password_hash: { type: DataTypes.STRING(100), allowNull: false },
      role: { type: DataTypes.ENUM("crew", "trainer", "supervisor", "admin"), allowNull: false },
      failed_logins: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      first_failed_at: { type: DataTypes.DATE, allowNull: true },
      locked_until: { type: DataTypes.DATE, allowNull: true },
      ...timestamps,
    },
    table,
  );
  await qi.addIndex("users", ["company_id", "role"]);
  await qi.createTable(
    "rigs",
    {
      id,
      company_id: companyRef,
      code: { type: DataTypes.STRING(16), allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      mount: { type: DataTypes.ENUM("truck", "trailer"), allowNull: false },
      tank_gal: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      pump_kind: { type: DataTypes.STRING(120), allowNull: false },
      has_hour_meter: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      engine_hours: { type: DataTypes.DECIMAL(8, 1), allowNull: false, defaultValue: 0 },
      hose_length_ft: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      hose_diameter_in: { type: DataTypes.DECIMAL(4, 2), allowNull: false },
      yard_elevation_ft: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      nozzle_tips: { type: DataTypes.JSON, allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: true },
      retired: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      ...timestamps,
    },
    table,
  );
  await qi.addIndex("rigs", ["company_id", "code"], { unique: true, name: "rigs_company_code" });
}

export async function down(qi: QueryInterface) {
  await qi.dropTable("rigs");
  await qi.dropTable("users");
  await qi.dropTable("companies");
}
