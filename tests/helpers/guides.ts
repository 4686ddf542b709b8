import fs from "node:fs";
import path from "node:path";
import { loadCauses } from "~/lib/guides/files.server";
import type { Guide } from "~/lib/guides/schema";

export const root = path.resolve(import.meta.dirname, "../..");
export const causes = loadCauses(root);
export const fixture = (...parts: string[]) => path.join(root, "tests/fixtures", ...parts);
export const tinyGuide = (): Guide => JSON.parse(fs.readFileSync(fixture("guides", "tiny.json"), "utf8"));

/** How many phrases find their guide in the top 3, printed with the misses (the search tests' measure). */
export function topThreeRate(label: string, search: (q: string) => { slug: string }[], phrases: [string, string][]): number {
  const misses: string[] = [];
  for (const [phrase, slug] of phrases) {
    const top = search(phrase)
      .slice(0, 3)
      .map((h) => h.slug);
    if (!top.includes(slug)) misses.push(`${phrase} → ${top.join(", ") || "nothing"} (wanted ${slug})`);
  }
  const rate = (phrases.length - misses.length) / phrases.length;
  console.info(
    `${label} top-3 hit rate: ${(rate * 100).toFixed(1)} % (${phrases.length - misses.length}/${phrases.length})${misses.length ? `; misses: ${misses.join("; ")}` : ""}`,
  );
  return rate;
}
