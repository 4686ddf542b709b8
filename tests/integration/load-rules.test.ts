import { beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_LOAD_RULES } from "~/lib/field-math/load-rules";
import { action as accountAction } from "~/routes/account";
import { action as companyAction } from "~/routes/admin.company";
import { action as fieldMathApi } from "~/routes/api.field-math.$kind";
import { loader as offlineKitLoader } from "~/routes/api.offline-kit";
import { loader as fieldMathLoader } from "~/routes/field-math.$screen";
import { Company } from "../../db/index";
import { resetDatabase } from "../helpers/db";
import { args, requestAs, run } from "../helpers/requests";

beforeAll(() => resetDatabase());

const order = ["water", "other", "fiber", "tackifier", "fertilizer", "seed"];
const rulesForm = (over: Record<string, string> = {}, steps = order) => ({
  settings: "load-rules",
  fiberStartPercent: "40",
  fiberDonePercent: "70",
  seedLimitMinutes: "20",
  fiberCeilingLbPer100Gal: "45",
  paceFt: "2.4",
  ...Object.fromEntries(
    steps.flatMap((step, n) => [
      [`order[${n}].step`, step],
      [`order[${n}].reason`, `Reason for ${step}.`],
    ]),
  ),
  ...over,
});
const saveRules = async (form: Record<string, string>, email = "june@cedarflats.example") =>
  run(async () => companyAction(args(await requestAs(email, "/admin/company", { form }))));
const screenFor = async (email: string, screen = "load") => run(async () => fieldMathLoader(args(await requestAs(email, `/field-math/${screen}`), { screen })));
const storedRules = async (slug: string) => (await Company.findOne({ where: { slug }, attributes: ["loadRules"] }))!.loadRules;

describe("company loading rules", () => {
  it("start from the defaults", async () => {
    const res = await screenFor("dana@cedarflats.example");
    expect(res.data.rules).toEqual(DEFAULT_LOAD_RULES);
  });

  it("an admin saves them and the company's crews get them; another company keeps its own", async () => {
    const saved = await saveRules(rulesForm());
    expect(saved.status).toBe(200);
    expect(saved.data.message).toMatch(/Load cards now use these rules/);
    const dana = await screenFor("dana@cedarflats.example");
    expect(dana.data.rules).toMatchObject({ fiberStartPercent: 40, fiberDonePercent: 70, seedLimitMinutes: 20, fiberCeilingLbPer100Gal: 45, paceFt: 2.4 });
    expect(dana.data.rules.order.map((o: { step: string }) => o.step)).toEqual(order);
    expect((await screenFor("sam@bluemesa.example")).data.rules).toEqual(DEFAULT_LOAD_RULES);
  });

  it("refuses rules that break the loading basics, naming what is wrong, and changes nothing", async () => {
    const before = await storedRules("cedar-flats");
    const noWater = await saveRules(rulesForm({}, ["fiber", "water", "other", "tackifier", "fertilizer", "seed"]));
    expect(noWater.status).toBe(400);
    expect(JSON.stringify(noWater.data.rulesResult.error)).toMatch(/Water comes first/);
    const backwards = await saveRules(rulesForm({ fiberStartPercent: "80", fiberDonePercent: "60" }));
    expect(backwards.status).toBe(400);
    expect(JSON.stringify(backwards.data.rulesResult.error)).toMatch(/All fiber must be in at a higher level/);
    const notNumber = await saveRules(rulesForm({ seedLimitMinutes: "soon" }));
    expect(notNumber.status).toBe(400);
    expect(JSON.stringify(notNumber.data.rulesResult.error)).toMatch(/seed limit in minutes/);
    expect(await storedRules("cedar-flats")).toEqual(before);
  });

  it("only an admin may change them", async () => {
    const res = await saveRules(rulesForm({ seedLimitMinutes: "5" }), "mo@cedarflats.example");
    expect(res.status).toBe(403);
    expect((await storedRules("cedar-flats"))!.seedLimitMinutes).toBe(20);
  });

  it("the load-card API and the phone's kit use the company's rules", async () => {
    const res = await run(async () =>
      fieldMathApi(
        args(
          await requestAs("dana@cedarflats.example", "/api/field-math/load-card", {
            method: "POST",
            headers: { "Content-Type": "application/json" },
            body: JSON.stringify({
              areaSqFt: 43_560,
              tankGal: 1000,
              maxFiberLbPer100Gal: 45,
              materials: [{ name: "Wood fiber", lbPerAcre: 1500, kind: "fiber", bagLb: 50 }],
            }),
          }),
          { kind: "load-card" },
        ),
      ),
    );
    expect(res.status).toBe(200);
    expect(res.data.loads[0].fiberStartGal).toBe(400); // 40 % of 1,000 gal
    expect(res.data.loads[0].fiberDoneGal).toBe(700);
    const kit = await run(async () => offlineKitLoader(args(await requestAs("dana@cedarflats.example", "/api/offline-kit"))));
    expect(kit.data.loadRules).toMatchObject({ seedLimitMinutes: 20, paceFt: 2.4 });
  });
});

describe("a person's pace", () => {
  const setPace = async (paceFt: string) =>
    run(async () => accountAction(args(await requestAs("dana@cedarflats.example", "/account", { form: { intent: "pace", paceFt } }))));

  it("overrides the company's for that person only", async () => {
    expect((await setPace("2.8")).data.message).toMatch(/paces of 2.8 ft/);
    expect((await screenFor("dana@cedarflats.example")).data.rules.paceFt).toBe(2.8);
    expect((await screenFor("mo@cedarflats.example")).data.rules.paceFt).toBe(2.4);
  });

  it("refuses a pace no one walks, and blank goes back to the company's", async () => {
    const bad = await setPace("9");
    expect(bad.status).toBe(400);
    expect(bad.data.paceError).toBe("A pace over 6 ft is not plausible.");
    expect((await screenFor("dana@cedarflats.example")).data.rules.paceFt).toBe(2.8);
    expect((await setPace("")).data.message).toMatch(/back to the company's/);
    expect((await screenFor("dana@cedarflats.example")).data.rules.paceFt).toBe(2.4);
  });
});
