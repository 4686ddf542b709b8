import fs from "node:fs";
import path from "node:path";
import { loadCauses } from "~/lib/guides/files.server";
import type { Guide } from "~/lib/guides/schema";

export const root = path.resolve(import.meta.dirname, "../..");
export const causes = loadCauses(root);
export const fixture = (...parts: string[]) => path.join(root, "tests/fixtures", ...parts);
export const tinyGuide = (): Guide => JSON.parse(fs.readFileSync(fixture("guides", "tiny.json"), "utf8"));
