/**
 * Once per `npm test`: a private MariaDB, fake SMTP and fake S3 for the tests (own data dir
 * and ports, never the dev ones); Chromium and poppler's pdfinfo from Debian when missing (the
 * browser tests drive Chromium and count the pages of what it prints).
 */
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { startLocalServices, type LocalServices } from "../scripts/local-services";

let services: LocalServices | undefined;

const DEBIAN_NEEDS = { "/usr/bin/chromium": "chromium", "/usr/bin/pdfinfo": "poppler-utils" };

function ensureDebianPackages() {
  const missing = Object.entries(DEBIAN_NEEDS)
    .filter(([file]) => !fs.existsSync(file))
    .map(([, pkg]) => pkg);
  if (!missing.length) return;
  if (process.getuid?.() !== 0) throw new Error(`Missing Debian packages: sudo apt-get install -y ${missing.join(" ")}`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  execFileSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  execFileSync("apt-get", ["install", "-y", "-qq", ...missing], { stdio: "inherit", env });
}

export async function setup(project: TestProject) {
  const root = path.resolve(import.meta.dirname, "..");
  ensureDebianPackages();
  const base = Number(process.env.TEST_DB_PORT ?? 3417);
  // A second run on another port (TEST_DB_PORT) gets its own data dir: two servers on one dir would corrupt it.
  const dataDir = path.join(root, process.env.TEST_DB_PORT ? `.data/test-${base}` : ".data/test");
  fs.rmSync(path.join(dataDir, "outbox"), { recursive: true, force: true });
  services = await startLocalServices({ dataDir, database: "tankside_test", dbPort: base, smtpPort: base + 1, s3Port: base + 2, log: () => {} });
  project.provide("serviceEnv", services.env);
  project.provide("dbSocket", services.dbSocket ?? "");
}

export async function teardown() {
  await services?.stop();
}

declare module "vitest" {
  export interface ProvidedContext {
    serviceEnv: Record<string, string>;
    /** The test database's root socket (the replica test copies the database through it). */
    dbSocket: string;
  }
}
