import { beforeAll, describe, expect, it } from "vitest";
import { Rig } from "../../db/index";
import { loader as rigLoader, action as rigAction } from "~/routes/rigs.$code";
import { action as editAction } from "~/routes/rigs.$code.edit";
import { action as newAction } from "~/routes/rigs.new";
import { loader as rigsLoader } from "~/routes/rigs";
import { resetDatabase } from "../helpers/db";
import { args, requestAs, run } from "../helpers/requests";

const goodRig = {
  code: "CF-21",
  name: "New trailer",
  mount: "trailer",
  tankGal: "1000",
  pumpKind: "Centrifugal 3 in",
  hasHourMeter: "on",
  engineHours: "0",
  hoseLengthFt: "200",
  hoseDiameterIn: "1.5",
  yardElevationFt: "400",
  "nozzleTips[0].name": "Wide fan",
  "nozzleTips[0].reachFt": "45",
  "nozzleTips[0].widthFt": "12",
};

beforeAll(() => resetDatabase());

describe("rigs are scoped to the company", () => {
  it("lists only the signed-in person's company rigs", async () => {
    const cedar = await run(async () => rigsLoader(args(await requestAs("dana@cedarflats.example", "/rigs"))));
    const codes = (cedar.data as { rigs: { code: string }[] }).rigs.map((r) => r.code);
    expect(codes).toEqual(["CF-01", "CF-02", "CF-03", "CF-05", "CF-07", "CF-08", "CF-09", "CF-11", "CF-12"]);
    const mesa = await run(async () => rigsLoader(args(await requestAs("sam@bluemesa.example", "/rigs"))));
    expect((mesa.data as { rigs: { code: string }[] }).rigs.map((r) => r.code)).toEqual(["BM-01", "BM-02", "BM-03", "BM-04"]);
  });

  it("answers 404, not 403, for another company's rig, also to its admin-only actions", async () => {
    expect((await run(async () => rigLoader(args(await requestAs("dana@cedarflats.example", "/rigs/BM-01"), { code: "BM-01" })))).status).toBe(404);
    expect((await run(async () => rigLoader(args(await requestAs("june@cedarflats.example", "/rigs/BM-01"), { code: "BM-01" })))).status).toBe(404);
    const retire = await run(async () =>
      rigAction(args(await requestAs("june@cedarflats.example", "/rigs/BM-01", { form: { intent: "retire", confirmed: "yes" } }), { code: "BM-01" })),
    );
    expect(retire.status).toBe(404);
    expect((await Rig.findOne({ where: { code: "BM-01" } }))!.retired).toBe(false);
  });
});

describe("admins add, edit and retire rigs", () => {
  it("refuses a bad form with a message per field and saves nothing", async () => {
    const before = await Rig.count();
    const res = await run(async () =>
      newAction(
        args(
          await requestAs("june@cedarflats.example", "/rigs/new", {
            form: { ...goodRig, code: "bad code!", tankGal: "-5", hoseDiameterIn: "abc", "nozzleTips[0].reachFt": "900" },
          }),
        ),
      ),
    );
    expect(res.status).toBe(400);
    const errors = (res.data as { error: Record<string, string[]> }).error;
    expect(errors.code[0]).toMatch(/letters and digits/);
    expect(errors.tankGal[0]).toMatch(/under 100 gal/);
    expect(errors.hoseDiameterIn[0]).toMatch(/inside diameter/);
    expect(errors["nozzleTips[0].reachFt"][0]).toMatch(/300 ft/);
    expect(await Rig.count()).toBe(before);
  });

  it("saves a good rig in the admin's company and refuses a duplicate code there", async () => {
    const res = await run(async () => newAction(args(await requestAs("june@cedarflats.example", "/rigs/new", { form: goodRig }))));
    expect(res.status).toBe(302);
    expect(res.location).toBe("/rigs/CF-21");
    const rig = await Rig.findOne({ where: { code: "CF-21" } });
    expect(rig!.nozzleTips).toEqual([{ name: "Wide fan", reachFt: 45, widthFt: 12 }]);
    const again = await run(async () => newAction(args(await requestAs("june@cedarflats.example", "/rigs/new", { form: goodRig }))));
    expect(again.status).toBe(400);
    expect((again.data as { error: Record<string, string[]> }).error.code[0]).toMatch(/already has this unit code/);
  });

  it("lets an admin edit and retire, and no one below admin", async () => {
    const edit = await run(async () =>
      editAction(args(await requestAs("june@cedarflats.example", "/rigs/CF-21/edit", { form: { ...goodRig, tankGal: "1200" } }), { code: "CF-21" })),
    );
    expect(edit.status).toBe(302);
    expect((await Rig.findOne({ where: { code: "CF-21" } }))!.tankGal).toBe(1200);
    const crew = await run(async () =>
      rigAction(args(await requestAs("dana@cedarflats.example", "/rigs/CF-21", { form: { intent: "retire", confirmed: "yes" } }), { code: "CF-21" })),
    );
    expect(crew.status).toBe(403);
    await run(async () =>
      rigAction(args(await requestAs("june@cedarflats.example", "/rigs/CF-21", { form: { intent: "retire", confirmed: "yes" } }), { code: "CF-21" })),
    );
    expect((await Rig.findOne({ where: { code: "CF-21" } }))!.retired).toBe(true);
  });
});
