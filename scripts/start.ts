/**
 * `npm start` (built app) and `npm run dev` (dev server): everything a fresh machine needs.
 * Starts a private MariaDB under .data/ unless DATABASE_URL is set, migrates, seeds the demo
 * into an empty database, builds when stale, serves, and shuts all of it down on Ctrl-C.
 */
import { spawn } from "node:child_process";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { closeDb, db } from "../db/index";
import { migrateUp } from "../db/migrate";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../seeds/demo-people";
import { seedAll } from "../seeds/seed-all";
import { buildIfStale } from "./build-if-stale";
import { startLocalServices } from "./local-services";

const root = process.cwd();
const dev = process.argv.includes("--dev");
const host = process.env.HOST ?? "127.0.0.1";
const port = Number(process.env.PORT ?? 3000);
const dataDir = path.join(root, ".data");

function secretFile(name: string): string {
  const file = path.join(dataDir, name);
  if (!fs.existsSync(file)) fs.writeFileSync(file, randomBytes(32).toString("base64url"), { mode: 0o600 });
  return fs.readFileSync(file, "utf8").trim();
}

let services: Awaited<ReturnType<typeof startLocalServices>> | undefined;

async function main() {
  fs.mkdirSync(dataDir, { recursive: true });
  services = await startLocalServices({
    dataDir,
    database: "tankside",
    dbPort: Number(process.env.DB_PORT ?? 3406),
    smtpPort: Number(process.env.SMTP_PORT ?? 2525),
    s3Port: Number(process.env.S3_PORT ?? 4569),
    databaseUrl: process.env.DATABASE_URL,
  });
  const ownDatabase = services.ownDatabase;
  // Real providers configured in the environment win over the local fakes.
  for (const [key, value] of Object.entries(services.env)) process.env[key] ??= value;
  if (ownDatabase) console.log("MariaDB is up on 127.0.0.1 (data in .data/mariadb).");
  console.log("Local fake SMTP (mail kept in .data/outbox, shown at /admin/outbox) and fake S3 (.data/s3) are up.");
  const applied = await migrateUp(db());
  if (applied.length) console.log(`Applied migrations: ${applied.join(", ")}`);
  await seedAll({ history: true });
  await closeDb();
  if (!dev) buildIfStale(root);

  const env: NodeJS.ProcessEnv = {
    ...process.env,
    HOST: host,
    PORT: String(port),
    NODE_ENV: dev ? "development" : "production",
    APP_URL: process.env.APP_URL ?? `http://${host}:${port}`,
    SESSION_SECRET: process.env.SESSION_SECRET ?? secretFile("session-secret"),
    ...(ownDatabase ? { SHOW_DEMO_SIGNINS: process.env.SHOW_DEMO_SIGNINS ?? "1" } : {}),
  };
  const bin = (name: string) => path.join(root, "node_modules/.bin", name);
  const app = dev
    ? spawn(bin("react-router"), ["dev", "--host", host, "--port", String(port), "--strictPort"], { env, stdio: "inherit" })
    : spawn(process.execPath, [path.join(root, "server.js")], { env, stdio: "inherit" });

  console.log(`\nTankside: http://${host}:${port}`);
  if (ownDatabase) {
    console.log(`Demo sign-ins (password ${DEMO_PASSWORD}):`);
    for (const p of DEMO_PEOPLE) console.log(`  ${p.email.padEnd(28)} ${p.role}`);
  }
  console.log("Ctrl-C stops the app and the database.\n");

  let stopping = false;
  const stop = async (code: number) => {
    if (stopping) return;
    stopping = true;
    if (app.exitCode === null) {
      app.kill("SIGTERM");
      await new Promise((r) => app.once("exit", r));
    }
    await services?.stop();
    process.exit(code);
  };
  process.on("SIGINT", () => void stop(0));
  process.on("SIGTERM", () => void stop(0));
  app.on("exit", (code) => void stop(code ?? 0));
}

main().catch(async (error) => {
  console.error(error instanceof Error ? error.message : error);
  await services?.stop();
  process.exit(1);
});
