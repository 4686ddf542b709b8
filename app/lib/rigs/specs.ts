import type { AgitatorDirection, NozzleTipInput, TorqueSpecInput } from "./schema";
import type { JobSummary } from "../jobs/today";

/** What the field-math screens and widgets are filled from: one rig's specs, in one shape everywhere. */
export interface RigSpecs {
  code: string;
  name: string;
  tankGal: number;
  hoseLengthFt: number;
  hoseDiameterIn: number;
  yardElevationFt: number;
  agitatorMixes: AgitatorDirection;
  /** From the pump's plate or curve; null until someone records it. */
  pumpRatedGpm: number | null;
  pumpRatedPsi: number | null;
  /** How much suction the pump needs, from its curve (NPSH required), in feet. */
  pumpNpshrFt: number | null;
  /** What the truck or trailer is rated to carry, in lb; null when not recorded. */
  carrierRatingLb: number | null;
  nozzleTips: NozzleTipInput[];
  torqueSpecs: TorqueSpecInput[];
  /** The job the rig is on: today's on the field-math screens, the case's own in a walk (the site's elevation and spec). */
  job?: JobSummary | null;
}

/** A rig as the walk-through needs it: its specs, and whether it has an hour meter and what it read. */
export type WalkRig = RigSpecs & { hasHourMeter: boolean; engineHours: number };

/** The columns a rig's specs are read from. */
export const RIG_SPEC_FIELDS = [
  "code",
  "name",
  "tankGal",
  "hoseLengthFt",
  "hoseDiameterIn",
  "yardElevationFt",
  "agitatorMixes",
  "pumpRatedGpm",
  "pumpRatedPsi",
  "pumpNpshrFt",
  "carrierRatingLb",
  "nozzleTips",
  "torqueSpecs",
] as const;

/** A rig's specs from a stored rig (its torque figures may be unset). */
export function rigSpecsOf(
  rig: Omit<RigSpecs, "torqueSpecs" | "agitatorMixes" | "pumpRatedGpm" | "pumpRatedPsi" | "pumpNpshrFt" | "carrierRatingLb"> &
    Partial<Pick<RigSpecs, "agitatorMixes" | "pumpRatedGpm" | "pumpRatedPsi" | "pumpNpshrFt" | "carrierRatingLb">> & { torqueSpecs?: TorqueSpecInput[] | null },
): RigSpecs {
  return {
    code: rig.code,
    name: rig.name,
    tankGal: rig.tankGal,
    hoseLengthFt: rig.hoseLengthFt,
    hoseDiameterIn: rig.hoseDiameterIn,
    yardElevationFt: rig.yardElevationFt,
    agitatorMixes: rig.agitatorMixes ?? "forward",
    pumpRatedGpm: rig.pumpRatedGpm ?? null,
    pumpRatedPsi: rig.pumpRatedPsi ?? null,
    pumpNpshrFt: rig.pumpNpshrFt ?? null,
    carrierRatingLb: rig.carrierRatingLb ?? null,
    nozzleTips: rig.nozzleTips,
    torqueSpecs: rig.torqueSpecs ?? [],
  };
}

/** A stored rig as the walk-through needs it (the case page, the walk and the phone's offline kit). */
export const walkRigOf = (rig: Parameters<typeof rigSpecsOf>[0] & { hasHourMeter: boolean; engineHours: number }): WalkRig => ({
  ...rigSpecsOf(rig),
  hasHourMeter: rig.hasHourMeter,
  engineHours: rig.engineHours,
});
