import { Op, QueryTypes, UniqueConstraintError, type Transaction } from "sequelize";
import { formatDay, isoInZone } from "~/lib/format";
import { jobProgress, NO_TOTALS, type JobProgress, type JobTotals } from "~/lib/jobs/progress";
import { planDays, type JobInput, type JobLoadInput, type JobPlanInput } from "~/lib/jobs/schema";
import { type JobSummary, type PlanDay } from "~/lib/jobs/today";
import { Job, JobDay, JobLoad, Rig, sequelize, User } from "./db.server";
import { fail, notFound, type SessionUser } from "./guards.server";
import { reportsChanged } from "./report-cache.server";
import { ownedBy } from "./tenancy.server";
import { can } from "~/lib/permissions";

type Tenant = Pick<SessionUser, "companyId">;
const n = (v: unknown) => (v === null || v === undefined ? 0 : Number(v));

/** Today in the company's calendar, and a day some days from it (YYYY-MM-DD). */
export const todayIn = (timeZone: string, now = new Date()) => isoInZone(now, timeZone).slice(0, 10);
const addDays = (day: string, days: number) => new Date(Date.parse(`${day}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

async function jobRecord(user: Tenant, id: number) {
  const job = Number.isSafeInteger(id) ? await Job.findOne({ where: ownedBy(user, { id }) }) : null;
  if (!job) notFound(`Job ${id}`);
  return job;
}

/** What each job has so far: loads and area from load cards, faults, downtime, open hand-offs and cards from its cases. */
export async function jobTotals(user: Tenant, ids: number[]): Promise<Map<number, JobTotals>> {
  const totals = new Map(ids.map((id) => [id, { ...NO_TOTALS }]));
  if (!ids.length) return totals;
  const replacements = { company: user.companyId, ids };
  const [loads, cases] = await Promise.all([
    sequelize.query<Record<string, unknown>>(
      `SELECT job_id, COUNT(*) AS loads, SUM(area_sq_ft) AS area, SUM(water_gal) AS water
       FROM job_loads WHERE company_id = :company AND job_id IN (:ids) GROUP BY job_id`,
      { replacements, type: QueryTypes.SELECT },
    ),
    sequelize.query<Record<string, unknown>>(
      `SELECT job_id, SUM(kind = 'fix') AS fixes,
         SUM(CASE WHEN kind = 'fix' AND closed_at IS NOT NULL THEN TIMESTAMPDIFF(SECOND, opened_at, closed_at) ELSE 0 END) AS downtime,
         SUM(outcome = 'handoff' AND handoff_resolved_at IS NULL) AS open_handoffs, SUM(kind = 'card') AS cards
       FROM cases WHERE company_id = :company AND job_id IN (:ids) GROUP BY job_id`,
      { replacements, type: QueryTypes.SELECT },
    ),
  ]);
  for (const r of loads) Object.assign(totals.get(n(r.job_id))!, { loads: n(r.loads), areaSqFt: n(r.area), waterGal: n(r.water) });
  for (const r of cases)
    Object.assign(totals.get(n(r.job_id))!, { fixes: n(r.fixes), downtimeSeconds: n(r.downtime), openHandoffs: n(r.open_handoffs), cards: n(r.cards) });
  return totals;
}

export type JobRow = ReturnType<typeof plainJob> & { progress: JobProgress };

const plainJob = (job: Job) => {
  const j = job.get({ plain: true });
  return { ...j, closedAt: j.closedAt ? j.closedAt.toISOString() : null, createdAt: undefined, updatedAt: undefined };
};

/** The company's jobs matching `where`, newest start first, with what each has so far. */
async function jobsWithTotals(user: SessionUser, where: object) {
  const jobs = await Job.findAll({
    where: ownedBy(user, where),
    order: [
      ["startsOn", "DESC"],
      ["id", "DESC"],
    ],
  });
  const totals = await jobTotals(
    user,
    jobs.map((j) => j.id),
  );
  return jobs.map((job) => ({ job, totals: totals.get(job.id)! }));
}

/** The company's jobs (open, closed or all), newest start first, each with its progress. */
export async function listJobs(user: SessionUser, { show = "open" }: { show?: "open" | "closed" | "all" } = {}): Promise<JobRow[]> {
  const where = show === "open" ? { closedAt: null } : show === "closed" ? { closedAt: { [Op.ne]: null } } : {};
  return (await jobsWithTotals(user, where)).map(({ job, totals }) => ({ ...plainJob(job), progress: jobProgress(job, totals) }));
}

/** One job with its progress and its plan around today; another company's id answers 404. */
export async function jobDetail(user: SessionUser, id: number) {
  const job = await jobRecord(user, id);
  const totals = (await jobTotals(user, [job.id])).get(job.id)!;
  const days = await planOf(user, { jobIds: [job.id] });
  return { job: plainJob(job), progress: jobProgress(job, totals), days };
}

/** The job's fields as its form edits them. */
export async function jobInput(user: SessionUser, id: number): Promise<JobInput> {
  const j = await jobRecord(user, id);
  return {
    name: j.name,
    customer: j.customer,
    address: j.address ?? undefined,
    latitude: j.latitude,
    longitude: j.longitude,
    elevationFt: j.elevationFt,
    areaAcres: j.areaAcres,
    passes: j.passes,
    waterGalPerAcre: j.waterGalPerAcre,
    materials: j.materials,
    startsOn: j.startsOn,
    endsOn: j.endsOn ?? undefined,
    notes: j.notes ?? undefined,
  };
}

const columns = (input: JobInput) => ({ ...input, address: input.address || null, endsOn: input.endsOn ?? null, notes: input.notes || null });

export async function createJob(user: SessionUser, input: JobInput): Promise<number> {
  const job = await Job.create({ ...columns(input), companyId: user.companyId });
  await reportsChanged(user.companyId);
  return job.id;
}

export async function updateJob(user: SessionUser, id: number, input: JobInput): Promise<void> {
  const job = await jobRecord(user, id);
  await job.update(columns(input));
  await reportsChanged(user.companyId);
}

/**
 * Closes a job (it leaves today's plans and the load card's list, and its days after today are
 * released for other jobs) or opens it again.
 */
export async function setJobClosed(user: SessionUser, id: number, closed: boolean): Promise<void> {
  const job = await jobRecord(user, id);
  await sequelize.transaction(async (transaction) => {
    await job.update({ closedAt: closed ? (job.closedAt ?? new Date()) : null }, { transaction });
    if (closed) await JobDay.destroy({ where: ownedBy(user, { jobId: job.id, day: { [Op.gt]: todayIn(user.timeZone) } }), transaction });
    await reportsChanged(user.companyId, transaction);
  });
}

/**
 * Puts rigs and people on the job for each day from `from` to `to`, replacing what it had on
 * those days. A rig or person already on another job that day is refused, naming the job and day;
 * nothing changes then.
 */
export async function planJob(user: SessionUser, id: number, plan: JobPlanInput): Promise<{ ok: true } | { ok: false; error: string }> {
  const job = await jobRecord(user, id);
  if (job.closedAt) return { ok: false, error: "This job is closed. Open it again to plan days on it." };
  const days = planDays(plan.from, plan.to ?? plan.from);
  // Days outside the job's dates: change its dates first, so the plan and the job say the same.
  const outside = days.find((d) => d < job.startsOn || (job.endsOn !== null && d > job.endsOn));
  if (outside)
    return {
      ok: false,
      error: `${formatDay(outside)} is outside the job's dates (${formatDay(job.startsOn)}${job.endsOn ? ` to ${formatDay(job.endsOn)}` : " on"}). Change the job's dates first.`,
    };
  const [rigs, people] = await Promise.all([
    plan.rigs.length ? Rig.findAll({ where: ownedBy(user, { code: plan.rigs, retired: false }), attributes: ["id", "code"] }) : [],
    plan.people.length ? User.findAll({ where: ownedBy(user, { id: plan.people, accessRemovedAt: null }), attributes: ["id", "name"] }) : [],
  ]);
  const missingRig = plan.rigs.find((code) => !rigs.some((r) => r.code === code));
  if (missingRig) notFound(`Rig ${missingRig}`);
  const missingPerson = plan.people.find((pid) => !people.some((p) => p.id === pid));
  if (missingPerson) notFound(`Person ${missingPerson}`);
  try {
    await sequelize.transaction(async (transaction) => {
      await JobDay.destroy({ where: ownedBy(user, { jobId: job.id, day: days }), transaction });
      const clash = await JobDay.findOne({
        where: ownedBy(user, {
          day: days,
          [Op.or]: [{ rigId: rigs.map((r) => r.id) }, { userId: people.map((p) => p.id) }],
        }),
        order: [["day", "ASC"]],
        transaction,
      });
      if (clash) {
        const other = await Job.findByPk(clash.jobId, { attributes: ["name"], transaction });
        const who = clash.rigId ? rigs.find((r) => r.id === clash.rigId)!.code : people.find((p) => p.id === clash.userId)!.name;
        throw new PlanClash(
          `${who} is already on ${other?.name ?? "another job"} on ${formatDay(clash.day)}. Take ${clash.rigId ? "the rig" : "them"} off that job first, or plan other days.`,
        );
      }
      await JobDay.bulkCreate(
        days.flatMap((day) => [
          ...rigs.map((r) => ({ companyId: user.companyId, jobId: job.id, day, rigId: r.id, userId: null })),
          ...people.map((p) => ({ companyId: user.companyId, jobId: job.id, day, rigId: null, userId: p.id })),
        ]),
        { transaction },
      );
      await reportsChanged(user.companyId, transaction);
    });
  } catch (error) {
    if (error instanceof PlanClash) return { ok: false, error: error.message };
    // Two plans saved at once for the same rig and day: the first stands.
    if (error instanceof UniqueConstraintError)
      return { ok: false, error: "Someone planned the same rig or person on those days just now. Reload and try again." };
    throw error;
  }
  return { ok: true };
}
class PlanClash extends Error {}

/** Plan rows as `PlanDay`s: each job's rigs and people per day, for the given jobs or days. */
async function planOf(user: Tenant, where: { jobIds?: number[]; from?: string; to?: string }): Promise<PlanDay[]> {
  const rows = await sequelize.query<{ day: string; job_id: number; code: string | null; user_id: number | null; name: string | null }>(
    `SELECT DATE_FORMAT(d.day, '%Y-%m-%d') AS day, d.job_id, r.code, d.user_id, u.name
     FROM job_days d LEFT JOIN rigs r ON r.id = d.rig_id LEFT JOIN users u ON u.id = d.user_id
     WHERE d.company_id = :company ${where.jobIds ? "AND d.job_id IN (:jobIds)" : ""} ${where.from ? "AND d.day >= :from AND d.day <= :to" : ""}
     ORDER BY d.day, r.code, u.name`,
    { replacements: { company: user.companyId, jobIds: where.jobIds ?? [], from: where.from ?? null, to: where.to ?? null }, type: QueryTypes.SELECT },
  );
  const byKey = new Map<string, PlanDay>();
  for (const r of rows) {
    const key = `${r.day}:${r.job_id}`;
    let d = byKey.get(key);
    if (!d) byKey.set(key, (d = { day: r.day, jobId: Number(r.job_id), rigCodes: [], people: [] }));
    if (r.code) d.rigCodes.push(r.code);
    if (r.user_id) d.people.push({ id: Number(r.user_id), name: r.name ?? "" });
  }
  return [...byKey.values()];
}

/** Who and what is planned from today for `days` days (every job's rows; pages that list the jobs themselves need no more). */
export async function planAhead(user: SessionUser, days: number): Promise<{ today: string; plan: PlanDay[] }> {
  const today = todayIn(user.timeZone);
  return { today, plan: await planOf(user, { from: today, to: addDays(today, days - 1) }) };
}

/**
 * The open jobs planned from today for `days` days, with their plans: the crew's home, a rig's
 * field math and the phone's kit (so "today's job" is known with no signal, for a week).
 */
export async function upcomingPlan(user: SessionUser, days = 7): Promise<{ today: string; jobs: JobSummary[]; plan: PlanDay[] }> {
  const { today, plan } = await planAhead(user, days);
  const ids = [...new Set(plan.map((p) => p.jobId))];
  const jobs = ids.length ? await Job.findAll({ where: ownedBy(user, { id: ids, closedAt: null }) }) : [];
  const totals = await jobTotals(
    user,
    jobs.map((j) => j.id),
  );
  const open = new Set(jobs.map((j) => j.id));
  return { today, jobs: jobs.map((j) => jobSummary(j, totals.get(j.id)!)), plan: plan.filter((p) => open.has(p.jobId)) };
}

export function jobSummary(j: Job, totals: JobTotals = NO_TOTALS): JobSummary {
  return {
    id: j.id,
    name: j.name,
    customer: j.customer,
    address: j.address,
    latitude: j.latitude,
    longitude: j.longitude,
    elevationFt: j.elevationFt,
    areaAcres: j.areaAcres,
    passes: j.passes,
    waterGalPerAcre: j.waterGalPerAcre,
    materials: j.materials,
    remainingAcres: jobProgress(j, totals).remainingAcres,
  };
}

/**
 * The job a rig was on at a time (its day in the company's calendar), else the job the person was
 * on: what a case records as it starts, also for a case started with no signal and sent later.
 * A job closed before that time no longer takes cases.
 */
export async function jobAt(user: SessionUser, rigId: number, at: Date, transaction?: Transaction): Promise<number | null> {
  const day = todayIn(user.timeZone, at);
  const rows = await sequelize.query<{ job_id: number; rig_id: number | null; user_id: number | null }>(
    `SELECT d.job_id, d.rig_id, d.user_id FROM job_days d JOIN jobs j ON j.id = d.job_id
     WHERE d.company_id = :company AND d.day = :day AND (d.rig_id = :rig OR d.user_id = :person) AND (j.closed_at IS NULL OR j.closed_at > :at)`,
    { replacements: { company: user.companyId, day, rig: rigId, person: user.id, at }, type: QueryTypes.SELECT, transaction },
  );
  return (rows.find((r) => r.rig_id !== null) ?? rows[0])?.job_id ?? null;
}

/** A job's summary by id for a case that records it (closed jobs too: the case happened on it). */
export async function jobSummaryById(user: Tenant, id: number | null): Promise<JobSummary | null> {
  if (id === null) return null;
  const job = await Job.findOne({ where: ownedBy(user, { id }) });
  return job ? jobSummary(job, (await jobTotals(user, [job.id])).get(job.id)) : null;
}

/**
 * Records one load sprayed on a job, once (the phone's id: a resend answers `created: false`).
 * A closed job, or another company's job or rig, is refused.
 */
export async function recordLoad(user: SessionUser, jobId: number, input: JobLoadInput): Promise<{ created: boolean }> {
  const job = await jobRecord(user, jobId);
  const existing = await JobLoad.findByPk(input.id, { attributes: ["companyId", "jobId"] });
  if (existing) {
    if (existing.companyId !== user.companyId || existing.jobId !== job.id) fail(409, "That load id is already taken.");
    return { created: false };
  }
  const sprayedAt = new Date(input.sprayedAt);
  if (job.closedAt && job.closedAt < sprayedAt) fail(409, `${job.name} was closed before this load was sprayed, so it takes no more loads.`);
  const rig = input.rigCode ? await Rig.findOne({ where: ownedBy(user, { code: input.rigCode }), attributes: ["id"] }) : null;
  if (input.rigCode && !rig) notFound(`Rig ${input.rigCode}`);
  try {
    await JobLoad.create({
      id: input.id,
      companyId: user.companyId,
      jobId: job.id,
      rigId: rig?.id ?? null,
      sprayedBy: user.id,
      sprayedAt,
      areaSqFt: input.areaSqFt,
      waterGal: input.waterGal,
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) return { created: false };
    throw error;
  }
  await reportsChanged(user.companyId);
  return { created: true };
}

/** The people who can be put on a job: the company's active sign-ins. */
export async function plannablePeople(user: SessionUser) {
  const people = await User.findAll({ where: ownedBy(user, { accessRemovedAt: null }), attributes: ["id", "name", "role"], order: [["name", "ASC"]] });
  return people.map((p) => ({ id: p.id, name: p.name, role: p.role }));
}

/** The company's open jobs as summaries (the load card's list), newest start first. */
export async function openJobSummaries(user: SessionUser): Promise<JobSummary[]> {
  return (await jobsWithTotals(user, { closedAt: null })).map(({ job, totals }) => jobSummary(job, totals));
}

/** How long the person who marked a load may take it back (a supervisor may at any time). */
export const TAKE_BACK_MINUTES = 60;

/** Drops a load marked sprayed by mistake; another company's job or load answers 404. */
export async function takeBackLoad(user: SessionUser, jobId: number, loadId: string): Promise<void> {
  const job = await jobRecord(user, jobId);
  const load = await JobLoad.findOne({ where: ownedBy(user, { id: loadId, jobId: job.id }) });
  if (!load) notFound(`Load ${loadId}`);
  const supervisor = can(user, "manage-jobs");
  if (!supervisor && load.sprayedBy !== user.id) fail(403, "Only the person who marked this load, or a supervisor, can take it back.");
  if (!supervisor && Date.now() - load.createdAt.getTime() > TAKE_BACK_MINUTES * 60_000)
    fail(409, `Loads can be taken back within ${TAKE_BACK_MINUTES} minutes of marking. Ask your supervisor to take this one back.`);
  await load.destroy();
  await reportsChanged(user.companyId);
}
