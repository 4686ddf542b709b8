import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { Case, CaseEvent, Rig, ServiceRecord } from "../../db/index";
import { appAndBrowserForFile, signIn } from "../helpers/app";
import { phoneSignal } from "../helpers/signal";

// Rig cards at 360×640: a crew member's pre-start with no signal from the first tap (saved once when
// signal returns), a "no" that opens a guide on the spot, and the supervisor's view of cards and care.
const harness = appAndBrowserForFile();

const answer = (p: Page, name: string) => p.getByRole("button", { name: new RegExp(`^${name}`) }).click();
const prompt = (p: Page) => p.locator("#step-prompt");
const caseIdOf = (p: Page) => new URL(p.url()).pathname.split("/")[2];

const { readyPhone, signalOff, signalOn } = phoneSignal(harness);

/** Answers the pre-start's items as the usual morning, from its stop to its end; `valves` as given. */
async function walkPreStart(p: Page, valves: "Yes" | "No" = "Yes") {
  await p.getByRole("button", { name: /Machine is shut down/ }).click();
  for (const [step, a] of [
    ["drain plug", "Yes"],
    ["suction valve", "Yes"],
    ["Grease every", "Done"],
    ["lubricator", "Done"],
    ["hoses", "Yes"],
  ]) {
    await expect.poll(() => prompt(p).innerText()).toMatch(new RegExp(step, "i"));
    await answer(p, a);
  }
  await expect.poll(() => prompt(p).innerText()).toMatch(/recirculation, discharge and agitator valves/);
  await answer(p, valves);
}

