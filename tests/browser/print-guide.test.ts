import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { loadLibrary } from "~/lib/guides/files.server";
import { root } from "../helpers/guides";
import { appAndBrowserForFile, signIn } from "../helpers/app";

const harness = appAndBrowserForFile();
const library = loadLibrary(root);
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "guide-print-"));

/** Prints the page to PDF as Chromium does on Letter paper and counts its pages. */
async function pagesOf(p: import("playwright-core").Page, name: string): Promise<number> {
  const pdf = path.join(dir, `${name}.pdf`);
  await p.pdf({ path: pdf, format: "Letter", printBackground: true });
  return Number(/^Pages:\s+(\d+)$/m.exec(execFileSync("pdfinfo", [pdf], { encoding: "utf8" }))![1]);
}

describe("every shipped guide and card on one printed page", () => {
  it.each(["en", "es"] as const)("in %s, each prints to exactly one Letter page with every step, stop and end on it", async (lang) => {
    await harness.browser.context.clearCookies();
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    await p.emulateMedia({ media: "print" });
    const counts: Record<string, number> = {};
    for (const guide of library) {
      await p.goto(`${harness.app.url}/guides/${guide.id}/print?lang=${lang}&rig=CF-07`);
      const sheet = p.getByTestId("printed-guide");
      await p.locator('[data-testid="printed-guide"][data-fits="yes"]').waitFor();
      // Every step is a box, every stop carries its checklist, and the page names version and rig.
      expect(await p.getByTestId("print-flow").locator("section").count()).toBe(Object.keys(guide.states).length);
      const stops = Object.values(guide.states).filter((s) => s.meta.kind === "safety").length;
      expect(await sheet.locator('section[data-kind="safety"]').count()).toBe(stops);
      await sheet.getByText(lang === "es" ? /Versión \d+ · publicada/ : /Version \d+ · published/).waitFor();
      await sheet.getByText(lang === "es" ? "para el equipo CF-07" : "for rig CF-07", { exact: false }).waitFor();
      counts[guide.id] = await pagesOf(p, `${guide.id}-${lang}`);
    }
    console.info(`printed pages (${lang}): ${JSON.stringify(counts)}`);
    expect(Object.entries(counts).filter(([, n]) => n !== 1)).toEqual([]);
    expect(Object.keys(counts)).toHaveLength(library.length);
    await p.close();
  });

  it("prints in Spanish with the answers, the stop band, the cause and a QR code back to the guide on that rig", async () => {
    await harness.browser.context.clearCookies();
    const p = await harness.browser.context.newPage();
    await signIn(p, harness.app.url, "dana@cedarflats.example");
    // The crew reaches it from the fix page's "Guides on paper".
    await p.goto(`${harness.app.url}/rigs/CF-07/fix`);
    await p.getByText("Guides on paper").click();
    await p.getByRole("link", { name: "Print Pump loses prime" }).click();
    await p.waitForURL(/\/guides\/lost-prime\/print\?rig=CF-07$/);
    await p.getByLabel("Language").selectOption("es");
    await p.getByRole("button", { name: "Show" }).click();
    await p.waitForURL(/lang=es/);
    const sheet = p.getByTestId("printed-guide");
    await sheet.getByText("La bomba pierde el cebado", { exact: true }).waitFor();
    const first = sheet.locator("section").first();
    await first.getByText("¿El agua del tanque está bien arriba de la salida del sumidero?", { exact: false }).waitFor();
    await first.getByText(/Sí\s→\s2 · No\s→\s\d+/).waitFor();
    const stop = sheet.locator('section[data-kind="safety"]').first();
    await stop.getByText("ALTO DE SEGURIDAD: marca cada uno", { exact: false }).waitFor();
    await stop.getByText("☐ Motor apagado, llave en tu bolsillo").waitFor();
    await sheet.locator('section[data-kind="fixed"]').getByText("Causa: Agua del tanque por debajo de la salida del sumidero").waitFor();
    await sheet.getByRole("img", { name: /\/rigs\/CF-07\/fix\?guide=lost-prime$/ }).waitFor();
    // The QR leads back to the fix page, which offers that guide first.
    await p.goto(`${harness.app.url}/rigs/CF-07/fix?guide=lost-prime`);
    await p
      .getByRole("region", { name: "The guide on your printed page" })
      .getByRole("button", { name: /Pump loses prime/ })
      .waitFor();
    await p.close();
  });
});
