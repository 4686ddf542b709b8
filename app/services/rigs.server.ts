import { UniqueConstraintError } from "sequelize";
import type { RigInput } from "~/lib/rig-schema";
import { Rig } from "./db.server";
import type { SessionUser } from "./guards.server";
import { notFound } from "./guards.server";

const LIST_COLUMNS = ["id", "code", "name", "mount", "tankGal", "engineHours", "retired"] as const;

export async function listRigs(user: SessionUser, { includeRetired = false } = {}) {
  const rigs = await Rig.findAll({
    where: { companyId: user.companyId, ...(includeRetired ? {} : { retired: false }) },
    attributes: [...LIST_COLUMNS],
    order: [
      ["retired", "ASC"],
      ["code", "ASC"],
    ],
  });
  return rigs.map((r) => r.get({ plain: true }));
}

/** One of the company's rigs by unit code; another company's code answers 404. */
export async function findRig(user: SessionUser, code: string) {
  const rig = await Rig.findOne({ where: { companyId: user.companyId, code: code.toUpperCase() } });
  if (!rig) notFound(`Rig ${code}`);
  return rig;
}

export type RigSaveResult = { ok: true; code: string } | { ok: false; fieldErrors: Partial<Record<keyof RigInput, string>> };

async function saving(work: () => Promise<Rig>): Promise<RigSaveResult> {
  try {
    const rig = await work();
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
  const rig = await findRig(user, code);
  return saving(() => rig.update({ ...input, notes: input.notes ?? null }));
}

export async function setRigRetired(user: SessionUser, code: string, retired: boolean) {
  const rig = await findRig(user, code);
  await rig.update({ retired });
}
