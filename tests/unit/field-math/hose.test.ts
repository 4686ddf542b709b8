import { describe, expect, it } from "vitest";
import { hoseFriction, reachByHoseLength, reachFt, SLURRY_NOTE, tipFlowGpm } from "~/lib/field-math/hose";
import { FieldMathInputError } from "~/lib/field-math/validate";

const fields = (fn: () => unknown) => {
  try {
    fn();
  } catch (e) {
    if (e instanceof FieldMathInputError) return e.fields;
    throw e;
  }
  throw new Error("expected a FieldMathInputError");
};

describe("hose friction loss FL = C·Q²·L", () => {
  it.each([
    // City of Rohnert Park fire training, "3-8 Calculating Friction Loss in Hose Lays", worked examples:
    [200, 100, 2.5, 8],
    [100, 300, 2.5, 6],
    [200, 400, 2.5, 32],
    [150, 150, 1.75, 33.75],
  ])("%i gpm through %i ft of %s in hose loses %s psi (Rohnert Park)", (flowGpm, lengthFt, diameterIn, psi) => {
    const r = hoseFriction({ flowGpm, lengthFt, diameterIn, table: "rohnert-park" });
    expect(r.frictionLossPsi).toBeCloseTo(psi, 10);
    expect(r.source).toMatch(/Rohnert Park/);
    expect(r.note).toBe(SLURRY_NOTE);
  });

  it("uses the IFSTA table when asked, and names it (1¾ in C = 15.5; 2 in C = 8)", () => {
    expect(hoseFriction({ flowGpm: 150, lengthFt: 150, diameterIn: 1.75, table: "ifsta" }).frictionLossPsi).toBeCloseTo(15.5 * 1.5 * 1.5 * 1.5, 10);
    const two = hoseFriction({ flowGpm: 100, lengthFt: 100, diameterIn: 2 });
    expect(two).toMatchObject({ table: "ifsta", coefficient: 8, frictionLossPsi: 8 });
  });

  it("adds 0.434 psi per foot of rise", () => {
    expect(hoseFriction({ flowGpm: 100, lengthFt: 100, diameterIn: 1.5, elevationFt: 10 }).totalLossPsi).toBeCloseTo(24 + 4.34, 10);
  });

  it("never loses less with more hose (property)", () => {
    let last = 0;
    for (let l = 50; l <= 2000; l += 50) {
      const fl = hoseFriction({ flowGpm: 120, lengthFt: l, diameterIn: 1.5 }).frictionLossPsi;
      expect(fl).toBeGreaterThan(last);
      last = fl;
    }
  });

  it("names each bad field", () => {
    expect(fields(() => hoseFriction({ flowGpm: -1, lengthFt: 10_000, diameterIn: "x" }))).toEqual({
      flowGpm: "Flow must be more than 0",
      lengthFt: "Hose length over 2,000 is not plausible",
      diameterIn: "Hose diameter must be a number",
    });
    // A size no table lists is worked by the rigid-pipe formula (below), not refused; a table asked for by name still is.
    expect(fields(() => hoseFriction({ flowGpm: 100, lengthFt: 100, diameterIn: 1.25, table: "rohnert-park" })).diameterIn).toMatch(
      /no published coefficient for 1.25 in/,
    );
    expect(fields(() => hoseFriction({ flowGpm: 100, lengthFt: 100, diameterIn: 1.5, table: "ifsta" })).diameterIn).toMatch(/IFSTA.*1.75, 2 in/);
    expect(fields(() => hoseFriction({ flowGpm: Infinity, lengthFt: 100, diameterIn: 1.5 })).flowGpm).toMatch(/number/);
    expect(fields(() => hoseFriction({ flowGpm: 100, lengthFt: 100, diameterIn: 1.5, table: "other" })).table).toMatch(/rohnert-park, ifsta/);
  });
});

describe("nozzle", () => {
  it("smooth-bore flow gpm = 29.7·d²·√NP: 1 in tip at 50 psi → 210 gpm (IFSTA via fire training)", () => {
    expect(Math.round(tipFlowGpm(1, 50))).toBe(210);
  });

  it("reach S = NP/2 + 26 (+5 ft per ⅛ in above ¾ in): 1 in tip at 50 psi → 61 ft (Fire Engineering, Aug 1960)", () => {
    expect(reachFt(1, 50)).toBe(61);
    expect(reachFt(0.75, 60)).toBe(56);
    expect(reachFt(1, 30)).toBeNull(); // the rule holds above 30 psi only
  });
});

