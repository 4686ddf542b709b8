/**
 * Routine service for the demo rigs: the rules every rig keeps (intervals are common practice for
 * small engines and centrifugal pumps, invented for the demo; a company sets its own from the
 * makers' manuals), and, with the history, when each was last done, so a supervisor opening the
 * demo sees some service done, some due and some overdue.
 */
import { Rig, ServiceRecord, ServiceRule, User } from "../db/index";
import type { Transaction } from "sequelize";
import type { ServiceTask } from "../app/lib/guides/kinds";

/** The demo's rules: name, every engine hours, every days (null: not counted that way), the card task that records it. */
export const DEMO_SERVICE_RULES: [string, number | null, number | null, ServiceTask | null][] = [
  ["Lubricator refill (pump shaft seal)", null, 1, "lubricator"],
  ["Grease points", 50, 7, "grease"],
  ["Pump seal inspection", 250, 180, null],
  ["Hydraulic oil and filter", 500, 365, null],
];

export async function seedServiceRules(companyId: number, transaction: Transaction) {
  const rigs = await Rig.findAll({ where: { companyId }, attributes: ["id", "hasHourMeter"], transaction });
  await ServiceRule.bulkCreate(
    rigs.flatMap((rig) =>
      DEMO_SERVICE_RULES.map(([name, everyHours, everyDays, task]) => ({
        companyId,
        rigId: rig.id,
        name,
        // A rig with no hour meter keeps the calendar alone.
        everyHours: rig.hasHourMeter ? everyHours : null,
        everyDays: everyDays ?? 30,
        task,
      })),
    ),
    { transaction },
  );
}

/** How far back each rig's last service was, in days and engine hours (invented: CF-07 is behind on grease). */
const LAST_DONE: Record<string, Record<string, [number, number]>> = {
  "CF-07": { "Grease points": [9, 61.5], "Lubricator refill (pump shaft seal)": [2, 14] },
  "CF-03": { "Pump seal inspection": [40, 180] },
  "BM-01": { "Lubricator refill (pump shaft seal)": [1, 6] },
};
const DEFAULT_DONE: Record<string, [number, number]> = {
  "Lubricator refill (pump shaft seal)": [0, 2],
  "Grease points": [3, 22],
  "Pump seal inspection": [60, 120],
  "Hydraulic oil and filter": [150, 310],
};

/** The last time each rule was done, for the rules the history's cards do not record (they record lubricator and grease). */
export async function seedServiceHistory(now: Date): Promise<number> {
  const recorded = new Set((await ServiceRecord.findAll({ attributes: ["ruleId"], group: ["rule_id"] })).map((r) => r.ruleId));
  const rules = (await ServiceRule.findAll()).filter((r) => !recorded.has(r.id));
  const rigs = new Map((await Rig.findAll({ attributes: ["id", "code", "hasHourMeter", "engineHours", "companyId"] })).map((r) => [r.id, r]));
  const crews = await User.findAll({ where: { role: "crew" }, attributes: ["id", "companyId"] });
  const rows = rules.map((rule) => {
    const rig = rigs.get(rule.rigId)!;
    const [days, hours] = LAST_DONE[rig.code]?.[rule.name] ?? DEFAULT_DONE[rule.name] ?? [0, 0];
    const doneAt = new Date(now.getTime() - days * 86_400_000 - 3 * 3_600_000);
    return {
      companyId: rule.companyId,
      rigId: rule.rigId,
      ruleId: rule.id,
      doneAt,
      engineHours: rig.hasHourMeter ? Math.max(0, Math.round((rig.engineHours - hours) * 10) / 10) : null,
      doneBy: crews.find((c) => c.companyId === rule.companyId)?.id ?? null,
      note: null,
    };
  });
  await ServiceRecord.bulkCreate(rows);
  return rows.length;
}
