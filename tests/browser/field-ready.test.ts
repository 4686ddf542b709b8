import type { Page } from "playwright-core";
import { beforeAll, describe, expect, it } from "vitest";
import { seedDemoHistory } from "../../seeds/demo-history";
import { Case, Rig, User } from "../../db/index";
import { appAndBrowserForFile, signIn } from "../helpers/app";

const harness = appAndBrowserForFile();

// A year of demo history, so the board, the cases and the hand-offs have something to show.
beforeAll(() => seedDemoHistory(new Date(), () => {}));

async function as(email: string): Promise<Page> {
  await harness.browser.context.clearCookies();
  const p = await harness.browser.context.newPage();
  await signIn(p, harness.app.url, email);
  return p;
}

const inView = (p: Page, selector: string) =>
  p
    .locator(selector)
    .first()
    .evaluate((el) => {
      const r = el.getBoundingClientRect();
      return r.top >= 0 && r.bottom <= window.innerHeight;
    });

describe("supervisor screens, as a supervisor submits them (360×640)", () => {
  it("lands on the board after sign-in, with open hand-offs near the top", async () => {
    const p = await as("mo@cedarflats.example");
    expect(new URL(p.url()).pathname).toBe("/board");
    const handoffs = p.getByRole("heading", { name: /Open hand-offs/ });
    await handoffs.waitFor();
    const top = await handoffs.evaluate((el) => el.getBoundingClientRect().top + window.scrollY);
    expect(top).toBeLessThan(1500);
    await p.close();
  });

  it("treats the filter forms left on All as no filter: the same count as the plain page and as the CSV", async () => {
    const p = await as("mo@cedarflats.example");
    await p.goto(`${harness.app.url}/cases`);
    const lead = () => p.locator("h1 + p").textContent();
    const plain = await lead();
    await p.getByRole("button", { name: "Filter" }).click();
    await p.waitForURL(/\/cases\?kind=fix&rig=&/);
    expect(await lead()).toBe(plain);
    const n = Number(plain!.match(/^([\d,]+) case/)![1].replace(/,/g, ""));
    expect(n).toBeGreaterThan(0);
    const csvHref = await p.getByRole("link", { name: /Download these/ }).getAttribute("href");
    const csv = await p.evaluate(async (href) => (await fetch(href!)).text(), csvHref);
    expect(csv.trim().split("\n").length - 1).toBe(n);

    await p.goto(`${harness.app.url}/board`);
    const headline = await p.locator("h1 + p").textContent();
    await p.getByRole("button", { name: "Show" }).click();
    await p.waitForURL(/\/board\?from=/);
    expect(await p.locator("h1 + p").textContent()).toBe(headline);
    expect(headline).toMatch(/all rigs · [1-9][\d,]* cases/);
    await p.close();
  });

  it("asks before marking a hand-off dealt with, and keeps who and the note", async () => {
    const p = await as("mo@cedarflats.example");
    // Mo's own company's newest hand-off (another company's would be a 404 for him).
    const mo = (await User.findOne({ where: { email: "mo@cedarflats.example" } }))!;
    const handoff = await Case.findOne({ where: { outcome: "handoff", companyId: mo.companyId }, order: [["openedAt", "DESC"]] });
    await handoff!.update({ handoffResolvedAt: null, handoffResolvedBy: null, handoffResolvedNote: null });
    await p.goto(`${harness.app.url}/cases/${handoff!.id}`);
    await p.getByText("Mark this hand-off dealt with").click();
    await p.getByLabel("What was done (optional)").fill("Pump sent to the shop");
    await p.getByRole("button", { name: "Yes, mark it dealt with" }).click();
    await p.getByText(/Hand-off dealt with .* by Mo Brennan\. Note: Pump sent to the shop/).waitFor();
    await p.close();
  });

  it("shows an error inside the app with its navigation, a title and a way back", async () => {
    const p = await as("mo@cedarflats.example");
    await p.goto(`${harness.app.url}/cases/00000000-0000-4000-8000-000000000000`);
    await p.getByRole("heading", { level: 1, name: "Not found" }).waitFor();
    expect(await p.title()).toBe("Not found · Tankside");
    await p.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Fault board" }).waitFor();
    await p.getByRole("link", { name: "Back to the start" }).waitFor();
    expect(await p.content()).not.toMatch(/Error 404|ErrorResponseImpl/);
    await p.close();
  });
});

