import { UniqueConstraintError } from "sequelize";
import { ownedBy } from "./tenancy.server";
import type { RigInput } from "~/lib/rigs/schema";
import { RIG_SPEC_FIELDS, rigSpecsOf, type RigSpecs } from "~/lib/rigs/specs";
import { Rig } from "./db.server";
import type { SessionUser } from "./guards.server";
import { reportsChanged } from "./report-cache.server";
import { notFound } from "./guards.server";

const LIST_COLUMNS = ["id", "code", "name", "mount", "tankGal", "engineHours", "retired"] as const;

export async function listRigs(user: SessionUser, { includeRetired = false } = {}) {
  const rigs = await Rig.findAll({
    where: ownedBy(user, includeRetired ? {} : { retired: false }),
    attributes: [...LIST_COLUMNS],
    order: [
      ["retired", "ASC"],
      ["code", "ASC"],
    ],
  });
  return rigs.map((r) => r.get({ plain: true }));
}

/** The rig's database record, for this module's own updates; another company's code answers 404. */
async function rigRecord(user: SessionUser, code: string) {
  const rig = await Rig.findOne({ where: ownedBy(user, { code: code.toUpperCase() }) });
  if (!rig) notFound(`Rig ${code}`);
  return rig;
}

/** One of the company's rigs by unit code, as plain data; another company's code answers 404. */
export async function findRig(user: SessionUser, code: string) {
  return (await rigRecord(user, code)).get({ plain: true });
}

/** The company's active rigs with what the calculators are filled from. */
export async function rigSpecsFor(user: SessionUser): Promise<RigSpecs[]> {
  const rigs = await Rig.findAll({ where: ownedBy(user, { retired: false }), attributes: [...RIG_SPEC_FIELDS], order: [["code", "ASC"]] });
  return rigs.map(rigSpecsOf);
}

export type RigSaveResult = { ok: true; code: string } | { ok: false; fieldErrors: Partial<Record<keyof RigInput, string>> };

async function saving(work: () => Promise<Rig>): Promise<RigSaveResult> {
  try {
    const rig = await work();
    await reportsChanged(rig.companyId);
    return { ok: true, code: rig.code };
  } catch (error) {
    if (error instanceof UniqueConstraintError) {
      return { ok: false, fieldErrors: { code: "Another rig in your company already has this unit code." } };
    }
    throw error;
  }
}

export function createRig(user: SessionUser, input: RigInput) {
  return saving(() => Rig.create({ ...input, notes: input.notes ?? null, companyId: user.companyId }));
}

export async function updateRig(user: SessionUser, code: string, input: RigInput) {
  const rig = await rigRecord(user, code);
  return saving(() => rig.update({ ...input, notes: input.notes ?? null }));
}

export async function setRigRetired(user: SessionUser, code: string, retired: boolean) {
  const rig = await rigRecord(user, code);
  await rig.update({ retired });
  await reportsChanged(user.companyId);
}
