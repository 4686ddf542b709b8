import type { Page } from "playwright-core";
import { describe, expect, it, onTestFinished } from "vitest";
import { Case, CaseEvent, CasePhoto, GuideRecord, GuideVersion, Rig } from "../../db/index";
import { appAndBrowserForFile, signIn } from "../helpers/app";
import { phoneSignal } from "../helpers/signal";
import { outbox } from "../helpers/outbox";

// A crew member at a rig with no signal, from the first tap: the network is switched off before
// anything is tapped, and everything done then reaches the server once, in order, when it returns.
const harness = appAndBrowserForFile();

const answer = (p: Page, name: string) => p.getByRole("button", { name, exact: true }).click();
const prompt = (p: Page) => p.locator("#step-prompt");
const caseIdOf = (p: Page) => new URL(p.url()).pathname.split("/")[2];
const waitSynced = (p: Page) => p.locator('[data-synced="yes"]').waitFor({ timeout: 20_000 });

/** Signs in with signal and waits until the phone says it is ready for none. */
const { readyPhone, signalOff, signalOn } = phoneSignal(harness);

/** A ready phone whose signal is cut before the first tap; from the home screen it starts `guide` on `rig` by its tile. */
async function startedWithNoSignal(rig: string, guide: RegExp) {
  const p = await readyPhone();
  await signalOff(p);
  await p.reload();
  await p
    .getByRole("link", { name: new RegExp(rig) })
    .first()
    .click();
  await p.getByRole("button", { name: guide }).click();
  await p.waitForURL(/\/cases\/[^/]+\/walk$/);
  return { p, id: caseIdOf(p) };
}

const tinyJpeg = (p: Page) =>
  p.evaluate(() => {
    const c = document.createElement("canvas");
    c.width = 48;
    c.height = 32;
    const g = c.getContext("2d")!;
    g.fillStyle = "#2a6";
    g.fillRect(0, 0, 48, 32);
    return c.toDataURL("image/jpeg").split(",")[1];
  });

