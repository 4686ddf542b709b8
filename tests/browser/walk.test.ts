import type { Page } from "playwright-core";
import { describe, expect, it, onTestFinished } from "vitest";
import { Case, CaseEvent, CasePhoto } from "../../db/index";
import { signIn, appAndBrowserForFile } from "../helpers/app";
import { outbox } from "../helpers/outbox";

const harness = appAndBrowserForFile();

const answer = (p: Page, name: string) => p.getByRole("button", { name, exact: true }).click();
const prompt = (p: Page) => p.locator("#step-prompt");
const caseIdOf = (p: Page) => new URL(p.url()).pathname.split("/")[2];
const waitSynced = (p: Page) => p.locator('[data-synced="yes"]').waitFor();

async function startFix(p: Page, email: string, rig: string, words: string, guideTitle: string) {
  await harness.browser.context.clearCookies();
  await signIn(p, harness.app.url, email);
  await p
    .getByRole("link", { name: new RegExp(rig) })
    .first()
    .click();
  await p.getByLabel("Say it in your own words").fill(words);
  await p
    .getByRole("region", { name: "Matching guides" })
    .getByRole("button", { name: new RegExp(guideTitle) })
    .click();
  await p.waitForURL(/\/cases\/[^/]+\/walk$/);
}

describe("walk-through on a phone (360×640)", () => {
  it("goes from a symptom in the crew's words to a fixed end, and the case shows every answer", async () => {
    const p = await harness.browser.context.newPage();
    await startFix(p, "dana@cedarflats.example", "CF-07", "pump wont pick up water", "Pump loses prime");
    await expect(prompt(p).textContent()).resolves.toMatch(/water in the tank well above the sump outlet/);
    await answer(p, "No");
    await answer(p, "Done");
    await expect(prompt(p).textContent()).resolves.toMatch(/hold a steady stream/);
    // Back undoes one answer, then answer again.
    await p.getByRole("button", { name: "Back one step" }).click();
    await expect(prompt(p).textContent()).resolves.toMatch(/Add water/);
    await answer(p, "Done");
    await answer(p, "Yes");
    await p.getByRole("heading", { name: "Fixed" }).waitFor();
    await p.getByText("Tank water below the sump outlet").waitFor();
    await p.getByLabel(/^Engine hours now \(hour meter/).fill("2320");
    await answer(p, "Finish");
    await p.getByText("Case closed and saved.").waitFor();
    const id = caseIdOf(p);
    const stored = await CaseEvent.findAll({ where: { caseId: id }, order: [["seq", "ASC"]] });
    expect(stored.map((e) => `${e.stepId}:${e.answer}`)).toEqual([
      "water-level:NO",
      "add-water:DONE",
      "holds-after-water:BACK",
      "add-water:DONE",
      "holds-after-water:YES",
    ]);
    expect(await Case.findByPk(id)).toMatchObject({ outcome: "fixed", causeCode: "low-water", engineHours: 2320 });

    await p.goto(`${harness.app.url}/cases/${id}`);
    await p.getByRole("heading", { name: "Case fixed" }).waitFor();
    expect(await p.getByRole("listitem").filter({ hasText: "→" }).count()).toBe(5);
    await p.goto(`${harness.app.url}/rigs/CF-07`);
    await p.getByRole("region", { name: "Recent cases" }).getByRole("link", { name: "Pump loses prime" }).first().waitFor();
    expect(await p.locator(`a[href="/cases/${id}"]`).count()).toBe(1);
    await p.close();
  });

  it("ends in a hand-off that e-mails Cedar Flats' supervisor and no one at Blue Mesa", async () => {
    const p = await harness.browser.context.newPage();
    const before = (await outbox()).length;
    await startFix(p, "dana@cedarflats.example", "CF-03", "whole truck shaking", "Vibration");
    await answer(p, "No"); // shaking does not stop with the agitator in neutral
    await answer(p, "No"); // no loose mount seen
    await p.getByRole("heading", { name: "Handed off" }).waitFor();
    await p.getByLabel("Note for the case (optional)").fill("Shakes at full throttle only");
    await answer(p, "Finish");
    await p
      .getByTestId("handoff-mail")
      .filter({ hasText: /^E-mailed to Mo Brennan at \d{1,2}:\d{2}:\d{2} [AP]M M[DS]T\.$/ })
      .waitFor();
    const mails = (await outbox()).slice(before);
    expect(mails.map((m) => m.to)).toEqual([["mo@cedarflats.example"]]);
    expect(mails[0].text).toMatch(/Shakes at full throttle only/);
    // Other tests may mail Blue Mesa (the digest does); this hand-off reached no one there.
    expect(mails.some((m) => m.to.some((t) => t.endsWith("@bluemesa.example")))).toBe(false);
    await p.close();
  });

  it("keeps answering with no signal, makes no request while answering, and syncs once in order", async () => {
    const p = await harness.browser.context.newPage();
    await startFix(p, "dana@cedarflats.example", "CF-07", "tank full of suds", "Foam in the tank");
    await answer(p, "Yes");
    await waitSynced(p);
    await p.getByText("This walk-through is kept on this phone").waitFor();
    const id = caseIdOf(p);

    const requests: string[] = [];
    p.on("request", (r) => requests.push(r.url()));
    await harness.browser.context.setOffline(true);
    onTestFinished(() => harness.browser.context.setOffline(false));
    await answer(p, "Can't do it"); // slow-agitator → recirc-time
    await answer(p, "No"); // recirc-time → fast-loading
    await answer(p, "Yes"); // fast-loading → antifoam-loading
    expect(requests).toEqual([]);
    await p.getByText(/3 answers kept on this phone — no signal/).waitFor();

    // A reload with no signal opens the same step from the phone.
    await p.reload();
    await p.locator("#step-prompt", { hasText: /Add antifoam/ }).waitFor();
    await p.getByText(/3 answers kept on this phone/).waitFor();

    await harness.browser.context.setOffline(false);
    await p.evaluate(() => window.dispatchEvent(new Event("online")));
    await waitSynced(p);
    const stored = await CaseEvent.findAll({ where: { caseId: id }, order: [["seq", "ASC"]] });
    expect(stored.map((e) => [e.seq, e.stepId, e.answer])).toEqual([
      [1, "agitator-speed", "YES"],
      [2, "slow-agitator", "CANT"],
      [3, "recirc-time", "NO"],
      [4, "fast-loading", "YES"],
    ]);
    await p.close();
  });

  it("stores a JPEG taken at a step and shows it on the case", async () => {
    const p = await harness.browser.context.newPage();
    await startFix(p, "dana@cedarflats.example", "CF-11", "leaking at the camlock", "Leaks");
    const jpeg = await p.evaluate(() => {
      const c = document.createElement("canvas");
      c.width = 64;
      c.height = 48;
      const g = c.getContext("2d")!;
      g.fillStyle = "#c33";
      g.fillRect(0, 0, 64, 48);
      return c.toDataURL("image/jpeg").split(",")[1];
    });
    await p.getByLabel("Add a photo").setInputFiles({ name: "coupling.jpg", mimeType: "image/jpeg", buffer: Buffer.from(jpeg, "base64") });
    await p.getByText("coupling.jpg: saved").waitFor();
    const id = caseIdOf(p);
    expect(await CasePhoto.count({ where: { caseId: id, stepId: "at-coupling" } })).toBe(1);
    await p.goto(`${harness.app.url}/cases/${id}`);
    const img = p.getByRole("img", { name: /^Photo at “Is the leak at a hose cam-lock coupling\?”, \w{3} \d+, \d{4}, \d+:\d{2} [AP]M M[DS]T$/ });
    await img.waitFor();
    await expect.poll(() => img.evaluate((el: HTMLImageElement) => el.naturalWidth)).toBe(64);
    await p.close();
  });
});
