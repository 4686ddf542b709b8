import { describe, expect, it } from "vitest";
import { appliedRate } from "~/lib/field-math/applied-rate";
import { allot, fiberWhen, loadCard, loadNumbers, loadSteps } from "~/lib/field-math/load-card";
import { seedClock } from "~/lib/field-math/seed-clock";
import { DEFAULT_LOAD_RULES, loadRulesOf, loadRulesSchema } from "~/lib/field-math/load-rules";
import { WATER_LB_PER_GAL } from "~/lib/field-math/units";
import { FieldMathInputError } from "~/lib/field-math/validate";

const fiber = (lbPerAcre: number, bagLb = 50) => ({ name: "Wood fiber", lbPerAcre, kind: "fiber" as const, bagLb });
// WSDOE BMP C120/C121 rates: mulch 1,500 lb/ac, seed mix 120 lb/ac, fertilizer 10-4-6 90 lb/ac.
const wsdoe = [
  fiber(1500),
  { name: "Seed mix", lbPerAcre: 120, kind: "seed" as const, bagLb: 50 },
  { name: "Fertilizer 10-4-6", lbPerAcre: 90, kind: "fertilizer" as const, bagLb: 50 },
];

describe("water weight", () => {
  it("is 8.337 lb per US gal near 60 °F (CRC Handbook: 999.0 kg/m³ at 15.6 °C; NIST exact gallon and pound)", () => {
    expect(WATER_LB_PER_GAL).toBeCloseTo(8.337, 3);
  });
});

