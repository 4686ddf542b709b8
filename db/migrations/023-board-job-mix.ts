import { DataTypes, type QueryInterface } from "sequelize";

/**
 * The board's job table reads a rollup like the rest of the board (decision 0004): per day and per
 * month (a year's window reads 12 month rows and the days at its edges), job, rig and cause, the
 * fixes, hand-offs and repair time. Kept with the other rollups as cases open and
 * close; `npm run board:rebuild` fills it for cases made before this migration.
 */
export async function up(qi: QueryInterface) {
  const key = (model: string) => ({
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: false,
    primaryKey: true,
    references: { model, key: "id" },
    onDelete: "CASCADE",
  });
  const count = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 };
  await qi.createTable("board_job_mix", {
    company_id: key("companies"),
    span: { type: DataTypes.ENUM("day", "month"), allowNull: false, primaryKey: true },
    period: { type: DataTypes.DATEONLY, allowNull: false, primaryKey: true },
    job_id: key("jobs"),
    rig_id: key("rigs"),
    // '' for no cause, as key columns cannot be NULL.
    cause_code: { type: DataTypes.STRING(60), allowNull: false, primaryKey: true },
    cases: count,
    handoff: count,
    repair_seconds: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 },
  });
  // Open hand-offs per job, counted from the index alone (a company that never marks them dealt with has thousands).
  await qi.addIndex("cases", ["company_id", "outcome", "handoff_resolved_at", "job_id", "kind", "opened_at"], { name: "cases_open_handoffs_by_job" });
}

export async function down(qi: QueryInterface) {
  await qi.removeIndex("cases", "cases_open_handoffs_by_job");
  await qi.dropTable("board_job_mix");
}
