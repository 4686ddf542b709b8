import { DataTypes, type QueryInterface } from "sequelize";

const count = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 };
const company = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: "companies", key: "id" }, onDelete: "CASCADE" };
const rig = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: "rigs", key: "id" }, onDelete: "CASCADE" };
// Day rows, and month rows that sum them: a year's window reads 12 months and the odd days at its edges.
const span = { type: DataTypes.ENUM("day", "month"), allowNull: false };
const period = { type: DataTypes.DATEONLY, allowNull: false };

/**
 * Rollups the fault board reads instead of every case: their size grows with rigs, people,
 * causes and days, not with the number of cases (docs/decisions/0004-board-scaling.md).
 * They are kept when a case opens or closes and rebuilt after bulk loads.
 */
export async function up(qi: QueryInterface) {
  // The first case of the repeat chain a case belongs to (same rig and cause, each within the default repeat window of the one before).
  await qi.addColumn("cases", "repeat_chain_at", { type: DataTypes.DATE(3), allowNull: true });
  // A closing case's neighbours in time on the same rig and cause, to mark its repeat chain.
  await qi.addIndex("cases", ["rig_id", "cause_code", "opened_at"], { name: "cases_repeat_chain" });
  // The newest open hand-offs without sorting all of them.
  await qi.addIndex("cases", ["company_id", "outcome", "handoff_resolved_at", "opened_at"], { name: "cases_open_handoffs_newest" });
  await qi.removeIndex("cases", "cases_open_handoffs");

  await qi.createTable("board_rig_days", {
    company_id: { ...company, primaryKey: true },
    day: { ...period, primaryKey: true },
    rig_id: { ...rig, primaryKey: true },
    cases: count,
    fixed: count,
    handoff: count,
    abandoned: count,
    closed: count,
    repair_seconds: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    min_hours: { type: DataTypes.DECIMAL(8, 1), allowNull: true },
    max_hours: { type: DataTypes.DECIMAL(8, 1), allowNull: true },
  });

  // Who met which guide and cause; 0 stands for a person since removed and '' for no cause, as key columns cannot be NULL.
  await qi.createTable("board_mix", {
    company_id: { ...company, primaryKey: true },
    span: { ...span, primaryKey: true },
    period: { ...period, primaryKey: true },
    rig_id: { ...rig, primaryKey: true },
    opened_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
    guide_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
    cause_code: { type: DataTypes.STRING(60), allowNull: false, primaryKey: true },
    cases: count,
    handoff: count,
    repair_seconds: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 },
  });

  await qi.createTable("board_chains", {
    company_id: { ...company, primaryKey: true },
    span: { ...span, primaryKey: true },
    period: { ...period, primaryKey: true },
    rig_id: { ...rig, primaryKey: true },
    cause_code: { type: DataTypes.STRING(60), allowNull: false, primaryKey: true },
    chain_at: { type: DataTypes.DATE(3), allowNull: false, primaryKey: true },
    cases: count,
    first_at: { type: DataTypes.DATE(3), allowNull: false },
    last_at: { type: DataTypes.DATE(3), allowNull: false },
    // The period's three latest cases, newest first: "id@time,…".
    latest: { type: DataTypes.STRING(255), allowNull: false },
  });

  // Cases that existed before this migration are rolled up by `npm run board:rebuild` (db:migrate says so):
  // a migration runs no live app code, which may have changed since it was written.
}

export async function down(qi: QueryInterface) {
  await qi.dropTable("board_chains");
  await qi.dropTable("board_mix");
  await qi.dropTable("board_rig_days");
  await qi.addIndex("cases", ["company_id", "outcome", "handoff_resolved_at"], { name: "cases_open_handoffs" });
  await qi.removeIndex("cases", "cases_open_handoffs_newest");
  await qi.removeIndex("cases", "cases_repeat_chain");
  await qi.removeColumn("cases", "repeat_chain_at");
}
