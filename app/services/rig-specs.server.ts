import type { RigSpecs } from "~/components/calc/calc-kit";
import { Rig } from "./db.server";
import type { SessionUser } from "./guards.server";

/** The company's active rigs with what the calculators are filled from. */
export async function rigSpecsFor(user: SessionUser): Promise<(RigSpecs & { name: string })[]> {
  const rigs = await Rig.findAll({
    where: { companyId: user.companyId, retired: false },
    attributes: ["code", "name", "tankGal", "hoseLengthFt", "hoseDiameterIn", "yardElevationFt", "nozzleTips", "torqueSpecs"],
    order: [["code", "ASC"]],
  });
  return rigs.map((r) => ({
    code: r.code,
    name: r.name,
    tankGal: r.tankGal,
    hoseLengthFt: r.hoseLengthFt,
    hoseDiameterIn: r.hoseDiameterIn,
    yardElevationFt: r.yardElevationFt,
    nozzleTips: r.nozzleTips,
    torqueSpecs: r.torqueSpecs ?? [],
  }));
}
