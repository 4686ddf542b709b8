import { poissonInterval } from "./chi-square";

/** What SQL hands over for one rig over a window. */
export interface RigAggregate {
  rigCode: string;
  cases: number;
  fixed: number;
  handoff: number;
  abandoned: number;
  /** Engine hours run in the window (null: no hour meter). */
  operatingHours: number | null;
  /** Sum of open-to-close time over closed cases, in hours. */
  repairHours: number;
  closedCases: number;
}

export interface RigFigures extends RigAggregate {
  failures: number;
  mtbfHours: number | null;
  mttrHours: number | null;
  availability: number | null;
  ratePer100h: number | null;
  rateInterval: { lower: number; upper: number } | null;
  fleetRatePer100h: number | null;
  outOfLine: boolean;
}

/** MTBF = operating time ÷ failures (ISO 14224 / EN 13306); failures are fixed and handed-off cases. */
export const mtbf = (hours: number, failures: number) => (failures > 0 ? hours / failures : null);
/** MTTR = total repair time ÷ repairs. */
export const mttr = (repairHours: number, repairs: number) => (repairs > 0 ? repairHours / repairs : null);
/** Availability A = MTBF ÷ (MTBF + MTTR) (ISO 14224 / ISO 20815). */
export const availability = (mtbfHours: number | null, mttrHours: number | null) =>
  mtbfHours !== null && mttrHours !== null && mtbfHours + mttrHours > 0 ? mtbfHours / (mtbfHours + mttrHours) : null;

/**
 * Figures per rig, and each rig's fault rate against the rest of the fleet: flagged when the
 * whole exact 95 % interval of its rate lies above the others' rate. A flag is a prompt to look.
 */
export function rigFigures(rigs: RigAggregate[], confidence = 0.95): RigFigures[] {
  const metered = rigs.filter((r) => r.operatingHours !== null && r.operatingHours > 0);
  const totalFailures = metered.reduce((s, r) => s + r.fixed + r.handoff, 0);
  const totalHours = metered.reduce((s, r) => s + (r.operatingHours ?? 0), 0);
  return rigs.map((r) => {
    const failures = r.fixed + r.handoff;
    const hours = r.operatingHours;
    const mtbfHours = hours !== null && hours > 0 ? mtbf(hours, failures) : null;
    const mttrHours = mttr(r.repairHours, r.closedCases);
    let ratePer100h: number | null = null;
    let rateInterval: RigFigures["rateInterval"] = null;
    let fleetRatePer100h: number | null = null;
    let outOfLine = false;
    if (hours !== null && hours > 0) {
      ratePer100h = (failures / hours) * 100;
      const ci = poissonInterval(failures, confidence);
      rateInterval = { lower: (ci.lower / hours) * 100, upper: (ci.upper / hours) * 100 };
      const restHours = totalHours - hours;
      if (restHours > 0) {
        fleetRatePer100h = ((totalFailures - failures) / restHours) * 100;
        outOfLine = rateInterval.lower > fleetRatePer100h;
      }
    }
    return { ...r, failures, mtbfHours, mttrHours, availability: availability(mtbfHours, mttrHours), ratePer100h, rateInterval, fleetRatePer100h, outOfLine };
  });
}
