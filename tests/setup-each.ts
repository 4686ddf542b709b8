import { afterAll, afterEach, beforeEach, inject } from "vitest";
import { registerLanguage } from "../app/i18n";
import en from "../app/locales/en";

// Components drawn outside the app (Testing Library) speak English, as the app's default.
registerLanguage("en", en);

for (const [key, value] of Object.entries(inject("serviceEnv"))) process.env[key] = value;

// A test fails on an unexpected console.error; tests that expect one call expectConsoleError().
const seen: unknown[][] = [];
let allowed = 0;
const original = console.error;
console.error = (...args: unknown[]) => {
  seen.push(args);
  original(...args);
};
beforeEach(() => {
  seen.length = 0;
  allowed = 0;
});
afterEach(() => {
  if (seen.length > allowed) throw new Error(`Unexpected console.error: ${seen.map((a) => a.map(String).join(" ")).join("\n")}`);
});
afterAll(async () => {
  // Each file gets its own process-wide Sequelize; close it so the pool does not linger.
  const { closeDb } = await import("../db/index");
  await closeDb();
});

export function expectConsoleError(count = 1) {
  allowed += count;
}
