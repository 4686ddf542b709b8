import { isoInZone } from "../format";
import { serviceDue } from "../rigs/service";
import { poissonInterval } from "./chi-square";

/**
 * What skipped care costs, for the board: the fault rate per 100 engine hours on days with a
 * complete pre-start against days without one (missing or incomplete), faults that happened with a
 * service overdue, and cards completed per rig and week. Association, not proof: a rig whose crew
 * skips the pre-start may also be the oldest, or on the hardest job.
 */

export interface CareRig {
  id: number;
  code: string;
  hasHourMeter: boolean;
}
/** An hour-meter reading: a card's start, a fix's close, a service done. */
export interface Reading {
  rigId: number;
  at: string;
  hours: number;
}
/** A card walked: which, when, and whether it closed complete (its complete end, no item left undone). */
export interface CardRow {
  rigId: number;
  slug: string;
  at: string;
  complete: boolean;
}
/** A fault: a fix closed fixed or handed off (the board's failures). */
export interface FaultRow {
  rigId: number;
  at: string;
  /** Hours read at its close, if any. */
  hours: number | null;
}
export interface RuleRow {
  id: number;
  rigId: number;
  name: string;
  everyHours: number | null;
  everyDays: number | null;
  /** When the rule was set up: no service is overdue before its rule existed. */
  since: string;
}
export interface DoneRow {
  ruleId: number;
  at: string;
  hours: number | null;
}

export interface RateGroup {
  days: number;
  hours: number;
  faults: number;
  ratePer100h: number | null;
  interval: { lower: number; upper: number } | null;
}

export interface CareFigures {
  /** Rig-days with a complete pre-start, and the others (missing or incomplete). */
  withPreStart: RateGroup;
  withoutPreStart: RateGroup;
  /** Worked rig-days that had no hour reading to measure (left out of both rates). */
  unmeasuredDays: number;
  /** Measured rig-days with a service overdue at the day's last reading, and with every service up to date. */
  withOverdue: RateGroup;
  withoutOverdue: RateGroup;
  /** Faults with at least one service overdue as they happened, and by service name. */
  faults: number;
  faultsWithOverdue: number;
  overdueByService: { name: string; faults: number }[];
  /** Per rig and week (Monday), newest first: worked days, those with a complete pre-start, other cards completed. */
  weeks: string[];
  cardWeeks: { rigCode: string; cells: { week: string; workedDays: number; preStartDays: number; otherCards: number }[] }[];
}

const PRE_START = "pre-start";
/** A day's running above this is a misread meter, not a day: such a gap is left unmeasured. */
const MAX_DAY_HOURS = 24;
/** A reading further back than this (a long weekend and some) cannot say what one day ran. */
const MAX_GAP_DAYS = 4;

/** A time's day in the zone, worked out once per time: a board asks it of thousands of cards, several times each. */
function daysIn(zone: string): (at: string) => string {
  const known = new Map<string, string>();
  return (at) => {
    let day = known.get(at);
    if (day === undefined) known.set(at, (day = isoInZone(at, zone).slice(0, 10)));
    return day;
  };
}
/** The Monday of a day's week, as YYYY-MM-DD. */
export function weekOf(day: string): string {
  const t = Date.parse(`${day}T00:00:00Z`);
  const weekday = (new Date(t).getUTCDay() + 6) % 7;
  return new Date(t - weekday * 86_400_000).toISOString().slice(0, 10);
}

function rateGroup(days: number, hours: number, faults: number, confidence: number): RateGroup {
  if (hours <= 0) return { days, hours, faults, ratePer100h: null, interval: null };
  const ci = poissonInterval(faults, confidence);
  return { days, hours, faults, ratePer100h: (faults / hours) * 100, interval: { lower: (ci.lower / hours) * 100, upper: (ci.upper / hours) * 100 } };
}

/**
 * Engine hours run per rig and day: the day's last reading less the last reading of an earlier
 * day. With a card read at each start and the shut-down card at each day's end this is the day's
 * running; a day whose end was not read passes its hours on to the next day read, if that is
 * within a few days (else the day is left unmeasured: the hours could belong to any day between).
 */
