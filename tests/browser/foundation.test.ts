import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { Rig } from "../../db/index";
import { failSignIn, signIn, appAndBrowserForFile } from "../helpers/app";

const harness = appAndBrowserForFile();

async function freshPage() {
  await harness.browser.context.clearCookies();
  return harness.browser.context.newPage();
}

const navLabels = async (p: Page) => (await p.getByRole("navigation", { name: "Main" }).getByRole("link").allTextContents()).map((s) => s.trim());

describe("sign-in and navigation at 360 px", () => {
  it.each([
    ["dana@cedarflats.example", "Crew", ["Start a fix", "Rigs", "Jobs", "Field math"]],
    ["ravi@cedarflats.example", "Trainer", ["Start a fix", "Rigs", "Jobs", "Field math", "Guide desk"]],
    ["mo@cedarflats.example", "Supervisor", ["Start a fix", "Rigs", "Jobs", "Field math", "Guide desk", "Fault board", "Cases"]],
    [
      "june@cedarflats.example",
      "Admin",
      ["Start a fix", "Rigs", "Jobs", "Field math", "Guide desk", "Fault board", "Cases", "Add a rig", "People", "Outbox", "Company"],
    ],
  ])("%s sees the %s navigation and their company", async (email, role, expected) => {
    const p = await freshPage();
    await signIn(p, harness.app.url, email);
    await p.getByRole("link", { name: new RegExp(`^Your account: .*, ${role} at Cedar Flats Erosion Control$`) }).waitFor();
    await p.getByText("Cedar Flats Erosion Control").waitFor();
    expect(await navLabels(p)).toEqual(expected);
    expect(await p.getByText("BM-01").count()).toBe(0);
    await p.close();
  });

  it("refuses a wrong password with one message and sets no cookie", async () => {
    const p = await freshPage();
    expect(await failSignIn(p, harness.app.url, "dana@cedarflats.example", "not-the-password")).toBe(401);
    await expect(p.getByRole("alert").textContent()).resolves.toMatch(/do not match an account/);
    expect((await harness.browser.context.cookies()).filter((c) => c.name === "__tankside")).toHaveLength(0);
    await p.close();
  });
});

describe("company and role boundaries", () => {
  it("gives crew a 404 for another company's rig", async () => {
    const p = await freshPage();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    const res = await p.goto(`${harness.app.url}/rigs/BM-01`);
    expect(res!.status()).toBe(404);
    await p.getByRole("heading", { name: "Not found" }).waitFor();
    await p.close();
  });

  it("gives crew a 403 on the admin rig form", async () => {
    const p = await freshPage();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    const res = await p.goto(`${harness.app.url}/rigs/new`);
    expect(res!.status()).toBe(403);
    await p.getByRole("heading", { name: "Not for your role" }).waitFor();
    await p.close();
  });

  it("shows an admin each bad rig field next to it and saves nothing", async () => {
    const before = await Rig.count();
    const p = await freshPage();
    await signIn(p, harness.app.url, "june@cedarflats.example");
    await p.goto(`${harness.app.url}/rigs/new`);
    await p.getByLabel("Unit code").fill("no good!");
    await p.getByLabel("Tank size (US gal)").fill("20");
    await p.getByLabel("Hose inside diameter (in)").fill("9");
    await p.getByRole("button", { name: "Save rig" }).click();
    const code = p.getByLabel("Unit code");
    await expect(code.getAttribute("aria-invalid")).resolves.toBe("true");
    await p.getByText("Use letters and digits with at most one dash").waitFor();
    await p.getByText("A tank under 100 gal is not a hydroseeding rig.").waitFor();
    await p.getByText("Hose over 4 in is not a slurry hose.").waitFor();
    await p.getByText("Name the rig.").waitFor();
    expect(await Rig.count()).toBe(before);
    await p.close();
  });
});
