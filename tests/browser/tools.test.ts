import { describe, expect, it } from "vitest";
import { signIn, appAndBrowserForFile } from "../helpers/app";

const harness = appAndBrowserForFile();

describe("field math at 360 px", () => {
  it("fills the load card from a rig and updates as the crew types", async () => {
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    await p.getByRole("link", { name: "Field math" }).click();
    await p.getByRole("link", { name: /Load card/ }).click();
    await p.getByLabel("Filled from rig").selectOption("CF-07");
    await expect.poll(() => p.getByLabel("Tank size").inputValue()).toBe("1500");
    // 1 acre at 1,500 lb/ac of fiber, 50 lb per 100 gal: 750 lb per 1,500 gal load → 2 loads.
    await p.getByTestId("load-count").filter({ hasText: "2 tank loads" }).waitFor();
    await p.getByLabel("Area to cover").fill("3");
    await p.getByTestId("load-count").filter({ hasText: "6 tank loads" }).waitFor();
    await p.getByLabel("Area to cover").fill("-2");
    await p.getByText("Area must be more than 0").waitFor();
    expect(await p.getByTestId("load-count").count()).toBe(0);
    // Nothing on the page is wider than the phone.
    expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await p.close();
  });

  it("shows the hose figure inside the short-throw guide, filled from the rig", async () => {
    await harness.browser.context.clearCookies();
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    await p.goto(`${harness.app.url}/rigs/CF-07/fix`);
    await p.getByRole("button", { name: /Weak or short stream/ }).click();
    await p.waitForURL(/\/walk$/);
    // Throttle at speed, recirculation closed, no froth, no bubbles, hose free of kinks, stream not watery: the hose figure.
    for (const answer of ["Yes", "Yes", "No", "No", "Yes", "No"]) await p.getByRole("button", { name: answer, exact: true }).click();
    const widget = p.getByRole("region", { name: "Hose friction for this rig" });
    await widget.waitFor();
    // CF-07 carries 300 ft of 1½ in hose: 3 sections of 100 ft, C = 24 (Rohnert Park).
    await expect.poll(() => widget.getByLabel("100 ft sections").inputValue()).toBe("3");
    // No verdict until the crew confirms or types the flow: the rated flow is a start, not a measurement.
    await widget.getByRole("button", { name: /Use the rated 250 gpm/ }).waitFor();
    expect(await widget.getByText(/Friction loss/).count()).toBe(0);
    await widget.getByLabel("Flow through the hose").fill("100");
    await widget.getByText(/Friction loss: 72 psi/).waitFor();
    await widget.getByText(/Slurry loses more than water/).waitFor();
    await widget.getByText(/hose is eating most of the pressure/).waitFor();
    expect(await widget.getByText(/Rohnert Park/).isVisible()).toBe(false);
    await p.close();
  });
});
