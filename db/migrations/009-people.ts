import { DataTypes, type QueryInterface } from "sequelize";

// The roles as they were when this migration landed: a migration never follows today's constants.
const ROLES = ["crew", "trainer", "supervisor", "admin"] as const;

/** Admins invite people by e-mail and can turn a person's sign-in off (kept, so their cases keep a name). */
export async function up(qi: QueryInterface) {
  await qi.addColumn("users", "access_removed_at", { type: DataTypes.DATE, allowNull: true });
  await qi.createTable("invites", {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    company_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: "companies", key: "id" }, onDelete: "CASCADE" },
    email: { type: DataTypes.STRING(254), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
    // Only a hash of the link's token is kept: a copy of the database cannot be used to join.
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    invited_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("invites", ["company_id", "email"], { name: "invites_company_email" });
}

export async function down(qi: QueryInterface) {
  await qi.dropTable("invites");
  await qi.removeColumn("users", "access_removed_at");
}
