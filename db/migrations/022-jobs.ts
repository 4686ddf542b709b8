import { DataTypes, type QueryInterface } from "sequelize";

/**
 * Jobs: a site and its spec (materials per acre, area, passes), its dates, and which rigs and
 * people are on it each day (`job_days`: one job per rig per day, one per person per day, so
 * "today's job" has one answer). Loads sprayed on a job (`job_loads`, the phone's own id, so a
 * resend is stored once) give its progress; a case records the job its rig was on that day.
 */
export async function up(qi: QueryInterface) {
  const ref = (model: string, onDelete = "CASCADE") => ({ type: DataTypes.INTEGER.UNSIGNED, references: { model, key: "id" }, onDelete });
  await qi.createTable("jobs", {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    company_id: { ...ref("companies"), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    customer: { type: DataTypes.STRING(120), allowNull: false },
    address: { type: DataTypes.STRING(300), allowNull: true },
    latitude: { type: DataTypes.DECIMAL(9, 6), allowNull: true },
    longitude: { type: DataTypes.DECIMAL(9, 6), allowNull: true },
    elevation_ft: { type: DataTypes.INTEGER, allowNull: true },
    area_acres: { type: DataTypes.DECIMAL(8, 2), allowNull: false },
    passes: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 1 },
    water_gal_per_acre: { type: DataTypes.DECIMAL(7, 1), allowNull: true },
    materials: { type: DataTypes.JSON, allowNull: false },
    starts_on: { type: DataTypes.DATEONLY, allowNull: false },
    ends_on: { type: DataTypes.DATEONLY, allowNull: true },
    closed_at: { type: DataTypes.DATE(3), allowNull: true },
    notes: { type: DataTypes.STRING(1000), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("jobs", ["company_id", "closed_at", "starts_on"], { name: "jobs_company_open" });
  await qi.createTable("job_days", {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    company_id: { ...ref("companies"), allowNull: false },
    job_id: { ...ref("jobs"), allowNull: false },
    day: { type: DataTypes.DATEONLY, allowNull: false },
    rig_id: { ...ref("rigs"), allowNull: true },
    user_id: { ...ref("users"), allowNull: true },
  });
  await qi.addIndex("job_days", ["company_id", "day", "rig_id"], { name: "job_days_rig", unique: true });
  await qi.addIndex("job_days", ["company_id", "day", "user_id"], { name: "job_days_person", unique: true });
  await qi.addIndex("job_days", ["job_id", "day"], { name: "job_days_job" });
  await qi.createTable("job_loads", {
    id: { type: DataTypes.CHAR(36), primaryKey: true },
    company_id: { ...ref("companies"), allowNull: false },
    job_id: { ...ref("jobs"), allowNull: false },
    rig_id: { ...ref("rigs", "SET NULL"), allowNull: true },
    sprayed_by: { ...ref("users", "SET NULL"), allowNull: true },
    sprayed_at: { type: DataTypes.DATE(3), allowNull: false },
    area_sq_ft: { type: DataTypes.DECIMAL(12, 1), allowNull: false },
    water_gal: { type: DataTypes.DECIMAL(8, 1), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("job_loads", ["job_id", "sprayed_at"], { name: "job_loads_job" });
  await qi.addColumn("cases", "job_id", { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "jobs", key: "id" }, onDelete: "SET NULL" });
  await qi.addIndex("cases", ["company_id", "job_id", "kind", "opened_at"], { name: "cases_company_job" });
}

export async function down(qi: QueryInterface) {
  await qi.removeIndex("cases", "cases_company_job");
  await qi.removeColumn("cases", "job_id");
  await qi.dropTable("job_loads");
  await qi.dropTable("job_days");
  await qi.dropTable("jobs");
}
