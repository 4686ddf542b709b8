import { z } from "zod";
import { DEFAULT_LOAD_RULES, LOAD_STEP_LABELS, type LoadRules, type LoadStep, type MaterialKind } from "./load-rules";
import { kindOf, loadSheetInput, planLoads, sizing, type LoadSheet } from "./load-sheet";
import { fmt, WATER_LB_PER_GAL } from "./units";
import { num, parseInput } from "./validate";

export const loadCardInput = loadSheetInput.extend({
  /** How wide the strip being sprayed is, to show each load as a length of it. */
  slopeWidthFt: num("Slope width", 0, 2000, { minInclusive: false }).optional(),
  /** What the truck or trailer is rated to carry; null when not recorded. */
  carrierRatingLb: num("Carrier rating", 500, 80_000).nullable().optional(),
  paceFt: num("Pace length", 1, 6).optional(),
});
export type LoadCardInput = z.input<typeof loadCardInput>;

/** How much of one material goes into one load: whole bags, or pounds weighed out. */
export interface CardMaterial {
  name: string;
  kind: MaterialKind;
  /** What actually goes in. */
  lb: number;
  /** What the area of this load needs at the spec rate. */
  neededLb: number;
  bags: number | null;
  bagLb: number | null;
  /** True when the amount is weighed out rather than counted in whole bags. */
  weighed: boolean;
}

export interface CardLoad {
  number: number;
  areaSqFt: number;
  acres: number;
  /** Water to fill to (rounded up to 10 gal, never over the tank). */
  fillToGal: number;
  /** Water raised to the fiber-start mark so fiber goes in over covered paddles. */
  raisedForFiber: boolean;
  fiberStartGal: number | null;
  fiberDoneGal: number | null;
  materials: CardMaterial[];
  weightLb: number;
  /** Over the carrier rating by this much, or null. */
  overRatingLb: number | null;
  /** With the same mix, the most water that keeps this load within the rating. */
  withinRatingGal: number | null;
  stripFt: number | null;
  stripPaces: number | null;
}

export interface CardStep {
  step: LoadStep;
  label: string;
  text: string;
  reason: string;
}

export const BAG_RULE =
  "Bags are whole. Each load gets the bags that keep the running total nearest what the area needs so far: what one load is over, the next is under, and the last load rounds up so the job is never short. Fiber is rounded down on full loads so it stays under the ceiling, and the load is sized to those bags. A material needing less than one bag a load is weighed out from an open bag.";

const GAL_STEP = 10;

/**
 * The load sheet as the crew uses it at the tank: for each load the water marks for fiber, whole
 * bags, the loaded weight against the carrier rating and the strip it covers. Loads with the same
 * recipe are grouped so the card stays short.
 */
