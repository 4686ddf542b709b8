import type { BoardAggregates } from "./board";

/**
 * SQL sums the board's rollups into two small grouped results — per rig and week, and per
 * person, guide and cause — and these fold them into the board's aggregates, so one query
 * serves several tables instead of one query each. The rows number in the hundreds.
 */

export interface RigWeekRow {
  rigId: number;
  /** Monday of the week, YYYY-MM-DD. */
  week: string;
  cases: number;
  fixed: number;
  handoff: number;
  abandoned: number;
  closed: number;
  repairSeconds: number;
  minHours: number | null;
  maxHours: number | null;
}

export interface MixRow {
  personId: number;
  /** Null when the person has since been removed. */
  personName: string | null;
  guideTitle: string;
  cause: string | null;
  cases: number;
  handoffs: number;
  repairSeconds: number;
}

export function foldRigWeeks(rows: RigWeekRow[], rigs: { id: number; code: string; hasHourMeter: boolean }[]): Pick<BoardAggregates, "rigs" | "weeks"> {
  const weeks = new Map<string, { weekStart: string; cases: number; handoffs: number }>();
  const byRig = new Map<number, RigWeekRow[]>();
  for (const r of rows) {
    const w = weeks.get(r.week) ?? { weekStart: r.week, cases: 0, handoffs: 0 };
    w.cases += r.cases;
    w.handoffs += r.handoff;
    weeks.set(r.week, w);
    const mine = byRig.get(r.rigId) ?? [];
    mine.push(r);
    byRig.set(r.rigId, mine);
  }
  return {
    rigs: rigs.map((rig) => {
      const mine = byRig.get(rig.id) ?? [];
      const sum = (key: "cases" | "fixed" | "handoff" | "abandoned" | "closed" | "repairSeconds") => mine.reduce((s, r) => s + r[key], 0);
      const lows = mine.flatMap((r) => (r.minHours === null ? [] : [r.minHours]));
      const highs = mine.flatMap((r) => (r.maxHours === null ? [] : [r.maxHours]));
      return {
        rigCode: rig.code,
        cases: sum("cases"),
        fixed: sum("fixed"),
        handoff: sum("handoff"),
        abandoned: sum("abandoned"),
        operatingHours: rig.hasHourMeter && lows.length ? Math.max(...highs) - Math.min(...lows) : null,
        repairHours: sum("repairSeconds") / 3600,
        closedCases: sum("closed"),
      };
    }),
    weeks: [...weeks.values()].sort((a, b) => a.weekStart.localeCompare(b.weekStart)),
  };
}

/** The five commonest, as the crew view shows them. */
const top = <T extends { count: number }>(counts: Map<string, number>, make: (key: string, count: number) => T): T[] =>
  [...counts]
    .map(([key, count]) => make(key, count))
    .sort((a, b) => b.count - a.count)
    .slice(0, 5);

const add = (m: Map<string, number>, key: string, n: number) => m.set(key, (m.get(key) ?? 0) + n);

export function foldMix(rows: MixRow[]): Pick<BoardAggregates, "causes" | "people"> {
  const causes = new Map<string, { cause: string; count: number; suspected: number; downtimeHours: number }>();
  const people = new Map<number, { name: string; cases: number; handoffs: number; guides: Map<string, number>; causes: Map<string, number> }>();
  for (const r of rows) {
    if (r.cause) {
      const c = causes.get(r.cause) ?? { cause: r.cause, count: 0, suspected: 0, downtimeHours: 0 };
      c.count += r.cases;
      // A hand-off's cause is what the crew suspected; a fixed case's was found.
      c.suspected += r.handoffs;
      c.downtimeHours += r.repairSeconds / 3600;
      causes.set(r.cause, c);
    }
    if (r.personName === null) continue;
    const p = people.get(r.personId) ?? { name: r.personName, cases: 0, handoffs: 0, guides: new Map(), causes: new Map() };
    p.cases += r.cases;
    p.handoffs += r.handoffs;
    add(p.guides, r.guideTitle, r.cases);
    if (r.cause) add(p.causes, r.cause, r.cases);
    people.set(r.personId, p);
  }
  return {
    causes: [...causes.values()],
    people: [...people.values()]
      .sort((a, b) => b.cases - a.cases || a.name.localeCompare(b.name))
      .map((p) => ({
        name: p.name,
        cases: p.cases,
        handoffs: p.handoffs,
        guides: top(p.guides, (title, count) => ({ title, count })),
        causes: top(p.causes, (cause, count) => ({ cause, count })),
      })),
  };
}