describe("reach by hose length", () => {
  it("balances pump pressure = friction + nozzle pressure at every length, and reach falls as hose grows", () => {
    const { rows } = reachByHoseLength({ pumpPsi: 100, tipIn: 0.75, diameterIn: 1.5, maxLengthFt: 400 });
    expect(rows.map((r) => r.lengthFt)).toEqual([50, 100, 150, 200, 250, 300, 350, 400]);
    for (const r of rows) {
      const fl = hoseFriction({ flowGpm: r.flowGpm, lengthFt: r.lengthFt, diameterIn: 1.5 }).frictionLossPsi;
      expect(fl + r.nozzlePsi).toBeCloseTo(100, 8);
      expect(r.flowGpm).toBeCloseTo(tipFlowGpm(0.75, r.nozzlePsi), 8);
    }
    for (let k = 1; k < rows.length; k++) expect(rows[k].nozzlePsi).toBeLessThan(rows[k - 1].nozzlePsi);
  });

  it("says when the pump cannot lift the water that high", () => {
    expect(fields(() => reachByHoseLength({ pumpPsi: 40, tipIn: 1, diameterIn: 1.5, elevationFt: 100 })).pumpPsi).toMatch(/cannot lift/);
  });
});

describe("Hazen-Williams beside the tables", () => {
  // hf = 0.2083·(100/C)^1.852·q^1.852/d^4.8655 ft per 100 ft (references.md, "Hose and nozzle hydraulics"); worked by hand:
  // 100 gpm, 1.5 in, C 140: 0.2083 × 0.5363 × 5,058.2 ÷ 7.1905 = 78.58 ft per 100 ft → × 0.434 psi/ft = 34.10 psi.
  it("gives 34.1 psi for 100 gpm through 100 ft of 1½ in hose at C = 140 (hand-worked from the formula)", () => {
    const r = hoseFriction({ flowGpm: 100, lengthFt: 100, diameterIn: 1.5, table: "hazen-williams", hazenC: 140 });
    expect(r.frictionLossPsi).toBeCloseTo(34.1, 1);
    expect(r.source).toMatch(/Hazen-Williams/);
  });

  it("gives a 1¼ in hose a figure with its source instead of an error (60 gpm × 200 ft → 64.3 psi, hand-worked)", () => {
    const r = hoseFriction({ flowGpm: 60, lengthFt: 200, diameterIn: 1.25 });
    expect(r.table).toBe("hazen-williams");
    expect(r.frictionLossPsi).toBeCloseTo(64.3, 1);
    expect(r.source).toMatch(/no hose table lists 1.25 in/);
    expect(r.note).toMatch(/Slurry loses more pressure than water/);
  });

  it("loses more with a rougher hose (lower C) and scales with length", () => {
    const smooth = hoseFriction({ flowGpm: 100, lengthFt: 100, diameterIn: 1.5, table: "hazen-williams", hazenC: 140 }).frictionLossPsi;
    const rough = hoseFriction({ flowGpm: 100, lengthFt: 100, diameterIn: 1.5, table: "hazen-williams", hazenC: 100 }).frictionLossPsi;
    const double = hoseFriction({ flowGpm: 100, lengthFt: 200, diameterIn: 1.5, table: "hazen-williams", hazenC: 140 }).frictionLossPsi;
    expect(rough).toBeGreaterThan(smooth);
    expect(double).toBeCloseTo(2 * smooth, 10);
  });

  it("settles reach rows for the formula too: friction at the row's flow plus nozzle pressure is the pump's", () => {
    const { rows } = reachByHoseLength({ pumpPsi: 100, tipIn: 0.75, diameterIn: 1.25, maxLengthFt: 200 });
    for (const r of rows) {
      const fl = hoseFriction({ flowGpm: r.flowGpm, lengthFt: r.lengthFt, diameterIn: 1.25 }).frictionLossPsi;
      expect(fl + r.nozzlePsi).toBeCloseTo(100, 6);
    }
  });
});