export function loadCard(input: unknown, rules: LoadRules = DEFAULT_LOAD_RULES) {
  const i = parseInput(loadCardInput, input);
  const { fiberRate, waterPerAcre } = sizing(i);
  const notes: string[] = [];

  // With one bagged fiber, a full load takes the whole bags that fit under the ceiling, and the load is sized to them.
  let acresPerFullLoad = i.tankGal / waterPerAcre;
  const fibers = i.materials.filter((m) => kindOf(m) === "fiber");
  const sizer = fibers.length === 1 && fibers[0].bagLb ? fibers[0] : null;
  if (sizer?.bagLb) {
    const wholeBags = Math.floor((sizer.lbPerAcre * acresPerFullLoad) / sizer.bagLb + 1e-9);
    if (wholeBags >= 1) acresPerFullLoad = (wholeBags * sizer.bagLb) / sizer.lbPerAcre;
    else {
      notes.push(
        `One ${fmt(sizer.bagLb)} lb bag of ${sizer.name} needs ${fmt((sizer.bagLb * 100) / i.maxFiberLbPer100Gal)} gal of water at ${fmt(i.maxFiberLbPer100Gal)} lb per 100 gal, more than this tank's ${fmt(i.tankGal)} gal. Weigh out part bags.`,
      );
    }
  }
  const sheet = planLoads(i, acresPerFullLoad, fiberRate, waterPerAcre);

  const amounts = i.materials.map((m) =>
    allot(
      sheet.perLoad.map((l) => m.lbPerAcre * l.acres),
      m.bagLb ?? null,
    ),
  );
  const startGal = (i.tankGal * rules.fiberStartPercent) / 100;
  const doneGal = (i.tankGal * rules.fiberDonePercent) / 100;

  const loads: CardLoad[] = sheet.perLoad.map((l, n) => {
    const materials: CardMaterial[] = i.materials.map((m, k) => ({
      name: m.name,
      kind: kindOf(m),
      neededLb: m.lbPerAcre * l.acres,
      bagLb: m.bagLb ?? null,
      ...amounts[k][n],
    }));
    const fiberLb = materials.filter((m) => m.kind === "fiber").reduce((s, m) => s + m.lb, 0);
    const needed = Math.max(l.acres * waterPerAcre, (fiberLb * 100) / i.maxFiberLbPer100Gal);
    const water = Math.min(i.tankGal, fiberLb > 0 ? Math.max(needed, startGal) : needed);
    const fillToGal = Math.min(i.tankGal, Math.ceil(water / GAL_STEP - 1e-9) * GAL_STEP);
    const weightLb = fillToGal * WATER_LB_PER_GAL + materials.reduce((s, m) => s + m.lb, 0);
    const rating = i.carrierRatingLb ?? null;
    const over = rating !== null && weightLb > rating ? weightLb - rating : null;
    return {
      number: l.number,
      areaSqFt: l.areaSqFt,
      acres: l.acres,
      fillToGal,
      raisedForFiber: fiberLb > 0 && startGal > needed,
      fiberStartGal: fiberLb > 0 ? startGal : null,
      fiberDoneGal: fiberLb > 0 ? Math.min(doneGal, fillToGal) : null,
      materials,
      weightLb,
      overRatingLb: over,
      withinRatingGal: over !== null ? Math.floor((fillToGal * rating!) / weightLb / GAL_STEP) * GAL_STEP : null,
      stripFt: i.slopeWidthFt ? l.areaSqFt / i.slopeWidthFt : null,
      stripPaces: i.slopeWidthFt ? l.areaSqFt / i.slopeWidthFt / (i.paceFt ?? rules.paceFt) : null,
    };
  });

  const totals = i.materials.map((m, k) => ({
    name: m.name,
    lb: loads.reduce((s, l) => s + l.materials[k].lb, 0),
    bags: amounts[k].every((a) => a.bags !== null) ? amounts[k].reduce((s, a) => s + (a.bags ?? 0), 0) : null,
  }));
  const overLoads = loads.filter((l) => l.overRatingLb !== null);
  if (overLoads.length) {
    notes.push(
      `Over the carrier rating on ${overLoads.length === loads.length ? "every load" : `load ${overLoads.map((l) => l.number).join(", ")}`}: plan smaller loads (a tank size of ${fmt(Math.min(...overLoads.map((l) => l.withinRatingGal!)))} gal keeps this mix within it).`,
    );
  }
  return { sheet: sheet satisfies LoadSheet, loads, groups: groupLoads(loads), totals, notes, rules, waterLbPerGal: WATER_LB_PER_GAL, bagRule: BAG_RULE };
}
export type LoadCard = ReturnType<typeof loadCard>;

/**
 * Whole bags for one material across the loads: each load gets the bags that bring the running
 * total nearest the running need, and the last load rounds up. A load left with none, or a
 * material that needs under one bag a load, is weighed out instead.
 */
