import type { NozzleTipInput, TorqueSpecInput } from "./schema";

/** What the field-math screens and widgets are filled from: one rig's specs, in one shape everywhere. */
export interface RigSpecs {
  code: string;
  name: string;
  tankGal: number;
  hoseLengthFt: number;
  hoseDiameterIn: number;
  yardElevationFt: number;
  nozzleTips: NozzleTipInput[];
  torqueSpecs: TorqueSpecInput[];
}

/** The columns a rig's specs are read from. */
export const RIG_SPEC_FIELDS = ["code", "name", "tankGal", "hoseLengthFt", "hoseDiameterIn", "yardElevationFt", "nozzleTips", "torqueSpecs"] as const;

/** A rig's specs from a stored rig (its torque figures may be unset). */
export function rigSpecsOf(rig: Omit<RigSpecs, "torqueSpecs"> & { torqueSpecs?: TorqueSpecInput[] | null }): RigSpecs {
  return {
    code: rig.code,
    name: rig.name,
    tankGal: rig.tankGal,
    hoseLengthFt: rig.hoseLengthFt,
    hoseDiameterIn: rig.hoseDiameterIn,
    yardElevationFt: rig.yardElevationFt,
    nozzleTips: rig.nozzleTips,
    torqueSpecs: rig.torqueSpecs ?? [],
  };
}
