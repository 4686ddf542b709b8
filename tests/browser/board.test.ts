import { describe, expect, it } from "vitest";
import { seedDemoHistory } from "../../seeds/demo-history";
import { appAndBrowserForFile, signIn } from "../helpers/app";

const harness = appAndBrowserForFile();

describe("supervisor screens on a phone (360 px)", () => {
  it("shows which rig to look at first and the top cause, and nothing is wider than the phone", async () => {
    await seedDemoHistory(new Date(), () => {});
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "mo@cedarflats.example");
    await p.getByRole("link", { name: "Fault board" }).click();
    const first = p.getByRole("region", { name: "What to act on" });
    await first.getByText(/CF-03.* fails? more often than the rest of the fleet/).waitFor();
    await first.getByText("A flag is a prompt to look, not a verdict", { exact: false }).waitFor();
    expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await p.getByRole("link", { name: "Cases", exact: true }).click();
    await p.getByRole("link", { name: /Download these [\d,]+ cases as CSV/ }).waitFor();
    expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await p.close();
  });
});
