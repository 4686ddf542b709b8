/** Reading the shipped library from content/ (server and CLI only: uses the file system). */
import fs from "node:fs";
import path from "node:path";
import { causeListSchema, type Cause } from "./causes";
import { validateGuide, type GuideProblem } from "./validate";
import type { Guide } from "./schema";

export const contentDir = (root = process.cwd()) => path.resolve(root, "content");

export function loadCauses(root = process.cwd()): Cause[] {
  const file = path.join(contentDir(root), "causes.json");
  return causeListSchema.parse(JSON.parse(fs.readFileSync(file, "utf8")));
}

export interface GuideFile {
  file: string;
  text: string;
  guide: Guide | null;
  problems: GuideProblem[];
  warnings: GuideProblem[];
}

export function guideFilesIn(dir: string): string[] {
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((f) => path.join(dir, f));
}

/** Reads and checks each file; also flags two files with the same guide id, and a name that is not the id. */
export function checkGuideFiles(files: string[], causes: Cause[]): GuideFile[] {
  const results = files.map((file) => {
    const text = fs.readFileSync(file, "utf8");
    const name = path.basename(file, ".json");
    const { guide, problems, warnings } = validateGuide(text, { causes, name });
    if (guide && guide.id !== name) problems.push({ guide: guide.id, message: `file name ${path.basename(file)} should be ${guide.id}.json` });
    return { file, text, guide: problems.length ? null : guide, problems, warnings };
  });
  const seen = new Map<string, string>();
  for (const r of results) {
    const id = r.guide?.id;
    if (!id) continue;
    if (seen.has(id)) {
      r.problems.push({ guide: id, message: `guide id "${id}" is also used by ${path.basename(seen.get(id)!)}` });
      r.guide = null;
    } else seen.set(id, r.file);
  }
  return results;
}

export function loadLibrary(root = process.cwd()): Guide[] {
  const causes = loadCauses(root);
  const results = checkGuideFiles(guideFilesIn(path.join(contentDir(root), "guides")), causes);
  const bad = results.filter((r) => r.problems.length);
  if (bad.length) throw new Error(`Invalid guides:\n${bad.flatMap((r) => r.problems.map((p) => `  ${p.guide}: ${p.message}`)).join("\n")}`);
  return results.map((r) => r.guide!);
}
