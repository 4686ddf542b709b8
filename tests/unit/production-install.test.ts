import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const root = path.resolve(import.meta.dirname, "../..");
const lock = JSON.parse(fs.readFileSync(path.join(root, "package-lock.json"), "utf8")) as { packages: Record<string, { dev?: boolean }> };

describe("what `npm ci --omit=dev` installs", () => {
  // The local fakes (and the multipart and XML parsers the fake S3 pulls in), the TypeScript runner and
  // the outbox's mail parser are for development and tests only.
  it.each(["s3rver", "smtp-server", "tsx", "mailparser", "busboy", "fast-xml-parser"])("leaves out %s", (name) => {
    const entry = lock.packages[`node_modules/${name}`];
    if (entry) expect(entry.dev, `${name} must be a development dependency only`).toBe(true);
  });

  it("still carries what the server needs", () => {
    for (const name of ["express", "helmet", "sharp", "sequelize", "mariadb", "react-router", "rate-limiter-flexible", "mysql2"]) {
      expect(lock.packages[`node_modules/${name}`]?.dev, name).toBeUndefined();
    }
  });
});
