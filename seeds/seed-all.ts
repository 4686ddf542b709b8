import { seedDemo } from "./demo";

/** Everything the first start puts in an empty database. Safe to run again. */
export async function seedAll(log: (line: string) => void = console.log): Promise<void> {
  await seedDemo(log);
}
