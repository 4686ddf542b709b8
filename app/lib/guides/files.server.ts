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

/** The kind a file says it is, even when it has other problems. */
function kindIn(text: string): unknown {
  try {
    return (JSON.parse(text) as { kind?: unknown })?.kind;
  } catch {
    return undefined;
  }
}

/** The guides a card may open: every file of content/guides named by its id (the file name). */
const guideIdsIn = (files: string[]) => files.filter((f) => path.basename(path.dirname(f)) !== "cards").map((f) => path.basename(f, ".json"));

/**
 * Reads and checks each file; also flags two files with the same guide id, a name that is not the
 * id, a card outside content/cards (or a guide inside it), and a card opening a guide not among the files.
 */
export function checkGuideFiles(files: string[], causes: Cause[]): GuideFile[] {
  const guideIds = guideIdsIn(files);
  const results = files.map((file) => {
    const text = fs.readFileSync(file, "utf8");
    const name = path.basename(file, ".json");
    const { guide, problems, warnings } = validateGuide(text, { causes, name, guideIds });
    if (guide && guide.id !== name) problems.push({ guide: guide.id, message: `file name ${path.basename(file)} should be ${guide.id}.json` });
    const inCards = path.basename(path.dirname(file)) === "cards";
    if (inCards !== (kindIn(text) === "card"))
      problems.push({
        guide: guide?.id ?? name,
        message: inCards ? 'a file in content/cards is a rig card: give it "kind": "card"' : 'a rig card ("kind": "card") belongs in content/cards',
      });
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

/** Every shipped file: the guides, then the rig cards. */
export function libraryFiles(root = process.cwd()): string[] {
  const cards = path.join(contentDir(root), "cards");
  return [...guideFilesIn(path.join(contentDir(root), "guides")), ...(fs.existsSync(cards) ? guideFilesIn(cards) : [])];
}

/** The shipped guides and rig cards, checked (throws naming every problem). */
export function loadLibrary(root = process.cwd()): Guide[] {
  const causes = loadCauses(root);
  const results = checkGuideFiles(libraryFiles(root), causes);
  const bad = results.filter((r) => r.problems.length);
  if (bad.length) throw new Error(`Invalid guides:\n${bad.flatMap((r) => r.problems.map((p) => `  ${p.guide}: ${p.message}`)).join("\n")}`);
  return results.map((r) => r.guide!);
}
