import { RouterContextProvider } from "react-router";
import { beforeAll, describe, expect, it } from "vitest";
import { action } from "~/routes/api.field-math.$kind";
import { resetDatabase } from "../helpers/db";
import { requestAs, run } from "../helpers/requests";

const call = (kind: string, body: unknown, email: string | null = "dana@cedarflats.example") =>
  run(async () =>
    action({
      request: await requestAs(email, `/api/field-math/${kind}`, {
        method: "POST",
        body: typeof body === "string" ? body : JSON.stringify(body),
        headers: { "Content-Type": "application/json" },
      }),
      params: { kind },
      context: new RouterContextProvider(),
    } as never),
  );

beforeAll(() => resetDatabase());

describe("field-math API", () => {
  it("hose: Rohnert Park worked example 200 gpm × 400 ft of 2½ in → 32 psi, with the table named", async () => {
    const res = await call("hose", { flowGpm: 200, lengthFt: 400, diameterIn: 2.5 });
    expect(res.status).toBe(200);
    expect(res.data).toMatchObject({ frictionLossPsi: 32, table: "rohnert-park" });
    expect(res.data.source).toMatch(/Rohnert Park/);
  });

  it("suction: answers NPSH available and a verdict", async () => {
    const res = await call("suction", { altitudeFt: 420, waterTempF: 60, liftFt: 8, suctionLossFt: 2, npshRequiredFt: 10 });
    expect(res.status).toBe(200);
    expect(res.data.verdict).toBe("enough");
    expect(res.data.npshAvailableFt).toBeGreaterThan(20);
  });

  it("load: loads, per-load water, area and materials, totals", async () => {
    const res = await call("load", {
      areaSqFt: 43_560,
      tankGal: 1000,
      maxFiberLbPer100Gal: 50,
      materials: [{ name: "Wood fiber", lbPerAcre: 2000, fiber: true, bagLb: 50 }],
    });
    expect(res.data.loads).toBe(4);
    expect(res.data.perLoad[0]).toMatchObject({ waterGal: 1000, areaSqFt: 10_890, materials: [{ name: "Wood fiber", lb: 500, bags: 10 }] });
    expect(res.data.totals.materials[0].lb).toBe(2000);
  });

  it("torque: both units", async () => {
    expect((await call("torque", { value: 25, unit: "ft-lb" })).data.nm).toBeCloseTo(33.8954, 4);
  });

  it("names every bad field with 400", async () => {
    const res = await call("hose", { flowGpm: "lots", lengthFt: 10_000 });
    expect(res.status).toBe(400);
    expect(res.data.fields).toEqual({
      flowGpm: "Flow must be a number",
      lengthFt: "Hose length over 2,000 is not plausible",
      diameterIn: "Hose diameter must be a number",
    });
    expect((await call("load", "{not json")).status).toBe(400);
    expect((await call("suction", { altitudeFt: 0, waterTempF: 248, liftFt: 5, suctionLossFt: 1, npshRequiredFt: 8 })).data.fields.waterTempF).toMatch(
      /not plausible/,
    );
  });

  it("needs a signed-in person, and knows only its four calculators", async () => {
    expect((await call("torque", { value: 1, unit: "ft-lb" }, null)).status).toBe(401);
    expect((await call("bogus", {})).status).toBe(404);
  });
});
