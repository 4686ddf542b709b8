import { DataTypes, type QueryInterface } from "sequelize";

/**
 * Sessions the server can end: the cookie carries a random id, the table keeps only its SHA-256
 * (a copy of the table signs no one in), with when it was made, last used and must end, and the
 * device it was made on. Signing out, a new password or a sign-in turned off delete rows; the
 * session epoch that did this job for signed cookies goes.
 */
export async function up(qi: QueryInterface) {
  await qi.createTable("sessions", {
    id_hash: { type: DataTypes.CHAR(64), primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    user_agent: { type: DataTypes.STRING(200), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    last_seen_at: { type: DataTypes.DATE(3), allowNull: false },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex("sessions", ["user_id"], { name: "sessions_user" });
  await qi.removeColumn("users", "session_epoch");
}

export async function down(qi: QueryInterface) {
  await qi.addColumn("users", "session_epoch", { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
  await qi.dropTable("sessions");
}
