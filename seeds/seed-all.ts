import { loadLibrary } from "../app/lib/guides/files.server";
import { seedDemo } from "./demo";
import { seedDemoHistory } from "./demo-history";
import { seedServiceHistory } from "./demo-service";
import { importBuiltinGuides } from "./import-guides";

/**
 * Everything a start puts in the database; safe to run on every start. The two seasons of demo
 * history is added only with `history` (npm start), not for the tests' clean databases.
 */
export async function seedAll({ history = false, log = console.log }: { history?: boolean; log?: (line: string) => void } = {}): Promise<void> {
  const fresh = await seedDemo(log);
  const { created, updated } = await importBuiltinGuides(loadLibrary());
  if (created || updated) log(`Guide library: ${created} new, ${updated} updated.`);
  if (fresh && history) {
    await seedDemoHistory(new Date(), log);
    log(`Demo service records: ${await seedServiceHistory(new Date())}.`);
  }
}