export function allot(neededLb: number[], bagLb: number | null): { lb: number; bags: number | null; weighed: boolean }[] {
  const weighed = (lb: number) => ({ lb, bags: null, weighed: bagLb !== null });
  if (!bagLb || Math.max(...neededLb) / bagLb < 1 - 1e-9) return neededLb.map(weighed);
  let running = 0;
  let given = 0;
  return neededLb.map((lb, n) => {
    running += lb / bagLb;
    const upTo = n === neededLb.length - 1 ? Math.ceil(running - 1e-9) : Math.round(running);
    const bags = upTo - given;
    given = upTo;
    return bags === 0 && lb > 0 ? weighed(lb) : { lb: bags * bagLb, bags, weighed: false };
  });
}

/** Loads that take the same water and the same bags, so the card lists each recipe once. */
export function groupLoads(loads: CardLoad[]): { numbers: number[]; load: CardLoad }[] {
  const groups = new Map<string, { numbers: number[]; load: CardLoad }>();
  for (const l of loads) {
    const key = JSON.stringify([l.fillToGal, Math.round(l.areaSqFt / 10), l.materials.map((m) => (m.bags !== null ? `${m.bags}b` : Math.round(m.lb)))]);
    const g = groups.get(key);
    if (g) g.numbers.push(l.number);
    else groups.set(key, { numbers: [l.number], load: l });
  }
  return [...groups.values()];
}

/** "1–3, 5" for a list of load numbers. */
export function loadNumbers(numbers: number[]): string {
  const parts: string[] = [];
  for (let k = 0; k < numbers.length;) {
    let end = k;
    while (end + 1 < numbers.length && numbers[end + 1] === numbers[end] + 1) end++;
    parts.push(end > k ? `${numbers[k]}–${numbers[end]}` : String(numbers[k]));
    k = end + 1;
  }
  return parts.join(", ");
}

/** How much of a material, as the crew counts it. */
export function amountText(m: CardMaterial): string {
  if (m.bags !== null) return `${m.bags} bag${m.bags === 1 ? "" : "s"} (${fmt(m.lb)} lb)`;
  return m.weighed ? `${fmt(m.lb)} lb, weighed from an open bag` : `${fmt(m.lb)} lb`;
}

/** One load's loading order with the amounts filled in, in the company's order, with its reasons. */
export function loadSteps(load: CardLoad, rules: LoadRules, seedLimitMinutes = rules.seedLimitMinutes): CardStep[] {
  const steps: CardStep[] = [];
  for (const { step, reason } of rules.order) {
    const label = LOAD_STEP_LABELS[step];
    if (step === "water") {
      const text =
        load.fiberStartGal !== null
          ? `Water to ${fmt(load.fiberStartGal)} gal (the ${rules.fiberStartPercent} % mark), agitator running.`
          : `Water to ${fmt(load.fillToGal)} gal, agitator running.`;
      steps.push({ step, label, text, reason });
      continue;
    }
    const these = load.materials.filter((m) => m.kind === step);
    if (!these.length) continue;
    let text = these.map((m) => `${m.name}: ${amountText(m)}.`).join(" ");
    if (step === "fiber" && load.fiberStartGal !== null && load.fiberDoneGal !== null) {
      text += ` From ${fmt(load.fiberStartGal)} gal; all of it in by ${fmt(load.fiberDoneGal)} gal. Then water to ${fmt(load.fillToGal)} gal.`;
    }
    if (step === "seed") text += ` Start the seed clock: spray within ${seedLimitMinutes} minutes.`;
    steps.push({ step, label, text, reason });
  }
  return steps;
}

/** Minutes and seconds left on the seed clock (negative once over). */
export function seedClock(startedAtMs: number, nowMs: number, limitMinutes: number) {
  const leftMs = startedAtMs + limitMinutes * 60_000 - nowMs;
  const abs = Math.abs(leftMs);
  const text = `${Math.floor(abs / 60_000)}:${String(Math.floor((abs % 60_000) / 1000)).padStart(2, "0")}`;
  return { leftMs, over: leftMs < 0, text };
}
