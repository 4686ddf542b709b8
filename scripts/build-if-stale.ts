/** Builds the app when the sources changed since the last build (or there is none). */
import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

const INPUTS = ["app", "content", "db", "seeds", "package-lock.json", "vite.config.ts", "vite.sw.config.ts", "react-router.config.ts", "tsconfig.json"];

function hashTree(root: string): string {
  const hash = createHash("sha256");
  const walk = (p: string) => {
    if (!fs.existsSync(p)) return;
    const stat = fs.statSync(p);
    if (stat.isDirectory()) {
      for (const name of fs.readdirSync(p).sort()) walk(path.join(p, name));
    } else {
      hash.update(path.relative(root, p));
      hash.update(fs.readFileSync(p));
    }
  };
  for (const input of INPUTS) walk(path.join(root, input));
  return hash.digest("hex");
}

export function buildIfStale(root = process.cwd(), log: (line: string) => void = console.log): boolean {
  const stamp = path.join(root, "build", ".source-hash");
  const current = hashTree(root);
  if (fs.existsSync(path.join(root, "build/server/index.js")) && fs.existsSync(stamp) && fs.readFileSync(stamp, "utf8") === current) {
    return false;
  }
  log("Building the app…");
  // Always a production build, even when called from the tests (where NODE_ENV is "test").
  const run = (bin: string, args: string[]) =>
    execFileSync(path.join(root, "node_modules/.bin", bin), args, {
      cwd: root,
      stdio: ["ignore", "ignore", "inherit"],
      env: { ...process.env, NODE_ENV: "production" },
    });
  run("react-router", ["build"]);
  // The service worker lists the built files, so it is built after them.
  run("vite", ["build", "-c", "vite.sw.config.ts"]);
  fs.writeFileSync(stamp, current);
  return true;
}
