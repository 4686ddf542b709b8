import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import mariadb from "mariadb";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { startLocalMariadb, type LocalMariadb } from "../../db/local-mariadb";
import { freePort } from "../../scripts/free-port";
import { LOW_WATER_WALK, walkThroughApi } from "../helpers/cases";
import { resetDatabase } from "../helpers/db";
import { requestAs, run } from "../helpers/requests";

// A second private MariaDB from Debian's server, following the test database as a read replica
// (binary log with GTIDs), with the app told about it through DATABASE_REPLICA_URLS: reports
// read from the replica, and what a person has just written reads from the primary.
const root = path.resolve(import.meta.dirname, "../..");
const DATABASE = "tankside_test";
const REPLICATION_PASSWORD = "replica-test-only";
let replica: LocalMariadb;
let primarySocket: string;

const sql = async <T>(socketPath: string, query: string, values: unknown[] = []): Promise<T> => {
  const conn = await mariadb.createConnection({ socketPath, user: "root" });
  try {
    return (await conn.query(query, values)) as T;
  } finally {
    await conn.end();
  }
};

/** Waits until the replica has applied everything the primary has logged so far. */
async function caughtUp() {
  const [{ pos }] = await sql<{ pos: string }[]>(primarySocket, "SELECT @@GLOBAL.gtid_binlog_pos AS pos");
  const [{ done }] = await sql<{ done: number }[]>(replica.socketPath, "SELECT MASTER_GTID_WAIT(?, 30) AS done", [pos]);
  expect(Number(done)).toBe(0);
}

beforeAll(async () => {
  await resetDatabase();
  primarySocket = inject("dbSocket");
  const primaryPort = new URL(process.env.DATABASE_URL!).port;
  const dir = path.join(root, `.data/test-replica-${primaryPort}`);
  fs.rmSync(dir, { recursive: true, force: true });
  replica = await startLocalMariadb({ dir, port: await freePort(), database: DATABASE, serverId: 2, log: () => {} });

  await sql(primarySocket, "CREATE USER IF NOT EXISTS 'replication'@'127.0.0.1' IDENTIFIED BY ?", [REPLICATION_PASSWORD]);
  await sql(primarySocket, "GRANT REPLICATION SLAVE ON *.* TO 'replication'@'127.0.0.1'");
  // The usual way to add a replica: a consistent dump that records its GTID position, then follow from there.
  const dump = execFileSync(
    "mariadb-dump",
    ["--no-defaults", `--socket=${primarySocket}`, "-uroot", "--single-transaction", "--gtid", "--master-data=1", "--databases", DATABASE],
    { maxBuffer: 512 * 1024 * 1024 },
  );
  execFileSync("mariadb", ["--no-defaults", `--socket=${replica.socketPath}`, "-uroot"], { input: dump });
  await sql(
    replica.socketPath,
    `CHANGE MASTER TO MASTER_HOST='127.0.0.1', MASTER_PORT=${Number(primaryPort)}, MASTER_USER='replication', MASTER_PASSWORD=?, MASTER_USE_GTID=slave_pos`,
    [REPLICATION_PASSWORD],
  );
  await sql(replica.socketPath, "START SLAVE");
  await caughtUp();
  process.env.DATABASE_REPLICA_URLS = replica.url;
}, 120_000);

afterAll(async () => {
  delete process.env.DATABASE_REPLICA_URLS;
  const { closeDb } = await import("../../db/index");
  await closeDb();
  await replica?.stop();
});

describe("reports from a read replica", () => {
  it("serves the board and the cases table from the replica, the case just started from the primary, and shows the case on the replica once it arrives", async () => {
    const { loader: boardApi } = await import("~/routes/api.board");
    const { loader: casesPage } = await import("~/routes/cases");
    const { loader: casePage } = await import("~/routes/cases.$id");
    const { RouterContextProvider } = await import("react-router");
    const args = (request: Request, params: Record<string, string> = {}) => ({ request, params, context: new RouterContextProvider() }) as never;
    const MO = "mo@cedarflats.example";
    const DANA = "dana@cedarflats.example";
    const board = async () => (await run(async () => boardApi(args(await requestAs(MO, "/api/board"))))).data as { fleet: { cases: number } };
    const cases = async () => (await run(async () => casesPage(args(await requestAs(MO, "/cases"))))).data as { total: number };

    const boardBefore = (await board()).fleet.cases;
    const casesBefore = (await cases()).total;

    // The replica stops applying: anything read from it now is as it was.
    await sql(replica.socketPath, "STOP SLAVE");
    const id = await walkThroughApi(DANA, LOW_WATER_WALK);

    // What was just written reads from the primary…
    const page = await run(async () => casePage(args(await requestAs(MO, `/cases/${id}`), { id })));
    expect(page.status).toBe(200);
    expect(page.data.outcome).toBe("fixed");
    // …while the reports come from the replica, which has not seen it yet.
    expect((await board()).fleet.cases).toBe(boardBefore);
    expect((await cases()).total).toBe(casesBefore);
    expect(await sql<unknown[]>(replica.socketPath, `SELECT id FROM ${DATABASE}.cases WHERE id = ?`, [id])).toHaveLength(0);

    await sql(replica.socketPath, "START SLAVE");
    await caughtUp();
    expect(await sql<unknown[]>(replica.socketPath, `SELECT id FROM ${DATABASE}.cases WHERE id = ?`, [id])).toHaveLength(1);
    expect((await board()).fleet.cases).toBe(boardBefore + 1);
    expect((await cases()).total).toBe(casesBefore + 1);
  });
});
