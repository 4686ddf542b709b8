import { fmt } from "../field-math/units";
import { isoInZone } from "../format";

// Free of zod: the crew's home shows what is due. The forms' schemas are in service-forms.ts.

/** Where a piece of routine service stands, worst first. */
export const SERVICE_STATUSES = ["overdue", "due", "never", "soon", "ok", "no-meter"] as const;
export type ServiceStatus = (typeof SERVICE_STATUSES)[number];
export const SERVICE_STATUS_LABELS: Record<ServiceStatus, string> = {
  overdue: "Overdue",
  due: "Due now",
  never: "Never recorded: do it and record it",
  soon: "Due soon",
  ok: "Up to date",
  "no-meter": "No hour meter",
};
/** Statuses that put a rig on the crew's home and the supervisor's board. */
export const NEEDS_DOING: readonly ServiceStatus[] = ["overdue", "due", "never"];

export interface ServiceDue {
  status: ServiceStatus;
  /** Engine hours until due (negative: over by), when the rule counts hours and the rig has a meter. */
  hoursLeft: number | null;
  /** Calendar days until due (negative: over by), when the rule counts days. */
  daysLeft: number | null;
}

const rank = (s: ServiceStatus) => SERVICE_STATUSES.indexOf(s);
const worst = (a: ServiceStatus, b: ServiceStatus) => (rank(a) <= rank(b) ? a : b);
/** Left of an interval: over is overdue, exactly nothing left is due, the last tenth is soon. */
const statusOf = (left: number, soonWithin: number): ServiceStatus => (left < 0 ? "overdue" : left === 0 ? "due" : left <= soonWithin ? "soon" : "ok");

/** Whole calendar days between two instants as the company's clock reads them. */
export function calendarDaysBetween(from: Date | string, to: Date | string, timeZone: string, dayIn?: (at: string) => string): number {
  const day = (at: Date | string) =>
    Date.parse(`${dayIn ? dayIn(typeof at === "string" ? at : at.toISOString()) : isoInZone(at, timeZone).slice(0, 10)}T00:00:00Z`);
  return Math.round((day(to) - day(from)) / 86_400_000);
}

/**
 * When a rule is next due: hours since the last service against the rig's hour meter now, and
 * calendar days since it in the company's zone; with both, whichever is worse decides.
 */
export function serviceDue(
  rule: { everyHours: number | null; everyDays: number | null },
  last: { doneAt: Date | string; engineHours: number | null } | null,
  rig: { hasHourMeter: boolean; engineHours: number },
  now: Date,
  timeZone: string,
  /** The day of a time in `timeZone`, when the caller keeps them worked out (the board asks thousands). */
  dayIn?: (at: string) => string,
): ServiceDue {
  if (!last) return { status: "never", hoursLeft: null, daysLeft: null };
  let status: ServiceStatus | null = null;
  let hoursLeft: number | null = null;
  let daysLeft: number | null = null;
  if (rule.everyHours !== null && rig.hasHourMeter && last.engineHours !== null) {
    // Round to the meter's tenth so 250.0 hours after is exactly due, not a float's hair over.
    hoursLeft = Math.round((rule.everyHours - (rig.engineHours - last.engineHours)) * 10) / 10;
    status = statusOf(hoursLeft, rule.everyHours / 10);
  }
  if (rule.everyDays !== null) {
    daysLeft = rule.everyDays - calendarDaysBetween(last.doneAt, now, timeZone, dayIn);
    const byDays = statusOf(daysLeft, Math.floor(rule.everyDays / 10));
    status = status ? worst(status, byDays) : byDays;
  }
  return { status: status ?? "no-meter", hoursLeft, daysLeft };
}

/** "12.5 h left", "over by 3 days", in the words a crew reads. */
export function dueText(due: ServiceDue): string {
  if (due.status === "never") return "never recorded";
  if (due.status === "no-meter") return "counts engine hours: this rig has no hour meter";
  const parts: string[] = [];
  const fmt = (n: number, unit: string) => `${Math.abs(n).toLocaleString("en-US", { maximumFractionDigits: 1 })} ${unit}${Math.abs(n) === 1 ? "" : "s"}`;
  if (due.hoursLeft !== null) parts.push(due.hoursLeft < 0 ? `over by ${fmt(due.hoursLeft, "engine hour")}` : `${fmt(due.hoursLeft, "engine hour")} left`);
  if (due.daysLeft !== null)
    parts.push(due.daysLeft < 0 ? `over by ${fmt(due.daysLeft, "day")}` : due.daysLeft === 0 ? "due today" : `${fmt(due.daysLeft, "day")} left`);
  return parts.join(", ");
}

/** "every 50 engine hours", "every day", "every 250 engine hours or 365 days, whichever first". */
export function intervalWords(line: { everyHours: number | null; everyDays: number | null }): string {
  const hours = line.everyHours !== null ? `${fmt(line.everyHours, 1)} engine hours` : null;
  const days = line.everyDays !== null ? `${line.everyDays} day${line.everyDays === 1 ? "" : "s"}` : null;
  if (hours && days) return `every ${hours} or ${days}, whichever first`;
  return line.everyDays === 1 && !hours ? "every day" : `every ${hours ?? days}`;
}

/** A service done now on a rig with an hour meter needs the reading, no lower than the last one and no wild jump. */
export const MAX_HOURS_JUMP = 1000;
export function readingProblem(reading: number | null, rig: { hasHourMeter: boolean; engineHours: number }): string | null {
  if (!rig.hasHourMeter) return null;
  const last = rig.engineHours.toLocaleString("en-US", { maximumFractionDigits: 1 });
  if (reading === null) return "Give the hour meter reading: this rig has one.";
  if (reading < rig.engineHours) return `The hour meter last read ${last} h; a reading taken now cannot be lower. Check the meter.`;
  if (reading > rig.engineHours + MAX_HOURS_JUMP)
    return `That is over ${MAX_HOURS_JUMP.toLocaleString("en-US")} h above the last reading (${last} h). Check the meter.`;
  return null;
}

/** How many of a rig's services need doing now, and how many are overdue. */
export function serviceCounts(lines: { due: ServiceDue }[]) {
  return {
    total: lines.length,
    toDo: lines.filter((l) => NEEDS_DOING.includes(l.due.status)).length,
    overdue: lines.filter((l) => l.due.status === "overdue").length,
  };
}
