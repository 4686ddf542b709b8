import { describe, expect, it } from "vitest";
import { rigInputSchema } from "~/lib/rigs/schema";

const good = {
  code: " cf-21 ",
  name: "Test rig",
  mount: "truck",
  tankGal: 1500,
  pumpKind: "Centrifugal",
  hasHourMeter: true,
  engineHours: 12.5,
  hoseLengthFt: 300,
  hoseDiameterIn: 1.5,
  yardElevationFt: 420,
  nozzleTips: [{ name: "Wide fan", reachFt: 50, widthFt: 15 }],
};

describe("rig input", () => {
  it("accepts a plausible rig and normalises the unit code", () => {
    const rig = rigInputSchema.parse(good);
    expect(rig.code).toBe("CF-21");
  });

  it.each([
    ["code", "CF 07!", /letters and digits/],
    ["tankGal", 50, /under 100 gal/],
    ["tankGal", 1500.5, /whole number/],
    ["engineHours", -1, /negative/],
    ["hoseLengthFt", 10_000, /2,000 ft/],
    ["hoseDiameterIn", 0.5, /¾ in/],
    ["mount", "boat", /truck or trailer/],
    ["name", "", /Name the rig/],
  ])("names %s when it is %j", (field, value, message) => {
    const result = rigInputSchema.safeParse({ ...good, [field]: value });
    expect(result.success).toBe(false);
    const issue = result.error!.issues.find((i) => i.path[0] === field);
    expect(issue?.message).toMatch(message);
  });

  it("checks each nozzle tip", () => {
    const result = rigInputSchema.safeParse({ ...good, nozzleTips: [{ name: "x", reachFt: 900, widthFt: 2 }] });
    expect(result.success).toBe(false);
    expect(result.error!.issues[0].path).toEqual(["nozzleTips", 0, "reachFt"]);
  });
});
