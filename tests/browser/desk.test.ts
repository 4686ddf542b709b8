import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { GuideVersion } from "../../db/index";
import { signIn, appAndBrowserForFile } from "../helpers/app";

const harness = appAndBrowserForFile({ width: 1280, height: 900 });

const caution = (p: Page) => p.getByRole("note", { name: "Shut-down caution" });

describe("guide desk in the browser", () => {
  it("blocks sending a draft whose hands-on step skips the safety stop, with the caution on every desk page", async () => {
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "ravi@cedarflats.example");
    await p.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Guide desk" }).click();
    await caution(p).waitFor();
    await p.getByRole("link", { name: "Vibration or jumping" }).click();
    await caution(p).waitFor();
    await p.getByRole("button", { name: "Edit as your company's copy" }).click();
    await p.waitForURL(/\/desk\/\d+\/v\/\d+$/);
    await caution(p).waitFor();
    await p.getByRole("heading", { name: /Checks pass/ }).waitFor();

    // Point "agitator-only" YES straight at the hands-on paddle check, past its safety stop.
    await p.getByRole("region", { name: "Steps" }).getByRole("button", { name: "agitator-only", exact: true }).click();
    await p.getByLabel("On YES go to").selectOption("look-paddles");
    await p.getByRole("button", { name: "Step “look-paddles”" }).first().waitFor();
    await p.getByText("is hands-on but can be reached without passing a safety step").first().waitFor();
    await p.getByRole("button", { name: "Save draft" }).click();
    await p.getByText("All changes saved.").waitFor();

    await p.getByRole("link", { name: "Versions and review" }).click();
    // The editor has a "Send for review" form of its own: be on the versions page before using this one.
    await p.waitForURL(/\/desk\/\d+$/);
    await caution(p).waitFor();
    await p.getByLabel("Change note for the reviewer").fill("Skip the stop");
    await p.getByRole("button", { name: "Send for review" }).click();
    await p
      .getByRole("alert")
      .filter({ hasText: /Fix \d+ problems? before sending this for review/ })
      .waitFor();
    const drafts = await GuideVersion.findAll({ where: { status: "in_review" } });
    expect(drafts).toHaveLength(0);
    await p.close();
  });

  it("previews a draft as the crew sees it, without making a case", async () => {
    const p = await harness.browser.context.newPage();
    await p.goto(`${harness.app.url}/desk`);
    await p.getByRole("link", { name: "Leaks" }).first().click();
    await p.getByRole("link", { name: "Preview as crew" }).first().click();
    await caution(p).waitFor();
    await p.locator("#step-prompt", { hasText: "cam-lock" }).waitFor();
    await p.getByRole("button", { name: "Yes", exact: true }).click();
    await p.getByRole("button", { name: "Machine is shut down and locked out" }).waitFor();
    await p.close();
  });

  it("edits a step's Spanish beside its English; a changed English marks the Spanish out of date until it is checked", async () => {
    await harness.browser.context.clearCookies();
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "ravi@cedarflats.example");
    await p.goto(`${harness.app.url}/desk`);
    await p.getByRole("link", { name: "Foam in the tank" }).click();
    await p.getByRole("button", { name: "Edit as your company's copy" }).click();
    await p.waitForURL(/\/desk\/\d+\/v\/\d+$/);
    const spanish = p.getByTestId("spanish-status");
    await spanish.getByText("Spanish: complete and up to date").waitFor();
    const selected = p.getByRole("region", { name: "Selected step" });
    const first = (await selected.getByLabel("Step id").inputValue()).trim();
    // Changing the English leaves the Spanish behind: marked on the step, listed, and the crew would see English.
    const english = selected.getByLabel("Prompt (markdown, short)");
    await english.fill(`${await english.inputValue()} Look from the top hatch.`);
    await selected.getByText("Out of date: the English changed after the Spanish was written.", { exact: false }).waitFor();
    await spanish.getByText(/1 out of date/).waitFor();
    await spanish.getByRole("button", { name: first }).waitFor();
    // Bringing the Spanish up to date clears it.
    const es = selected.getByLabel("Prompt in Spanish");
    await es.fill(`${await es.inputValue()} Mira desde la escotilla de arriba.`);
    await selected.getByText("Spanish up to date.").waitFor();
    await spanish.getByText("Spanish: complete and up to date").waitFor();
    // A help text written in English only is missing in Spanish.
    await selected.getByLabel("Help (markdown, shown behind “More about this”)").fill("Use a flashlight.");
    await spanish.getByText(/1 of \d+ steps missing/).waitFor();
    await p.getByRole("button", { name: "Save draft" }).click();
    await p.getByText("All changes saved.").waitFor();
    // The versions page says per version what the Spanish lacks; the preview shows the step in English, marked.
    await p.getByRole("link", { name: "Versions and review" }).click();
    await p.waitForURL(/\/desk\/\d+$/);
    await p
      .getByText(/^Spanish: 1 of \d+ steps missing\./)
      .first()
      .waitFor();
    await p.getByRole("link", { name: "Edit" }).first().click();
    await p.waitForURL(/\/desk\/\d+\/v\/\d+$/);
    await p.getByRole("link", { name: "Preview in Spanish" }).click();
    await p.waitForURL(/\/preview\?lang=es$/);
    await p.getByText("Preview in English").waitFor();
    await p.getByTestId("in-english").waitFor({ timeout: 20_000 });
    await p.locator("#step-prompt", { hasText: "Look from the top hatch" }).waitFor();
    const saved = await GuideVersion.findOne({ where: { status: "draft" }, order: [["id", "DESC"]] });
    expect(saved!.definition.translations?.es?.steps?.[first]?.prompt).toMatch(/Mira desde la escotilla de arriba\.$/);
    await p.close();
  });
});
