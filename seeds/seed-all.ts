import { loadLibrary } from "../app/lib/guides/files";
import { seedDemo } from "./demo";
import { importBuiltinGuides } from "./import-guides";

/** Everything the first start puts in the database. Safe to run on every start. */
export async function seedAll(log: (line: string) => void = console.log): Promise<void> {
  await seedDemo(log);
  const { created, updated } = await importBuiltinGuides(loadLibrary());
  if (created || updated) log(`Guide library: ${created} new, ${updated} updated.`);
}
