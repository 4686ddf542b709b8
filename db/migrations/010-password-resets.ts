import { DataTypes, type QueryInterface } from "sequelize";

/** A "forgot your password" link: single use, short-lived, only its token's hash kept. */
export async function up(qi: QueryInterface) {
  await qi.createTable("password_resets", {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("password_resets", ["user_id", "created_at"], { name: "password_resets_user_recent" });
}

export async function down(qi: QueryInterface) {
  await qi.dropTable("password_resets");
}
