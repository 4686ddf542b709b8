import { Op, QueryTypes } from "sequelize";
import { NEEDS_DOING, SERVICE_STATUSES, serviceDue, type ServiceDue } from "~/lib/rigs/service";
import type { ServiceRuleInput } from "~/lib/rigs/service-forms";
import type { ServiceTask } from "~/lib/guides/kinds";
import { Rig, sequelize, ServiceRecord, ServiceRule, User } from "./db.server";
import { notFound, type SessionUser } from "./guards.server";
import { ownedBy } from "./tenancy.server";

export interface ServiceLine {
  ruleId: number;
  rigCode: string;
  rigName: string;
  name: string;
  everyHours: number | null;
  everyDays: number | null;
  task: ServiceTask | null;
  due: ServiceDue;
  last: { doneAt: string; engineHours: number | null; by: string | null; note: string | null } | null;
}

/**
 * Every active rule on the company's active rigs (or one rig) with where it stands now, worst
 * first. The last record of each rule is read in one query.
 */
export async function serviceLines(user: SessionUser, opts: { rigId?: number; now?: Date } = {}): Promise<ServiceLine[]> {
  const rigs = await Rig.findAll({
    where: ownedBy(user, { retired: false, ...(opts.rigId ? { id: opts.rigId } : {}) }),
    attributes: ["id", "code", "name", "hasHourMeter", "engineHours"],
  });
  if (!rigs.length) return [];
  const rules = await ServiceRule.findAll({ where: ownedBy(user, { rigId: rigs.map((r) => r.id), retired: false }), order: [["name", "ASC"]] });
  if (!rules.length) return [];
  // The latest record of each rule by when it was done (a card sent late from a phone with no signal
  // arrives after newer ones): one grouped query over those rules alone, then those rows.
  const newest = await sequelize.query<{ id: number }>(
    `SELECT MAX(r.id) AS id FROM service_records r
     JOIN (SELECT rule_id, MAX(done_at) AS at FROM service_records WHERE company_id = :company AND rule_id IN (:rules) GROUP BY rule_id) x
       ON x.rule_id = r.rule_id AND x.at = r.done_at
     GROUP BY r.rule_id`,
    { replacements: { company: user.companyId, rules: rules.map((r) => r.id) }, type: QueryTypes.SELECT },
  );
  const latest = newest.length ? await ServiceRecord.findAll({ where: { id: newest.map((r) => Number(r.id)) } }) : [];
  const byRule = new Map(latest.map((r) => [r.ruleId, r]));
  const names = new Map(
    (await User.findAll({ where: { id: [...new Set(latest.map((r) => r.doneBy).filter((v): v is number => v !== null))] }, attributes: ["id", "name"] })).map(
      (u) => [u.id, u.name],
    ),
  );
  const rigById = new Map(rigs.map((r) => [r.id, r]));
  const now = opts.now ?? new Date();
  const lines = rules.map((rule): ServiceLine => {
    const rig = rigById.get(rule.rigId)!;
    const last = byRule.get(rule.id) ?? null;
    return {
      ruleId: rule.id,
      rigCode: rig.code,
      rigName: rig.name,
      name: rule.name,
      everyHours: rule.everyHours,
      everyDays: rule.everyDays,
      task: rule.task ?? null,
      due: serviceDue(rule, last, rig, now, user.timeZone),
      last: last
        ? { doneAt: last.doneAt.toISOString(), engineHours: last.engineHours, by: last.doneBy ? (names.get(last.doneBy) ?? null) : null, note: last.note }
        : null,
    };
  });
  const rank = (l: ServiceLine) => SERVICE_STATUSES.indexOf(l.due.status);
  return lines.sort((a, b) => rank(a) - rank(b) || a.rigCode.localeCompare(b.rigCode) || a.name.localeCompare(b.name));
}

/** The lines that need doing now (overdue, due, never recorded): home and the board. */
export async function serviceToDo(user: SessionUser): Promise<ServiceLine[]> {
  return (await serviceLines(user)).filter((l) => NEEDS_DOING.includes(l.due.status));
}

/** One of this rig's kept services; another company's (or another rig's) answers 404. */
export async function ruleOf(user: SessionUser, rigId: number, ruleId: number) {
  const rule = await ServiceRule.findOne({ where: ownedBy(user, { id: ruleId, rigId, retired: false }) });
  if (!rule) notFound("That service");
  return rule;
}

/** A rig keeps each service once: a second with the same name (a double tap) is refused, not stored. */
export async function sameNameOnRig(user: SessionUser, rigId: number, name: string, except?: number) {
  const rules = await ServiceRule.findAll({ where: ownedBy(user, { rigId, retired: false }), attributes: ["id", "name"] });
  return rules.some((r) => r.id !== except && r.name.trim().toLowerCase() === name.trim().toLowerCase());
}

/** The rig's other service already recorded by this card task, if any: one task records one service on a rig. */
export async function taskTakenOnRig(user: SessionUser, rigId: number, task: string | null, except?: number): Promise<string | null> {
  if (!task) return null;
  const other = await ServiceRule.findOne({
    where: ownedBy(user, { rigId, retired: false, task, ...(except ? { id: { [Op.ne]: except } } : {}) }),
    attributes: ["name"],
  });
  return other?.name ?? null;
}

export async function addServiceRule(user: SessionUser, rigId: number, input: ServiceRuleInput) {
  return ServiceRule.create({ companyId: user.companyId, rigId, name: input.name, everyHours: input.everyHours, everyDays: input.everyDays, task: input.task });
}

export async function updateServiceRule(user: SessionUser, rigId: number, ruleId: number, input: ServiceRuleInput) {
  await (await ruleOf(user, rigId, ruleId)).update({ name: input.name, everyHours: input.everyHours, everyDays: input.everyDays, task: input.task });
}

export async function retireServiceRule(user: SessionUser, rigId: number, ruleId: number) {
  await (await ruleOf(user, rigId, ruleId)).update({ retired: true });
}

/**
 * A service done now. The hour meter read with it keeps the rig's hours current (never moved
 * back: a late entry with lower hours is kept as read, the rig keeps its higher figure).
 */
export async function recordService(
  user: SessionUser,
  rig: { id: number; hasHourMeter: boolean },
  ruleId: number,
  done: { engineHours: number | null; note?: string },
  at = new Date(),
) {
  await ruleOf(user, rig.id, ruleId);
  const engineHours = rig.hasHourMeter ? done.engineHours : null;
  await sequelize.transaction(async (transaction) => {
    await ServiceRecord.create(
      { companyId: user.companyId, rigId: rig.id, ruleId, doneAt: at, engineHours, doneBy: user.id, note: done.note?.trim() || null },
      { transaction },
    );
    if (engineHours !== null) {
      await Rig.update({ engineHours }, { where: { id: rig.id, companyId: user.companyId, engineHours: { [Op.lt]: engineHours } }, transaction });
    }
  });
}