export function hoursByDay(readings: readonly Reading[], zone: string, dayIn = daysIn(zone)): Map<string, number> {
  const byRig = new Map<number, Reading[]>();
  for (const r of readings) {
    const list = byRig.get(r.rigId);
    if (list) list.push(r);
    else byRig.set(r.rigId, [r]);
  }
  const out = new Map<string, number>();
  for (const [rigId, list] of byRig) {
    const lastOfDay = new Map<string, number>();
    for (const r of [...list].sort((a, b) => a.at.localeCompare(b.at))) lastOfDay.set(dayIn(r.at), r.hours);
    let before: { day: string; hours: number } | null = null;
    for (const [day, hours] of [...lastOfDay].sort(([a], [b]) => a.localeCompare(b))) {
      const run = before === null ? null : hours - before.hours;
      const gap = before === null ? Infinity : (Date.parse(`${day}T00:00:00Z`) - Date.parse(`${before.day}T00:00:00Z`)) / 86_400_000;
      if (run !== null && run >= 0 && run <= MAX_DAY_HOURS && gap <= MAX_GAP_DAYS) out.set(`${rigId}:${day}`, run);
      before = { day, hours };
    }
  }
  return out;
}

/**
 * The services overdue on a rig at a time (hours read then), from its rules and what was done
 * before. `done` is each rule's records, oldest first.
 */
export function overdueAt(
  rules: readonly RuleRow[],
  done: ReadonlyMap<number, readonly DoneRow[]>,
  at: string,
  hours: number | null,
  hasHourMeter: boolean,
  zone: string,
  dayIn: (at: string) => string = daysIn(zone),
): string[] {
  return rules.flatMap((rule) => {
    if (rule.since > at) return [];
    const list = done.get(rule.id) ?? [];
    // The last record at or before `at` (the list is oldest first): a binary search, as a board reads thousands.
    let lo = 0;
    let hi = list.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (list[mid].at <= at) lo = mid + 1;
      else hi = mid;
    }
    const last: DoneRow | undefined = list[lo - 1];
    // Never recorded: not known to be overdue (it may have been done before Tankside kept it).
    if (!last) return [];
    const from = { doneAt: last.at, engineHours: last.hours };
    const rig = { hasHourMeter: hasHourMeter && hours !== null && from.engineHours !== null, engineHours: hours ?? 0 };
    return serviceDue(rule, from, rig, new Date(at), zone, dayIn).status === "overdue" ? [rule.name] : [];
  });
}

