import { describe, expect, it } from "vitest";
import { appAndBrowserForFile, signIn } from "../helpers/app";
import { outbox } from "../helpers/outbox";

const harness = appAndBrowserForFile();

describe("people on a phone (360 px)", () => {
  it("an admin invites someone, who follows the mailed link, chooses a password and is in", async () => {
    const admin = await harness.browser.context.newPage();
    await signIn(admin, harness.app.url, "june@cedarflats.example");
    await admin.getByRole("link", { name: "People" }).click();
    await admin.getByLabel("Name").fill("Nell Ostrander");
    await admin.getByLabel("E-mail").fill("nell@cedarflats.example");
    await admin.getByLabel("Role").first().selectOption("trainer");
    await admin.getByRole("button", { name: "Send invitation" }).click();
    await admin.getByRole("status").getByText("Invitation sent to nell@cedarflats.example").waitFor();
    await admin.getByRole("region", { name: "Invitations not yet used" }).getByText("Nell Ostrander").waitFor();
    expect(await admin.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await admin.close();

    const mail = (await outbox()).filter((m) => m.to.includes("nell@cedarflats.example")).at(-1)!;
    const link = mail.text.match(/http:\/\/\S+\/join\/\S+/)![0];
    expect(link.startsWith(harness.app.url)).toBe(true);

    // The invitee, on their own phone: not signed in.
    const context = await harness.browser.context.browser()!.newContext({ viewport: { width: 360, height: 640 } });
    const nell = await context.newPage();
    await nell.goto(link);
    await nell.getByText("Welcome, Nell Ostrander.", { exact: false }).waitFor();
    await nell.getByLabel("Password", { exact: true }).fill("short");
    await nell.getByLabel("The same password again").fill("short");
    await nell.getByRole("button", { name: "Choose password and sign in" }).click();
    await nell.getByText("Use at least 10 characters", { exact: false }).waitFor();
    await nell.getByLabel("Password", { exact: true }).fill("mulch over every slope");
    await nell.getByLabel("The same password again").fill("mulch over every slope");
    await nell.getByRole("button", { name: "Choose password and sign in" }).click();
    await nell.getByRole("heading", { name: "Hi Nell. Which rig?" }).waitFor();
    // A trainer sees the guide desk in the menu.
    await nell.getByRole("link", { name: "Guide desk" }).waitFor();
    await context.close();
  });
});
