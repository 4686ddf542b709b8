/**
 * `npm run bench`: the fault board's query time with 1,000 and with 100,000 cases.
 * Runs on its own MariaDB under .data/bench (never the dev or test data) and prints the
 * median of repeated runs for each size and their ratio. Goal: 100k within 3× of 1k.
 *
 *   own growth:    one company whose own history grows from 1,000 to 100,000 cases a year;
 *   tenant growth: the same company keeps 1,000 cases while other companies add 99,000.
 */
import { randomUUID } from "node:crypto";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { QueryTypes, type CreationAttributes } from "sequelize";
import { Case, closeDb, Company, db, GuideRecord, GuideVersion, Job, JobDay, Rig, User } from "../db/index";
import { startLocalMariadb } from "../db/local-mariadb";
import { migrateUp } from "../db/migrate";
import { changeCase, rebuildBoardRollups } from "../app/services/board-rollups.server";
import { loadLibrary } from "../app/lib/guides/files.server";
import { importBuiltinGuides } from "../seeds/import-guides";
import { seededRandom } from "../seeds/random";

const server = await startLocalMariadb({
  dir: path.resolve(".data/bench"),
  port: Number(process.env.BENCH_DB_PORT ?? 3427),
  database: "tankside_bench",
  log: () => {},
});
process.env.DATABASE_URL = server.url;
const { boardAggregates, jobBoardRows } = await import("../app/services/board.server");
const { buildBoard } = await import("../app/lib/stats/board");

const sequelize = db();
const random = seededRandom(7);
const YEAR = 365 * 86_400_000;
const now = Date.UTC(2026, 10, 30);
const CAUSES = [
  "suction-air-leak",
  "plug-sump",
  "plug-nozzle",
  "low-engine-speed",
  "foam-over-agitation",
  "leak-pressure-clamp",
  "hose-too-long",
  "bent-paddle",
  null,
];

async function reset() {
  await sequelize.query("SET FOREIGN_KEY_CHECKS = 0");
  // Every table, whatever later migrations add: the bench always starts from an empty schema.
  const tables = (await sequelize.query<Record<string, string>>("SHOW TABLES", { type: QueryTypes.SELECT })).map((r) => Object.values(r)[0]);
  for (const t of tables) await sequelize.query(`DROP TABLE IF EXISTS \`${t}\``);
  await sequelize.query("SET FOREIGN_KEY_CHECKS = 1");
  await migrateUp(sequelize);
  await importBuiltinGuides(loadLibrary());
}

async function company(slug: string) {
  const c = await Company.create({ name: slug, slug });
  const user = await User.create({
    companyId: c.id,
    email: `${slug}@bench.example`,
    name: slug,
    passwordHash: "x",
    role: "crew",
  });
  const rigs = [];
  for (let i = 1; i <= 5; i++) {
    rigs.push(
      await Rig.create({
        companyId: c.id,
        code: `R-${i}`,
        name: `Rig ${i}`,
        mount: "truck",
        tankGal: 1000,
        pumpKind: "c",
        hoseLengthFt: 200,
        hoseDiameterIn: 1.5,
        nozzleTips: [],
        notes: null,
      }),
    );
  }
  // Twenty jobs a year, each rig on one of them every working day: the board's job table reads these.
  const jobs = await Job.bulkCreate(
    Array.from({ length: 20 }, (_, i) => ({
      companyId: c.id,
      name: `Job ${i + 1}`,
      customer: "bench",
      address: null,
      latitude: null,
      longitude: null,
      elevationFt: 1000 + 100 * i,
      areaAcres: 10,
      passes: 1,
      waterGalPerAcre: null,
      materials: [{ name: "Fiber", lbPerAcre: 1500, kind: "fiber" as const, bagLb: 50 }],
      startsOn: "2025-01-01",
      endsOn: null,
      notes: null,
    })),
  );
  const days: CreationAttributes<JobDay>[] = [];
  for (let t = now - YEAR; t < now; t += 86_400_000)
    for (const rigId of rigs.map((r) => r.id))
      days.push({
        companyId: c.id,
        jobId: jobs[Math.floor(((t - now + YEAR) / YEAR) * 20)].id,
        day: new Date(t).toISOString().slice(0, 10),
        rigId,
        userId: null,
      });
  await JobDay.bulkCreate(days);
  return { id: c.id, userId: user.id, rigIds: rigs.map((r) => r.id), jobIds: jobs.map((j) => j.id) };
}

