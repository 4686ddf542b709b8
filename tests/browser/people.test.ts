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
    await harness.browser.context.clearCookies();
    const nell = await harness.browser.context.newPage();
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
    await nell.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Guide desk" }).waitFor();

    // Her name at the top opens her account, where she changes the password.
    await nell.getByRole("link", { name: /^Your account: Nell Ostrander/ }).click();
    await nell.getByLabel("Current password").fill("mulch over every slope");
    await nell.getByLabel("New password").fill("tackifier in the mix");
    await nell.getByLabel("The same password again").fill("tackifier in the mix");
    await nell.getByRole("button", { name: "Change password" }).click();
    await nell.getByRole("status").getByText("Password changed.", { exact: false }).waitFor();
    expect(await nell.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await nell.close();
  });

  it("the sign-in page leads to a new-password link by e-mail", async () => {
    await harness.browser.context.clearCookies();
    const p = await harness.browser.context.newPage();
    await p.goto(`${harness.app.url}/login`);
    await p.getByRole("link", { name: "Forgot your password?" }).click();
    await p.getByLabel("E-mail").fill("dana@cedarflats.example");
    const before = (await outbox()).length;
    await p.getByRole("button", { name: "Send me a link" }).click();
    await p.getByRole("status").getByText("a link to choose a new password is on its way", { exact: false }).waitFor();
    // The page answers before the mail goes: wait for it to arrive.
    const resetMail = async () =>
      (await outbox()).slice(before).find((m) => m.to.includes("dana@cedarflats.example") && m.subject === "Choose a new Tankside password");
    await expect.poll(resetMail, { timeout: 10_000 }).toBeTruthy();
    await p.goto((await resetMail())!.text.match(/http:\/\/\S+\/reset\/\S+/)![0]);
    await p.getByLabel("Password", { exact: true }).fill("hose reel wound tight");
    await p.getByLabel("The same password again").fill("hose reel wound tight");
    await p.getByRole("button", { name: "Save password and sign in" }).click();
    await p.getByRole("heading", { name: "Hi Dana. Which rig?" }).waitFor();
    await p.close();
  });
});