describe("load card", () => {
  // Worked by hand: 50 lb fiber per 100 gal (common practice ceiling) → 3,000 gal of water per acre at
  // 1,500 lb/ac; a 1,500 gal tank covers 0.5 ac = 21,780 ft² (43,560 ft² per acre, NIST Handbook 44).
  const card = loadCard({
    areaSqFt: 2 * 43_560,
    tankGal: 1500,
    maxFiberLbPer100Gal: 50,
    materials: wsdoe,
    slopeWidthFt: 60,
    carrierRatingLb: 12_000,
    paceFt: 2.5,
  });

  it("gives the fiber marks from the company's half and three-quarter rules", () => {
    expect(card.loads).toHaveLength(4);
    for (const l of card.loads) {
      expect(l.fillToGal).toBe(1500);
      expect(l.fiberStartGal).toBe(750);
      expect(l.fiberDoneGal).toBe(1125);
      expect(l.acres).toBeCloseTo(0.5, 10);
    }
  });

  it("counts whole bags and weighs the rest: seed 60 lb a load → 1 bag + 10 lb, on every load", () => {
    expect(card.loads.map((l) => l.materials[0].bags)).toEqual([15, 15, 15, 15]);
    expect(card.loads.map((l) => [l.materials[1].bags, l.materials[1].weighLb])).toEqual(Array(4).fill([1, 10]));
    // 240 lb of seed in 50 lb bags: bring 5 (4.8 rounded up).
    expect(card.totals[1]).toEqual({ name: "Seed mix", lb: 240, bringBags: 5 });
    // 45 lb of fertilizer a load is under one 50 lb bag and 5 lb short of it (over a tenth): weighed out.
    expect(card.loads.map((l) => [l.materials[2].lb, l.materials[2].bags, l.materials[2].weighLb])).toEqual(Array(4).fill([45, 0, 45]));
    expect(card.waterGal).toBe(6000);
  });

  it("weighs the load against the carrier rating: water at 8.337 lb/gal plus materials", () => {
    const l = card.loads[0];
    expect(l.weightLb).toBeCloseTo(1500 * 8.3371 + 750 + 60 + 45, 0);
    expect(l.overRatingLb).toBeCloseTo(l.weightLb - 12_000, 6);
    expect(l.withinRatingGal).toBe(1340); // 1,500 × 12,000 ÷ 13,361 = 1,347 → 1,340 gal in steps of 10
    expect(card.notes.join(" ")).toMatch(/Over the carrier rating on every load: plan loads of at most 1,340 gal/);
    const light = loadCard({ areaSqFt: 43_560, tankGal: 1500, materials: wsdoe, carrierRatingLb: 20_000 });
    expect(light.loads.every((x) => x.overRatingLb === null)).toBe(true);
  });

  it("shows each load as a strip of the slope: 21,780 ft² ÷ 60 ft = 363 ft = 145 paces of 2.5 ft", () => {
    expect(card.loads[0].stripFt).toBeCloseTo(363, 8);
    expect(card.loads[0].stripPaces).toBeCloseTo(145.2, 8);
  });

  it("sizes full loads to whole bags of fiber under the ceiling, and raises a small last load to the fiber mark", () => {
    // 1,250 gal would carry 625 lb = 12.5 bags; 12 bags = 600 lb need 1,200 gal and cover 0.4 ac.
    const c = loadCard({ areaSqFt: 43_560, tankGal: 1250, materials: [fiber(1500)] });
    expect(c.loads.map((l) => l.materials[0].bags)).toEqual([12, 12, 6]);
    expect(c.loads.map((l) => l.fillToGal)).toEqual([1200, 1200, 630]);
    expect(c.loads[2].raisedForFiber).toBe(true); // 600 gal needed, fiber starts at 625 gal
    expect(c.loads[2].fiberDoneGal).toBe(630);
    // The water hauled is what the loads are filled to, the raised last load included.
    expect(c.waterGal).toBe(1200 + 1200 + 630);
    for (const l of c.loads) expect((l.materials[0].lb / l.fillToGal) * 100).toBeLessThanOrEqual(50);
  });

  it("says so when one bag of fiber is more than the tank can carry, and weighs part bags", () => {
    const c = loadCard({ areaSqFt: 2000, tankGal: 100, maxFiberLbPer100Gal: 40, materials: [fiber(1500)] });
    expect(c.notes[0]).toMatch(/One 50 lb bag of Wood fiber needs 125 gal.*100 gal\. Weigh out part bags/);
    expect(c.loads[0].materials[0]).toMatchObject({ bags: 0 });
    expect(c.loads[0].materials[0].weighLb).toBeCloseTo(40, 8);
    expect(c.loads[0].materials[0].lb).toBeCloseTo(40, 8);
  });

  it("never leaves a load short: bags over the loads are at least what the area needs (property)", () => {
    for (let area = 5_000; area < 300_000; area += 9_973) {
      const c = loadCard({ areaSqFt: area, tankGal: 1100, materials: wsdoe });
      c.sheet.totals.materials.forEach((m, k) => expect(c.totals[k].lb).toBeGreaterThanOrEqual(m.lb - 1e-6));
      for (const l of c.loads) for (const m of l.materials) expect(m.lb).toBeGreaterThan(0);
    }
  });

  it("lists the steps in the company's order with the amounts and reasons", () => {
    const steps = loadSteps(card.loads[2], DEFAULT_LOAD_RULES);
    expect(steps.map((s) => s.step)).toEqual(["water", "fiber", "fertilizer", "seed"]);
    expect(steps[0].text).toBe("Water to 750 gal (the 50 % mark), agitator running.");
    expect(steps[1].text).toBe("Wood fiber: 15 bags (750 lb). From 750 gal; all of it in by 1,125 gal. Then water to 1,500 gal.");
    expect(steps[2].text).toBe("Fertilizer 10-4-6: 45 lb from an open bag.");
    expect(steps[3].text).toBe("Seed mix: 1 bag + 10 lb from an open bag (60 lb). Start the seed clock: spray within 30 minutes.");
    expect(steps.every((s) => s.reason.length > 10)).toBe(true);
    const reordered = { ...DEFAULT_LOAD_RULES, order: [DEFAULT_LOAD_RULES.order[0], ...DEFAULT_LOAD_RULES.order.slice(1).reverse()] };
    expect(loadSteps(card.loads[2], reordered).map((s) => s.step)).toEqual(["water", "seed", "fertilizer", "fiber"]);
  });

  it("words the fiber marks without repeating one mark three times", () => {
    expect(fiberWhen(750, 1125, 1500)).toBe("From 750 gal; all of it in by 1,125 gal. Then water to 1,500 gal.");
    expect(fiberWhen(750, 900, 900)).toBe("From 750 gal; all of it in by 900 gal, where the water stops.");
    expect(fiberWhen(750, 750, 750)).toBe("All of it at 750 gal, with the water off: this load needs no more water.");
  });

  it("groups loads with the same recipe", () => {
    expect(card.groups.map((g) => loadNumbers(g.numbers))).toEqual(["1–4"]);
    const c = loadCard({ areaSqFt: 43_560, tankGal: 1250, materials: [fiber(1500)] });
    expect(c.groups.map((g) => loadNumbers(g.numbers))).toEqual(["1–2", "3"]);
    expect(loadNumbers([1, 2, 3, 5, 7, 8])).toBe("1–3, 5, 7–8");
  });

  it("names bad input", () => {
    expect(() => loadCard({ areaSqFt: 1000, tankGal: 500, materials: [fiber(1500)], slopeWidthFt: -3 })).toThrow(FieldMathInputError);
    expect(() => loadCard({ areaSqFt: 1000, tankGal: 500, materials: [fiber(1500)], slopeWidthFt: -3 })).toThrow(/Slope width must be more than 0/);
  });
});