async function addCases(c: { id: number; userId: number; rigIds: number[]; jobIds: number[] }, count: number, versionId: number) {
  for (let done = 0; done < count; done += 5000) {
    const batch: CreationAttributes<Case>[] = [];
    for (let i = 0; i < Math.min(5000, count - done); i++) {
      const openedAt = new Date(now - random.next() * YEAR);
      const outcome = random.weighted([
        ["fixed", 8],
        ["handoff", 1.5],
        ["abandoned", 0.5],
      ] as const);
      const cause = outcome === "fixed" ? random.pick(CAUSES) : null;
      batch.push({
        id: randomUUID(),
        companyId: c.id,
        rigId: random.pick(c.rigIds),
        jobId: c.jobIds[Math.min(19, Math.floor(((openedAt.getTime() - now + YEAR) / YEAR) * 20))],
        guideVersionId: versionId,
        openedBy: c.userId,
        openedAt,
        closedAt: new Date(openedAt.getTime() + random.int(5, 90) * 60_000),
        engineHours: Math.round((openedAt.getTime() - now + YEAR) / 3_600_000) / 4,
        outcome,
        finalStep: null,
        causeCode: cause,
        safetyAckAt: null,
        note: null,
      });
    }
    await Case.bulkCreate(batch);
  }
}

async function timeBoard(companyId: number, runs = 15): Promise<number> {
  const window = { from: new Date(now - YEAR), to: new Date(now + 86_400_000) };
  // The board page reads the board and its job table together.
  const board = () => Promise.all([boardAggregates(companyId, window).then(buildBoard), jobBoardRows(companyId, window)]);
  for (let i = 0; i < 3; i++) await board();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    await board();
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(runs / 2)];
}

/** What a close adds: the rollup upkeep for one case (its day, its month, its repeat chain), median of 25. */
async function timeUpkeep(companyId: number): Promise<number> {
  const picks = await Case.findAll({ where: { companyId }, order: sequelize.random(), limit: 25, attributes: ["id", "rigId", "causeCode", "openedAt"] });
  const times: number[] = [];
  for (const c of picks) {
    const t = performance.now();
    // The same lock and recomputation as a close, around an unchanged case.
    await changeCase(sequelize, companyId, async () => ({ id: c.id, companyId, rigId: c.rigId, causeCode: c.causeCode, openedAt: c.openedAt }));
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

const version = async () => (await GuideVersion.findOne({ include: [{ model: GuideRecord, as: "guide", where: { slug: "lost-prime" } }] }))!.id;
const results: [string, number][] = [];
const rebuilds: [string, number][] = [];
/** Bulk inserts skip the rollups' upkeep, as a seed or import does; the rebuild is timed too. */
async function rebuild(label: string, companyId?: number) {
  await sequelize.query("ANALYZE TABLE cases");
  const t = performance.now();
  await rebuildBoardRollups(sequelize, companyId);
  rebuilds.push([label, performance.now() - t]);
  await sequelize.query("ANALYZE TABLE board_rig_days, board_mix, board_chains, board_job_mix");
}
try {
  await reset();
  const a = await company("bench-own");
  await addCases(a, 1000, await version());
  await rebuild("1,000 cases", a.id);
  results.push(["1,000 cases (one company)", await timeBoard(a.id)]);
  await addCases(a, 99_000, await version());
  await rebuild("100,000 cases of one company", a.id);
  results.push(["100,000 cases (the same company's own)", await timeBoard(a.id)]);
  const upkeep = await timeUpkeep(a.id);

  await reset();
  const b = await company("bench-tenant");
  await addCases(b, 1000, await version());
  for (let k = 0; k < 99; k++) await addCases(await company(`other-${k}`), 1000, await version());
  await rebuild("100,000 cases of 100 companies");
  results.push(["100,000 cases (1,000 ours, 99,000 other companies')", await timeBoard(b.id)]);

  const base = results[0][1];
  console.log("\nFault board with its job table: median query + compute time over 15 runs (last 365 days, all rigs)\n");
  for (const [label, ms] of results) console.log(`  ${label.padEnd(54)} ${ms.toFixed(1).padStart(8)} ms   ${(ms / base).toFixed(2)}× the 1k board`);
  console.log("\nGoal: 100k within 3× of 1k.");
  console.log("\nRebuilding the board's rollups from the cases (after a bulk load; cases opened and closed in the app keep them as they go)\n");
  for (const [label, ms] of rebuilds) console.log(`  ${label.padEnd(54)} ${ms.toFixed(0).padStart(8)} ms`);
  console.log(`\nUpkeep when one case opens or closes, with 100,000 of the company's cases (median of 25): ${upkeep.toFixed(1)} ms`);
} finally {
  await closeDb();
  await server.stop();
}
