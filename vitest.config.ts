import path from "node:path";
import { defineConfig } from "vitest/config";

// Separate from vite.config.ts: the React Router plugin must not load under Vitest.
export default defineConfig({
  resolve: { alias: { "~": path.resolve(import.meta.dirname, "app") } },
  test: {
    include: ["tests/**/*.test.{ts,tsx}"],
    globalSetup: ["tests/global-setup.ts"],
    setupFiles: ["tests/setup-each.ts"],
    // Integration and browser files share one database server; run files one at a time.
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 120_000,
    reporters: ["default", ["json", { outputFile: ".data/test-report.json" }]],
  },
});