describe("no signal from the first tap (360×640)", () => {
  it("starts from the home screen, walks to a fixed end, survives reloads, and syncs every answer once in order", async () => {
    const p = await readyPhone();
    await signalOff(p);
    // The first tap happens with no signal: the home screen itself comes from the phone.
    await p.reload();
    await p.getByTestId("no-signal").waitFor();
    const tappedAt = Date.now();
    await p.getByRole("link", { name: /CF-07/ }).first().click();
    await p.getByRole("heading", { name: "What is CF-07 doing?" }).waitFor();
    await p.getByRole("button", { name: /Pump loses prime/ }).click();
    await p.waitForURL(/\/cases\/[^/]+\/walk$/);
    const id = caseIdOf(p);
    await expect(prompt(p).textContent()).resolves.toMatch(/water in the tank well above the sump outlet/);
    await p.getByText("This fix is kept on this phone — no signal; it will be sent when there is.").waitFor();
    await answer(p, "No");
    // The phone's store survives a reload with no signal: the same step opens again.
    await p.reload();
    await expect(prompt(p).textContent()).resolves.toMatch(/Add water/);
    await answer(p, "Done");
    await answer(p, "Yes");
    await p.getByRole("heading", { name: "Fixed" }).waitFor();
    await p.getByLabel(/^Engine hours now \(hour meter/).fill("2400");
    await answer(p, "Finish");
    expect(await Case.findByPk(id)).toBeNull(); // nothing has left the phone yet

    await signalOn(p);
    await waitSynced(p);
    const stored = (await Case.findByPk(id))!;
    expect(stored).toMatchObject({ outcome: "fixed", causeCode: "low-water", engineHours: 2400 });
    // The opening time is the phone's (when the guide was tapped), not when the server heard of it.
    expect(Math.abs(stored.openedAt.getTime() - tappedAt)).toBeLessThan(15_000);
    const events = await CaseEvent.findAll({ where: { caseId: id }, order: [["seq", "ASC"]] });
    expect(events.map((e) => `${e.seq}:${e.stepId}:${e.answer}`)).toEqual(["1:water-level:NO", "2:add-water:DONE", "3:holds-after-water:YES"]);
    await p.close();
  });

  it("starts from the rig's label link and symptom search, hands off with a note and a photo, and mails the supervisor once", async () => {
    const p = await readyPhone();
    const before = (await outbox()).length;
    await signalOff(p);
    // The label's QR code opens this address; with no signal the phone's copy answers.
    await p.goto(`${harness.app.url}/rigs/CF-03/fix`);
    await p.getByLabel("Say it in your own words").fill("whole truck shaking");
    await p
      .getByRole("region", { name: "Matching guides" })
      .getByRole("button", { name: /Vibration/ })
      .click();
    await p.waitForURL(/\/cases\/[^/]+\/walk$/);
    const id = caseIdOf(p);
    await p.getByLabel("Add a photo").setInputFiles({ name: "mount.jpg", mimeType: "image/jpeg", buffer: Buffer.from(await tinyJpeg(p), "base64") });
    await p.getByText("mount.jpg: kept on this phone, sent when there is signal").waitFor();
    await answer(p, "No");
    await answer(p, "No");
    await p.getByRole("heading", { name: "Handed off" }).waitFor();
    await p.getByLabel("Note for the case (optional)").fill("Shakes at full throttle only");
    await answer(p, "Finish");
    await p.getByTestId("handoff-mail").filter({ hasText: "Your supervisor will be e-mailed when this phone has signal." }).waitFor();
    expect((await outbox()).length).toBe(before);

    await signalOn(p);
    await p
      .getByTestId("handoff-mail")
      .filter({ hasText: /^E-mailed to Mo Brennan at / })
      .waitFor({ timeout: 20_000 });
    await waitSynced(p);
    const stored = (await Case.findByPk(id))!;
    expect(stored.outcome).toBe("handoff");
    expect(stored.note).toBe("Shakes at full throttle only");
    const events = await CaseEvent.findAll({ where: { caseId: id }, order: [["seq", "ASC"]] });
    expect(events.map((e) => e.seq)).toEqual([1, 2]);
    expect(await CasePhoto.count({ where: { caseId: id } })).toBe(1);
    // Another round of sending changes nothing: each part carries the phone's id.
    await p.evaluate(() => window.dispatchEvent(new Event("online")));
    await p.waitForTimeout(1500);
    expect(await CasePhoto.count({ where: { caseId: id } })).toBe(1);
    expect(await CaseEvent.count({ where: { caseId: id } })).toBe(2);
    const mails = (await outbox()).slice(before).filter((m) => m.text.includes("Shakes at full throttle only"));
    expect(mails).toHaveLength(1);
    await p.close();
  });

  it("keeps the answers and says whom to tell when the rig was retired before the start reached the server", async () => {
    const p = await readyPhone();
    await signalOff(p);
    await p.reload();
    await p.getByRole("link", { name: /CF-11/ }).first().click();
    await p.getByLabel("Say it in your own words").fill("leaking at the camlock");
    await p.getByRole("region", { name: "Matching guides" }).getByRole("button", { name: /Leaks/ }).click();
    await p.waitForURL(/\/cases\/[^/]+\/walk$/);
    const id = caseIdOf(p);
    await answer(p, "Yes");
    await Rig.update({ retired: true }, { where: { code: "CF-11" } });
    onTestFinished(() => Rig.update({ retired: false }, { where: { code: "CF-11" } }).then(() => undefined));

    await signalOn(p);
    await p
      .getByText(
        /^Not saved to Tankside\. The server did not take this fix: Rig CF-11 has been retired.*Tell your supervisor.* Everything you answered stays on this phone\.$/,
      )
      .waitFor({ timeout: 20_000 });
    expect(await Case.findByPk(id)).toBeNull();
    const kept = await p.evaluate((caseId) => JSON.parse(localStorage.getItem(`tankside:walk:${caseId}`)!), id);
    expect(kept.events).toHaveLength(1);
    // The home screen says it too, with a way back to the answers.
    await p.goto(harness.app.url);
    await p
      .getByRole("alert")
      .filter({ hasText: /Rig CF-11 has been retired/ })
      .waitFor();
    await p.close();
  });

  it("stores the guide version the phone walked when a newer one was published meanwhile", async () => {
    const guide = (await GuideRecord.findOne({ where: { slug: "foaming", companyId: null } }))!;
    const walked = (await GuideVersion.findOne({ where: { guideId: guide.id, number: guide.publishedVersion! } }))!;
    const { p, id } = await startedWithNoSignal("CF-07", /Foam in the tank/);
    await answer(p, "Yes");
    const next = await GuideVersion.create({
      guideId: guide.id,
      number: walked.number + 1,
      status: "published",
      definition: walked.definition,
      changeNote: "Published while the phone had no signal",
      sourceHash: `while-offline-${Date.now()}`,
      authorId: null,
      reviewerId: null,
      reviewComment: null,
      publishedAt: new Date(),
    });
    await walked.update({ status: "retired" });
    await guide.update({ publishedVersion: next.number });
    onTestFinished(async () => {
      await walked.update({ status: "published" });
      await guide.update({ publishedVersion: walked.number });
      await next.destroy();
    });

    await signalOn(p);
    await waitSynced(p);
    expect((await Case.findByPk(id))!.guideVersionId).toBe(walked.id);
    expect(await CaseEvent.count({ where: { caseId: id } })).toBe(1);
    await p.close();
  });

  it("keeps the answers when the sign-in ends with no signal, and sends them after signing in again", async () => {
    const { p, id } = await startedWithNoSignal("CF-07", /Foam in the tank/);
    await answer(p, "Yes");
    await harness.browser.context.clearCookies(); // the session ended meanwhile

    await signalOn(p);
    await p
      .getByText(/^Kept on this phone: 1 answer\. Your sign-in has ended: sign in again on this phone and they will be sent\.$/)
      .waitFor({ timeout: 20_000 });
    expect(await Case.findByPk(id)).toBeNull();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    // Sent from whatever page is open once signed in again.
    await expect.poll(async () => CaseEvent.count({ where: { caseId: id } }), { timeout: 20_000 }).toBe(1);
    expect(await Case.count({ where: { id } })).toBe(1);
    await p.close();
  });

  it("opens field math and a rig's specs with no signal", async () => {
    const p = await readyPhone();
    await signalOff(p);
    await p.goto(`${harness.app.url}/field-math`);
    await p.getByRole("link", { name: /Hose and reach/ }).click();
    await p.getByRole("heading", { name: "Hose and reach" }).waitFor();
    await p.goto(`${harness.app.url}/rigs/CF-07`);
    await p.getByRole("heading", { name: "Specs" }).waitFor();
    await p
      .getByText(/Trailer Seven/)
      .first()
      .waitFor();
    // A page the phone does not keep says so plainly.
    await p.goto(`${harness.app.url}/board`);
    await p.getByRole("heading", { name: "No signal" }).waitFor();
    await p.close();
  });
});
