import { DataTypes, type QueryInterface } from "sequelize";

const table = { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" };
const userRef = { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" };

export async function up(qi: QueryInterface) {
  await qi.createTable(
    "guides",
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      // NULL: a built-in guide every company sees. `scope` makes (scope, slug) unique, since NULLs never collide.
      company_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "companies", key: "id" }, onDelete: "CASCADE" },
      scope: { type: DataTypes.STRING(20), allowNull: false },
      slug: { type: DataTypes.STRING(80), allowNull: false },
      title: { type: DataTypes.STRING(120), allowNull: false },
      published_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      based_on_guide_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "guides", key: "id" }, onDelete: "SET NULL" },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    table,
  );
  await qi.addIndex("guides", ["scope", "slug"], { unique: true, name: "guides_scope_slug" });
  await qi.addIndex("guides", ["company_id"]);
  await qi.createTable(
    "guide_versions",
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      guide_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: "guides", key: "id" }, onDelete: "CASCADE" },
      number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      status: { type: DataTypes.ENUM("draft", "in_review", "published", "retired"), allowNull: false },
      definition: { type: DataTypes.JSON, allowNull: false },
      source_hash: { type: DataTypes.CHAR(64), allowNull: false },
      author_id: userRef,
      reviewer_id: userRef,
      change_note: { type: DataTypes.TEXT, allowNull: true },
      review_comment: { type: DataTypes.TEXT, allowNull: true },
      published_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    table,
  );
  await qi.addIndex("guide_versions", ["guide_id", "number"], { unique: true, name: "guide_versions_guide_number" });
  await qi.addIndex("guide_versions", ["guide_id", "status"]);
}

export async function down(qi: QueryInterface) {
  await qi.dropTable("guide_versions");
  await qi.dropTable("guides");
}