describe("rig cards (360×640)", () => {
  it("a crew member does the pre-start with no signal from the first tap; it is saved once, with its hours and services, when signal returns", async () => {
    const rig = (await Rig.findOne({ where: { code: "CF-07" } }))!;
    const p = await readyPhone();
    await signalOff(p);
    await p.reload();
    await p.getByTestId("no-signal").waitFor();
    const tappedAt = Date.now();
    await p.getByRole("link", { name: "Pre-start and other cards for CF-07" }).click();
    await p.getByRole("heading", { name: "Rig cards · CF-07" }).waitFor();
    // The buttons are big enough for gloves.
    const box = (await p.getByRole("button", { name: /^Pre-start/ }).boundingBox())!;
    expect(box.height).toBeGreaterThanOrEqual(56);
    await p.getByLabel(/Hour meter now/).fill(String(rig.engineHours + 6));
    await p.getByRole("button", { name: /^Pre-start/ }).click();
    await p.waitForURL(/\/cases\/[^/]+\/walk$/);
    const id = caseIdOf(p);
    await walkPreStart(p);
    await expect.poll(() => prompt(p).innerText()).toMatch(/start positions/);
    await answer(p, "Done");
    await p.getByRole("heading", { name: "Complete" }).waitFor();
    // A card asks no hour reading at its end: it took it as it started.
    expect(await p.getByLabel(/Engine hours now/).count()).toBe(0);
    await p.getByRole("button", { name: "Finish" }).click();
    await p.getByText("Finished. The card is saved when this phone has signal.").waitFor();
    const seconds = (Date.now() - tappedAt) / 1000;
    console.log(`pre-start on the phone with no signal, first tap to Finish: ${seconds.toFixed(1)} s of taps (the checks themselves take longer)`);
    expect(await Case.count({ where: { id } })).toBe(0);

    await signalOn(p);
    await p.locator('[data-synced="yes"]').waitFor({ timeout: 30_000 });
    await expect.poll(async () => (await Case.findByPk(id))?.outcome, { timeout: 20_000 }).toBe("fixed");
    const card = (await Case.findByPk(id))!;
    expect(card.kind).toBe("card");
    expect(card.engineHours).toBe(rig.engineHours + 6);
    expect(card.cardGaps).toBe(0);
    expect(await CaseEvent.count({ where: { caseId: id } })).toBe(8);
    expect(await ServiceRecord.count({ where: { caseId: id } })).toBe(2);
    expect((await Rig.findByPk(rig.id))!.engineHours).toBe(rig.engineHours + 6);
    // Reloading with signal sends nothing twice.
    await p.reload();
    await p.locator('[data-synced="yes"]').waitFor({ timeout: 20_000 });
    expect(await Case.count({ where: { rigId: rig.id, kind: "card" } })).toBe(1);
    expect(await CaseEvent.count({ where: { caseId: id } })).toBe(8);
  });

  it("a 'no' on the valves opens valve trouble on the spot, linked to the card, which shows the card's answer pre-selected", async () => {
    const rig = (await Rig.findOne({ where: { code: "CF-11" } }))!;
    const p = await readyPhone();
    await p.goto(`${harness.app.url}/rigs/CF-11/cards`);
    await p.getByLabel(/Hour meter now/).fill(String(rig.engineHours + 1));
    await p.getByRole("button", { name: /^Pre-start/ }).click();
    await p.waitForURL(/\/cases\/[^/]+\/walk$/);
    const cardId = caseIdOf(p);
    await walkPreStart(p, "No");
    await expect.poll(() => prompt(p).innerText()).toMatch(/valve trouble guide/);
    await p.getByRole("button", { name: "Open the guide now" }).click();
    await p.waitForURL((u) => u.pathname.endsWith("/walk") && !u.pathname.includes(cardId));
    const fixId = caseIdOf(p);
    await expect.poll(async () => (await Case.findByPk(fixId))?.fromCaseId).toBe(cardId);
    // Valve trouble asks first whether it plugged while loading, then whether the handle moves: today's card said no.
    await answer(p, "No");
    await expect.poll(() => prompt(p).innerText()).toMatch(/valve handle move/);
    await expect.poll(() => p.getByTestId("todays-answer").innerText()).toMatch(/Today's Pre-start at .*: No\./);
    expect(await p.getByRole("button", { name: /^No/ }).innerText()).toMatch(/today's card/);
    // It is never taken silently: the step waits for a tap.
    expect(await prompt(p).innerText()).toMatch(/valve handle move/);
    // The card is still open: the rig's cards carry it on (no second pre-start), and it carries on the open guide.
    await p.goto(`${harness.app.url}/rigs/CF-11/cards`);
    expect(await p.getByRole("button", { name: /^Pre-start/ }).count()).toBe(0);
    await p.getByRole("link", { name: /^Carry on: Pre-start/ }).click();
    await p.waitForURL(new RegExp(`/cases/${cardId}/walk$`));
    await p
      .getByRole("list", { name: "Opened from this card" })
      .getByText(/Valve stuck or plugged: open/)
      .waitFor();
    expect(await p.getByRole("button", { name: "Open the guide again" }).count()).toBe(0);
    await p.getByRole("link", { name: "Carry on with the guide" }).click();
    await p.waitForURL(new RegExp(`/cases/${fixId}/walk$`));
  });

  it("a glove's double tap answers one question, not the next one too", async () => {
    const rig = (await Rig.findOne({ where: { code: "CF-03" } }))!;
    const p = await readyPhone();
    await p.goto(`${harness.app.url}/rigs/CF-03/cards`);
    await p.getByLabel(/Hour meter now/).fill(String(rig.engineHours + 1));
    await p.getByRole("button", { name: /^Pre-start/ }).click();
    await p.waitForURL(/\/cases\/[^/]+\/walk$/);
    await p.getByRole("button", { name: /Machine is shut down/ }).click();
    await expect.poll(() => prompt(p).innerText()).toMatch(/drain plug/);
    await p.getByRole("button", { name: /^Yes/ }).dblclick();
    await expect.poll(() => prompt(p).innerText()).toMatch(/suction valve/);
    await p.waitForTimeout(800);
    expect(await prompt(p).innerText()).toMatch(/suction valve/);
    expect(await p.getByLabel("Progress").innerText()).toMatch(/^Step 3/);
  });

  it("the supervisor sees what skipped care costs on the board and the cards on the rig page", async () => {
    await harness.browser.context.clearCookies();
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "mo@cedarflats.example");
    await p.goto(`${harness.app.url}/board`);
    const care = p.getByRole("region", { name: "Fault rate by pre-start" });
    await care.waitFor();
    expect(await care.innerText()).toMatch(/With a complete pre-start[\s\S]*Missing or incomplete pre-start/);
    expect(await p.getByText("This is an association, not proof", { exact: false }).count()).toBe(1);
    const weeks = p.getByRole("region", { name: "Pre-starts per rig and week" });
    expect(await weeks.innerText()).toMatch(/CF-07\s+1 of 1 days/);
    expect(await p.getByRole("region", { name: "Fault rate by service overdue" }).count()).toBe(1);
    // The board's own form, submitted in the browser with the rig left on "All rigs".
    await p
      .getByRole("button", { name: /Show|Apply|Update/ })
      .first()
      .click();
    await care.waitFor();
    await p.goto(`${harness.app.url}/rigs/CF-07`);
    await p.getByRole("heading", { name: "Recent cards" }).waitFor();
    expect(await p.getByRole("link", { name: "Pre-start" }).count()).toBeGreaterThanOrEqual(1);
  });
});
