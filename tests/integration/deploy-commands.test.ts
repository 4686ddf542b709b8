import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSequelize } from "../../db/connection";

const run = promisify(execFile);
// A database of its own on the test server, empty, as a deploy starts with.
const url = new URL(process.env.DATABASE_URL!);
const target = new URL(url);
target.pathname = "/tankside_test_deploy";
const admin = createSequelize(url.toString());

const npm = (script: string, ...extra: string[]) =>
  run("npm", ["run", "--silent", script, "--", ...extra], { env: { ...process.env, DATABASE_URL: target.toString() }, timeout: 120_000 });

beforeAll(async () => {
  await admin.query("DROP DATABASE IF EXISTS tankside_test_deploy");
  await admin.query("CREATE DATABASE tankside_test_deploy CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci");
});

afterAll(async () => {
  await admin.query("DROP DATABASE IF EXISTS tankside_test_deploy");
  await admin.close();
});

describe("the README's deploy commands on an empty database", () => {
  it("npm run db:migrate applies every migration once, then finds nothing pending", async () => {
    const first = await npm("db:migrate");
    expect(first.stdout).toMatch(/Applied migrations: 001-companies-users-rigs, .*012-/);
    const again = await npm("db:migrate");
    expect(again.stdout).toMatch(/No migrations pending/);
    const [rows] = await admin.query("SELECT COUNT(*) AS n FROM tankside_test_deploy.schema_migrations");
    expect(Number((rows as { n: number }[])[0].n)).toBeGreaterThanOrEqual(12);
  });

  it("npm run seed puts the demo and the guide library in, and a second run adds nothing", async () => {
    await npm("seed");
    const count = async (table: string) => {
      const [rows] = await admin.query(`SELECT COUNT(*) AS n FROM tankside_test_deploy.${table}`);
      return Number((rows as { n: number }[])[0].n);
    };
    const before = { companies: await count("companies"), users: await count("users"), guides: await count("guides") };
    expect(before.companies).toBe(2);
    expect(before.users).toBeGreaterThan(0);
    expect(before.guides).toBeGreaterThanOrEqual(8);
    await npm("seed");
    expect({ companies: await count("companies"), users: await count("users"), guides: await count("guides") }).toEqual(before);
  });

  it("says what is missing when DATABASE_URL is not set", async () => {
    const failed = await run("npm", ["run", "--silent", "db:migrate"], { env: { ...process.env, DATABASE_URL: "" } }).catch(
      (e: { code: number; stderr: string }) => e,
    );
    expect((failed as { code: number }).code).not.toBe(0);
    expect((failed as { stderr: string }).stderr).toMatch(/DATABASE_URL/);
  });

  it("npm run digest refuses to run against a real database with no mail server set", async () => {
    const failed = await run("npm", ["run", "--silent", "digest"], { env: { ...process.env, DATABASE_URL: target.toString(), SMTP_URL: "" } }).catch(
      (e: { code: number; stderr: string }) => e,
    );
    expect((failed as { code: number }).code).toBe(2);
    expect((failed as { stderr: string }).stderr).toMatch(/SMTP_URL is not/);
  });
});