export function careFigures(
  input: {
    rigs: readonly CareRig[];
    readings: readonly Reading[];
    cards: readonly CardRow[];
    faults: readonly FaultRow[];
    rules: readonly RuleRow[];
    done: readonly DoneRow[];
    zone: string;
    /** The window's days (company calendar, from inclusive, to exclusive): readings before it only measure its first day. */
    fromDay: string;
    toDay: string;
    /** The weeks to show cards for end with this day's week. */
    today: string;
    weeksShown?: number;
  },
  confidence = 0.95,
): CareFigures {
  const { zone } = input;
  const dayIn = daysIn(zone);
  const inWindow = (at: string) => {
    const day = dayIn(at);
    return day >= input.fromDay && day < input.toDay;
  };
  const cardsIn = input.cards.filter((c) => inWindow(c.at));
  const faultsIn = input.faults.filter((f) => inWindow(f.at));
  const metered = new Set(input.rigs.filter((r) => r.hasHourMeter).map((r) => r.id));
  const hours = hoursByDay(
    input.readings.filter((r) => metered.has(r.rigId)),
    zone,
    dayIn,
  );
  const complete = new Set(cardsIn.filter((c) => c.slug === PRE_START && c.complete).map((c) => `${c.rigId}:${dayIn(c.at)}`));
  const faultsOn = new Map<string, number>();
  for (const f of faultsIn) if (metered.has(f.rigId)) faultsOn.set(`${f.rigId}:${dayIn(f.at)}`, (faultsOn.get(`${f.rigId}:${dayIn(f.at)}`) ?? 0) + 1);

  // A worked rig-day: one with a card or a fault. Measured when its hours are known.
  const worked = new Set<string>([...faultsOn.keys(), ...cardsIn.filter((c) => metered.has(c.rigId)).map((c) => `${c.rigId}:${dayIn(c.at)}`)]);
  const sums = { with: { days: 0, hours: 0, faults: 0 }, without: { days: 0, hours: 0, faults: 0 } };
  const measured: { key: string; run: number; faults: number }[] = [];
  let unmeasured = 0;
  for (const key of worked) {
    const run = hours.get(key);
    if (run === undefined) {
      unmeasured++;
      continue;
    }
    const g = complete.has(key) ? sums.with : sums.without;
    const faults = faultsOn.get(key) ?? 0;
    g.days++;
    g.hours += run;
    g.faults += faults;
    measured.push({ key, run, faults });
  }
  const rigOf = new Map(input.rigs.map((r) => [r.id, r]));
  const doneByRule = new Map<number, DoneRow[]>();
  for (const d of [...input.done].sort((a, b) => a.at.localeCompare(b.at))) {
    const list = doneByRule.get(d.ruleId);
    if (list) list.push(d);
    else doneByRule.set(d.ruleId, [d]);
  }
  const byService = new Map<string, number>();
  let withOverdue = 0;
  for (const f of faultsIn) {
    const rig = rigOf.get(f.rigId);
    if (!rig) continue;
    const names = overdueAt(
      input.rules.filter((r) => r.rigId === f.rigId),
      doneByRule,
      f.at,
      f.hours,
      rig.hasHourMeter,
      zone,
      dayIn,
    );
    if (names.length) withOverdue++;
    for (const n of names) byService.set(n, (byService.get(n) ?? 0) + 1);
  }

  // The same rig-days split by whether a service was overdue at the day's last reading.
  const lastReading = new Map<string, Reading>();
  for (const r of input.readings) {
    const key = `${r.rigId}:${dayIn(r.at)}`;
    if (!lastReading.has(key) || lastReading.get(key)!.at < r.at) lastReading.set(key, r);
  }
  const overdueSums = { with: { days: 0, hours: 0, faults: 0 }, without: { days: 0, hours: 0, faults: 0 } };
  for (const m of measured) {
    const rigId = Number(m.key.slice(0, m.key.indexOf(":")));
    const r = lastReading.get(m.key)!;
    const names = overdueAt(
      input.rules.filter((x) => x.rigId === rigId),
      doneByRule,
      r.at,
      r.hours,
      true,
      zone,
      dayIn,
    );
    const g = names.length ? overdueSums.with : overdueSums.without;
    g.days++;
    g.hours += m.run;
    g.faults += m.faults;
  }

  const shown = input.weeksShown ?? 8;
  const lastWeek = Date.parse(`${weekOf(input.today)}T00:00:00Z`);
  const weeks = Array.from({ length: shown }, (_, i) => new Date(lastWeek - i * 7 * 86_400_000).toISOString().slice(0, 10));
  // Cards and fault days by rig and week, gathered once (a board reads thousands of cards).
  const weekly = new Map<string, { days: Set<string>; preStartDays: Set<string>; otherCards: number }>();
  const cell = (rigId: number, day: string) => {
    const key = `${rigId}:${weekOf(day)}`;
    let c = weekly.get(key);
    if (!c) weekly.set(key, (c = { days: new Set(), preStartDays: new Set(), otherCards: 0 }));
    return c;
  };
  for (const c of input.cards) {
    const day = dayIn(c.at);
    const w = cell(c.rigId, day);
    w.days.add(day);
    if (c.complete && c.slug === PRE_START) w.preStartDays.add(day);
    else if (c.complete) w.otherCards++;
  }
  for (const f of input.faults) {
    const day = dayIn(f.at);
    cell(f.rigId, day).days.add(day);
  }
  const cardWeeks = input.rigs.map((rig) => ({
    rigCode: rig.code,
    cells: weeks.map((week) => {
      const w = weekly.get(`${rig.id}:${week}`);
      return { week, workedDays: w?.days.size ?? 0, preStartDays: w?.preStartDays.size ?? 0, otherCards: w?.otherCards ?? 0 };
    }),
  }));

  return {
    withPreStart: rateGroup(sums.with.days, sums.with.hours, sums.with.faults, confidence),
    withoutPreStart: rateGroup(sums.without.days, sums.without.hours, sums.without.faults, confidence),
    unmeasuredDays: unmeasured,
    withOverdue: rateGroup(overdueSums.with.days, overdueSums.with.hours, overdueSums.with.faults, confidence),
    withoutOverdue: rateGroup(overdueSums.without.days, overdueSums.without.hours, overdueSums.without.faults, confidence),
    faults: faultsIn.length,
    faultsWithOverdue: withOverdue,
    overdueByService: [...byService].map(([name, faults]) => ({ name, faults })).sort((a, b) => b.faults - a.faults || a.name.localeCompare(b.name)),
    weeks,
    cardWeeks,
  };
}