describe("whole bags", () => {
  it("weighs what is over the whole bags, so every load gets its rate", () => {
    expect(allot([75, 75, 30], 50)).toEqual([
      { lb: 75, bags: 1, weighLb: 25 },
      { lb: 75, bags: 1, weighLb: 25 },
      { lb: 30, bags: 0, weighLb: 30 },
    ]);
    expect(allot([30, 30], null)).toEqual([
      { lb: 30, bags: null, weighLb: 30 },
      { lb: 30, bags: null, weighLb: 30 },
    ]);
  });
  it("carries a leftover under a tenth of the load to the next load; the last takes exactly what remains", () => {
    // 52 lb a load of 50 lb bags: 2 lb (under 5.2) waits, then 4 lb waits, the last load weighs the 6 lb.
    expect(allot([52, 52, 52], 50)).toEqual([
      { lb: 50, bags: 1, weighLb: 0 },
      { lb: 50, bags: 1, weighLb: 0 },
      { lb: 56, bags: 1, weighLb: 6 },
    ]);
  });
  it("fills a bag that is short by under a tenth, carrying the extra as a debt", () => {
    // 48 lb: a whole bag is 2 lb over (under 4.8); the next needs 46, again a bag, 4 lb over. Never short.
    expect(allot([48, 48], 50).map((a) => a.bags)).toEqual([1, 1]);
  });
});

describe("load rules", () => {
  it("refuses an order without water first, a repeated step, or marks the wrong way round", () => {
    const bad = loadRulesSchema.safeParse({
      ...DEFAULT_LOAD_RULES,
      fiberStartPercent: 80,
      fiberDonePercent: 70,
      order: [DEFAULT_LOAD_RULES.order[1], DEFAULT_LOAD_RULES.order[0], ...DEFAULT_LOAD_RULES.order.slice(2, 5), DEFAULT_LOAD_RULES.order[2]],
    });
    expect(bad.success).toBe(false);
    const messages = bad.error!.issues.map((i) => i.message);
    expect(messages).toContain("All fiber must be in at a higher level than where it starts.");
    expect(messages).toContain("Water comes first: nothing goes into an empty tank.");
    expect(messages).toContain("Each material kind appears once in the order.");
  });
  it("reads stored rules, falling back to the defaults", () => {
    expect(loadRulesOf(null)).toEqual(DEFAULT_LOAD_RULES);
    expect(loadRulesOf({ ...DEFAULT_LOAD_RULES, seedLimitMinutes: 20 }).seedLimitMinutes).toBe(20);
    expect(DEFAULT_LOAD_RULES.seedLimitMinutes).toBe(30); // USDA NRCS Wyoming fact sheet
  });
});

describe("seed clock", () => {
  it("counts down from the company's limit and says when it is over", () => {
    const t0 = Date.UTC(2026, 4, 1, 9, 0, 0);
    expect(seedClock(t0, t0 + 61_000, 30)).toMatchObject({ over: false, text: "28:59" });
    expect(seedClock(t0, t0 + 31 * 60_000 + 5_000, 30)).toMatchObject({ over: true, text: "1:05" });
  });
});

describe("applied rate", () => {
  it("lb/ac actually put down against the spec (43,560 ft² per acre; 1 lb/ac = 1.12085 kg/ha, NIST factors)", () => {
    // 3 loads of 15 bags × 50 lb = 2,250 lb of fiber over a measured 300 ft × 240 ft = 72,000 ft².
    const r = appliedRate({ areaSqFt: 72_000, materials: [{ name: "Wood fiber", lb: 2250, specLbPerAcre: 1500 }] });
    expect(r.acres).toBeCloseTo(1.652892562, 8);
    expect(r.materials[0].lbPerAcre).toBeCloseTo(1361.25, 8);
    expect(r.materials[0].differencePercent).toBeCloseTo(-9.25, 8);
    expect(r.materials[0].kgPerHa).toBeCloseTo(1361.25 * 1.12085, 0);
  });
  it("names bad input", () => {
    expect(() => appliedRate({ areaSqFt: 0, materials: [] })).toThrow(/Area sprayed must be more than 0.*add at least one material|add at least one material/);
  });
});
