import { RIG_SPEC_FIELDS, rigSpecsOf, type RigSpecs } from "~/lib/rig-specs";
import { Rig } from "./db.server";
import type { SessionUser } from "./guards.server";

/** The company's active rigs with what the calculators are filled from. */
export async function rigSpecsFor(user: SessionUser): Promise<RigSpecs[]> {
  const rigs = await Rig.findAll({ where: { companyId: user.companyId, retired: false }, attributes: [...RIG_SPEC_FIELDS], order: [["code", "ASC"]] });
  return rigs.map(rigSpecsOf);
}
