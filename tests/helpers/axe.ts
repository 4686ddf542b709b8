import fs from "node:fs";
import { createRequire } from "node:module";
import type { Page } from "playwright-core";

const axeSource = fs.readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");

export interface AxeFinding {
  rule: string;
  help: string;
  targets: string[];
}

/**
 * Runs axe-core in the page with WCAG 2.x A, AA and AAA rules (AAA brings the 7:1 text contrast,
 * `color-contrast-enhanced`) and returns what it found, one line per rule and element.
 */
export async function axeFindings(page: Page): Promise<AxeFinding[]> {
  // Evaluated through the browser's DevTools channel: a <script> tag would (rightly) be refused by the app's CSP.
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: unknown[] }> } }).axe;
    const result = await axe.run(document, {
      runOnly: { type: "tag", values: ["wcag2a", "wcag2aa", "wcag2aaa", "wcag21a", "wcag21aa", "wcag22aa", "best-practice"] },
      resultTypes: ["violations"],
    });
    return result.violations as { id: string; help: string; nodes: { target: string[] }[] }[];
  });
  return violations.map((v) => ({ rule: v.id, help: v.help, targets: v.nodes.map((n) => n.target.join(" ")) }));
}
