/**
 * Once per `npm test`: a private MariaDB for the tests (own data dir and port, never the
 * dev database), migrated; Chromium from Debian when missing (for the browser tests).
 */
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { startLocalMariadb, type LocalMariadb } from "../db/local-mariadb";

let server: LocalMariadb | undefined;

function ensureChromium() {
  if (fs.existsSync("/usr/bin/chromium")) return;
  if (process.getuid?.() !== 0) throw new Error("Chromium is missing: sudo apt-get install -y chromium");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  execFileSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  execFileSync("apt-get", ["install", "-y", "-qq", "chromium"], { stdio: "inherit", env });
}

export async function setup(project: TestProject) {
  const root = path.resolve(import.meta.dirname, "..");
  ensureChromium();
  server = await startLocalMariadb({
    dir: path.join(root, ".data/test-mariadb"),
    port: Number(process.env.TEST_DB_PORT ?? 3417),
    database: "tankside_test",
    log: () => {},
  });
  project.provide("databaseUrl", server.url);
}

export async function teardown() {
  await server?.stop();
}

declare module "vitest" {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}
