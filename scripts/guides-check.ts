/** `npm run guides:check [files…]`: checks guide and rig card files (default: all of content/guides and content/cards). Exit 1 on any problem. */
import path from "node:path";
import { checkGuideFiles, libraryFiles, loadCauses } from "../app/lib/guides/files.server";
import { describeProblem } from "../app/lib/guides/validate";

const args = process.argv.slice(2);
const files = args.length ? args.map((f) => path.resolve(f)) : libraryFiles();
const results = checkGuideFiles(files, loadCauses());
let bad = 0;
for (const r of results) {
  for (const w of r.warnings) console.log(`WARN ${path.relative(process.cwd(), r.file)}: ${describeProblem(w)}`);
  if (r.problems.length === 0) {
    console.log(`ok   ${path.relative(process.cwd(), r.file)}`);
    continue;
  }
  bad++;
  for (const p of r.problems) console.log(`FAIL ${path.relative(process.cwd(), r.file)}: ${describeProblem(p)}`);
}
console.log(`${results.length - bad} of ${results.length} guide files valid`);
process.exit(bad ? 1 : 0);
