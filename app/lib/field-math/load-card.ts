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

/** How much of one material goes into one load: whole bags, and pounds weighed from an open bag. */
export interface CardMaterial {
  name: string;
  kind: MaterialKind;
  /** What actually goes in. */
  lb: number;
  /** What the area of this load needs at the spec rate. */
  neededLb: number;
  /** Whole bags (null when the material has no bag size). */
  bags: number | null;
  bagLb: number | null;
  /** Pounds weighed out: from an open bag, or all of it for a material with no bag size. */
  weighLb: number;
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

/** Within this share of a load's need, a part bag is left for the next load (or a bag topped up) rather than weighed. */
export const BAG_TOLERANCE = 0.1;

export const BAG_RULE =
  "Bags: each load takes whole bags, and what is left over is weighed from an open bag. A leftover under a tenth of the load's need is carried to the next load instead (and a bag short by less than that is filled up to a whole one), so the rate stays within 10 % on every load and the job total comes out right; the last load takes exactly what remains. Full loads take the whole bags of fiber that stay under the ceiling, and each load is sized to them.";

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
  // A spec's water rate too low for its fiber: the ceiling wins, and the card says so.
  if (i.waterGalPerAcre && waterPerAcre > i.waterGalPerAcre)
    notes.push(
      `${fmt(i.waterGalPerAcre)} gal of water per acre would carry ${fmt((fiberRate * 100) / i.waterGalPerAcre)} lb of fiber per 100 gal, over the ${fmt(i.maxFiberLbPer100Gal)} lb ceiling: the loads use ${fmt(waterPerAcre)} gal per acre.`,
    );

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
    /** Bags to bring for the whole job: every pound counted, part bags rounded up. */
    bringBags: m.bagLb ? Math.ceil(loads.reduce((s, l) => s + l.materials[k].lb, 0) / m.bagLb - 1e-9) : null,
  }));
  const overLoads = loads.filter((l) => l.overRatingLb !== null);
  if (overLoads.length) {
    notes.push(
      `Over the carrier rating on ${overLoads.length === loads.length ? "every load" : `load ${overLoads.map((l) => l.number).join(", ")}`}: plan loads of at most ${fmt(Math.min(...overLoads.map((l) => l.withinRatingGal!)))} gal (set that as the tank size) to keep this mix within it.`,
    );
  }
  // The water the crew hauls: what each load is filled to, small loads raised to the fiber mark included.
  const waterGal = loads.reduce((s, l) => s + l.fillToGal, 0);
  return {
    sheet: sheet satisfies LoadSheet,
    loads,
    groups: groupLoads(loads),
    totals,
    waterGal,
    notes,
    rules,
    waterLbPerGal: WATER_LB_PER_GAL,
    bagRule: BAG_RULE,
  };
}
export type LoadCard = ReturnType<typeof loadCard>;

/**
 * Whole bags for one material across the loads, the rest weighed. A remainder under
 * `tolerance` of the load's need is carried to the next load (a bag short by under that is
 * filled up, the extra carried as a debt), so no load is off by more than that and the running
 * total stays right; the last load takes exactly what remains.
 */
export function allot(neededLb: number[], bagLb: number | null, tolerance = BAG_TOLERANCE): { lb: number; bags: number | null; weighLb: number }[] {
  if (!bagLb) return neededLb.map((lb) => ({ lb, bags: null, weighLb: lb }));
  let carry = 0;
  return neededLb.map((need, n) => {
    const target = Math.max(0, need + carry);
    const whole = Math.floor(target / bagLb + 1e-9);
    const rest = target - whole * bagLb;
    const last = n === neededLb.length - 1;
    const slack = tolerance * need;
    let bags = whole;
    let weighLb = 0;
    if (rest < 1e-6) carry = 0;
    else if (!last && rest <= slack && whole > 0) carry = rest;
    else if (bagLb - rest <= slack) {
      bags = whole + 1;
      carry = rest - bagLb;
    } else {
      weighLb = rest;
      carry = 0;
    }
    return { lb: bags * bagLb + weighLb, bags, weighLb };
  });
}

/** Loads that take the same water and the same bags, so the card lists each recipe once. */
export function groupLoads(loads: CardLoad[]): { numbers: number[]; load: CardLoad }[] {
  const groups = new Map<string, { numbers: number[]; load: CardLoad }>();
  for (const l of loads) {
    const key = JSON.stringify([l.fillToGal, Math.round(l.areaSqFt / 10), l.materials.map((m) => [m.bags, Math.round(m.weighLb * 10)])]);
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
  const lb = lbText(m.lb);
  if (m.bags === null) return lb;
  const bags = `${m.bags} bag${m.bags === 1 ? "" : "s"}`;
  if (m.bags === 0) return `${lb} from an open bag`;
  return m.weighLb > 0 ? `${bags} + ${lbText(m.weighLb)} from an open bag (${lb})` : `${bags} (${lb})`;
}

/** Pounds as a crew weighs them: tenths under 10 lb, whole pounds above. */
export const lbText = (lb: number) => `${fmt(lb, lb < 10 ? 1 : 0)} lb`;

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
    if (step === "fiber" && load.fiberStartGal !== null && load.fiberDoneGal !== null)
      text += ` ${fiberWhen(load.fiberStartGal, load.fiberDoneGal, load.fillToGal)}`;
    if (step === "seed") text += ` Start the seed clock: spray within ${seedLimitMinutes} minutes.`;
    steps.push({ step, label, text, reason });
  }
  return steps;
}

/** When the fiber goes in against the water marks, without saying the same mark three times. */
export function fiberWhen(startGal: number, doneGal: number, fillToGal: number): string {
  if (fillToGal > doneGal) return `From ${fmt(startGal)} gal; all of it in by ${fmt(doneGal)} gal. Then water to ${fmt(fillToGal)} gal.`;
  if (fillToGal > startGal) return `From ${fmt(startGal)} gal; all of it in by ${fmt(fillToGal)} gal, where the water stops.`;
  return `All of it at ${fmt(startGal)} gal, with the water off: this load needs no more water.`;
}
