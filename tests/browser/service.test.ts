import { describe, expect, it } from "vitest";
import { Rig, ServiceRecord, ServiceRule } from "../../db/index";
import { signIn, appAndBrowserForFile } from "../helpers/app";

const harness = appAndBrowserForFile();

describe("service at 360×640", () => {
  it("a crew member sees what is due on home and records it done from the phone", async () => {
    // CF-07's grease was last done 60 engine hours ago: 10 h overdue on a 50 h interval.
    const rig = (await Rig.findOne({ where: { code: "CF-07" } }))!;
    const rule = (await ServiceRule.findOne({ where: { rigId: rig.id, name: "Grease points" } }))!;
    await ServiceRecord.create({
      companyId: rig.companyId,
      rigId: rig.id,
      ruleId: rule.id,
      doneAt: new Date(),
      engineHours: rig.engineHours - 60,
      doneBy: null,
      note: null,
    });

    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    const todo = p.getByRole("region", { name: "Service to do" });
    await todo.getByRole("link", { name: /CF-07 · Grease points: overdue/ }).click();
    await p.waitForURL(/\/rigs\/CF-07\/service#service-\d+$/);
    const card = p.getByRole("listitem", { name: "Grease points" });
    await card.getByText("over by 10 engine hours").waitFor();
    await card.getByLabel("Hour meter now").fill(String(rig.engineHours + 1.5));
    await card.getByRole("button", { name: "Done now: record it" }).click();
    await card.getByText(/Recorded as done now at [\d,.]+ engine hours\./).waitFor();
    await p
      .getByRole("listitem", { name: "Grease points" })
      .getByText(/Grease points · Up to date/)
      .waitFor();
    expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    const box = await card.getByRole("button", { name: "Done now: record it" }).boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(48);
    // Crew see no way to change the rules.
    expect(await p.getByText("Change or stop this service").count()).toBe(0);
    await p.close();
  });

  it("a supervisor adds a service in the browser and sees it due on the board", async () => {
    await harness.browser.context.clearCookies();
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "mo@cedarflats.example");
    await p.goto(`${harness.app.url}/rigs/CF-11/service`);
    const add = p.getByRole("region", { name: "Add a service" });
    await add.getByLabel(/^Service/).fill("Belt tension check");
    await add.getByRole("button", { name: "Add this service" }).click();
    await add.getByText("Give the engine hours, the days, or both.").waitFor();
    await add.getByLabel(/^Every … days/).fill("14");
    await add.getByRole("button", { name: "Add this service" }).click();
    await add.getByText("Saved: Belt tension check.").waitFor();
    await p.goto(`${harness.app.url}/board`);
    await p
      .getByRole("region", { name: "Service to do" })
      .getByText(/CF-11 · Belt tension check: never recorded/)
      .waitFor();
    await p.close();
  });
});