describe("admin screens", () => {
  it("asks before retiring a rig; one tap does not retire it", async () => {
    const p = await as("june@cedarflats.example");
    await p.goto(`${harness.app.url}/rigs/CF-11`);
    await p.getByText("Retire rig", { exact: true }).click();
    expect((await Rig.findOne({ where: { code: "CF-11" } }))!.retired).toBe(false);
    await p.getByRole("button", { name: "Yes, retire CF-11" }).click();
    await p.getByRole("button", { name: "Put back in service" }).waitFor();
    expect((await Rig.findOne({ where: { code: "CF-11" } }))!.retired).toBe(true);
    await p.getByRole("button", { name: "Put back in service" }).click();
    await p.getByText("Retire rig", { exact: true }).waitFor();
    await p.close();
  });

  it("asks before turning a sign-in off", async () => {
    const p = await as("june@cedarflats.example");
    await p.goto(`${harness.app.url}/admin/people`);
    // Ravi's own entry: the demo's seasonal hands who left are listed with their sign-ins off too.
    const ravi = p.getByRole("listitem").filter({ hasText: "Ravi" }).first();
    await ravi.getByText("Turn sign-in off", { exact: true }).click();
    expect((await User.findOne({ where: { email: "ravi@cedarflats.example" } }))!.accessRemovedAt).toBeNull();
    await ravi.getByRole("button", { name: /^Yes, turn .* sign-in off$/ }).click();
    await ravi.getByRole("button", { name: "Turn sign-in back on" }).waitFor();
    expect((await User.findOne({ where: { email: "ravi@cedarflats.example" } }))!.accessRemovedAt).not.toBeNull();
    await ravi.getByRole("button", { name: "Turn sign-in back on" }).click();
    await expect.poll(async () => (await User.findOne({ where: { email: "ravi@cedarflats.example" } }))!.accessRemovedAt).toBeNull();
    await p.close();
  });

  it("accepts 1,200 in the rig form, and times show in the company's zone", async () => {
    const p = await as("june@cedarflats.example");
    await p.goto(`${harness.app.url}/rigs/CF-11/edit`);
    await p.getByLabel(/Tank size/).fill("1,200");
    await p.getByRole("button", { name: /Save/ }).click();
    await p.waitForURL(/\/rigs\/CF-11$/);
    expect((await Rig.findOne({ where: { code: "CF-11" } }))!.tankGal).toBe(1200);
    await p.goto(`${harness.app.url}/admin/company`);
    await p.getByLabel("Time zone").selectOption("America/Chicago");
    await p.getByRole("button", { name: "Save time zone" }).click();
    await p.getByText("Times now show in America/Chicago").waitFor();
    await p.goto(`${harness.app.url}/cases`);
    await p
      .getByRole("cell", { name: /^\w{3} \d+, \d{4}, \d+:\d{2} [AP]M C[DS]T$/ })
      .first()
      .waitFor();
    await p.goto(`${harness.app.url}/admin/company`);
    await p.getByLabel("Time zone").selectOption("America/Denver");
    await p.getByRole("button", { name: "Save time zone" }).click();
    await p.getByText("Times now show in America/Denver").waitFor();
    await p.close();
  });
});

describe("details found on the way (360×640)", () => {
  it("shows a 1,500 lb/ac rate whole in the load sheet, and the QR code inside its frame", async () => {
    const p = await as("dana@cedarflats.example");
    // No job: the starter spec (Dana's job today would fill its own rates).
    await p.goto(`${harness.app.url}/field-math/load?job=none`);
    const rate = p.getByLabel("Rate").first();
    await expect.poll(() => rate.inputValue()).toBe("1500");
    expect(await rate.evaluate((el: HTMLInputElement) => el.scrollWidth <= el.clientWidth)).toBe(true);
    await p.goto(`${harness.app.url}/rigs/CF-07/label`);
    const qr = await p.getByTestId("rig-qr").locator("svg").boundingBox();
    const frame = await p.getByTestId("rig-qr").evaluate((el) => el.parentElement!.getBoundingClientRect().toJSON());
    expect(qr!.x).toBeGreaterThanOrEqual(frame.x);
    expect(qr!.x + qr!.width).toBeLessThanOrEqual(frame.x + frame.width);
    expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await p.close();
  });

  it("keeps placeholders at 7:1 or more", async () => {
    const p = await as("dana@cedarflats.example");
    await p.goto(`${harness.app.url}/rigs/CF-07/fix`);
    const color = await p.getByLabel("Say it in your own words").evaluate((el) => getComputedStyle(el, "::placeholder").color);
    expect(color).toBe("rgb(75, 85, 99)"); // --color-rule, 7.56:1 on white
    await p.close();
  });

  it("home says what each role has, not what is coming", async () => {
    const p = await as("ravi@cedarflats.example");
    await p.getByRole("heading", { name: "Also yours as trainer" }).waitFor();
    await p.getByRole("link", { name: "Guide desk" }).last().waitFor();
    expect(await p.content()).not.toMatch(/coming next/);
    await p.close();
  });
});

export { inView };
