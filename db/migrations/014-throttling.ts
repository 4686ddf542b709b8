import { DataTypes, type QueryInterface } from "sequelize";

/**
 * Sign-in and password-link throttling by client and by address+client (rate-limiter-flexible keeps
 * its counters here, in the shape it expects). The per-account lock goes: anyone could use it to
 * lock a supervisor out before a job.
 */
export async function up(qi: QueryInterface) {
  await qi.sequelize.query(
    "CREATE TABLE rate_limits (`key` VARCHAR(255) CHARACTER SET utf8mb4 NOT NULL, points INT(9) NOT NULL DEFAULT 0, expire BIGINT UNSIGNED, PRIMARY KEY (`key`)) ENGINE = INNODB",
  );
  await qi.removeColumn("users", "failed_logins");
  await qi.removeColumn("users", "first_failed_at");
  await qi.removeColumn("users", "locked_until");
}

export async function down(qi: QueryInterface) {
  await qi.addColumn("users", "failed_logins", { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
  await qi.addColumn("users", "first_failed_at", { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn("users", "locked_until", { type: DataTypes.DATE, allowNull: true });
  await qi.dropTable("rate_limits");
}
