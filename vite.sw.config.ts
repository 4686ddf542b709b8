/**
 * Builds the service worker (app/sw) after the app: one classic script at build/client/sw.js,
 * with the list of built files to keep on the phone written into it.
 */
import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { defineConfig, type Plugin } from "vite";

const client = path.resolve(import.meta.dirname, "build/client");
// Scripts, styles and the shipped font: everything a kept page needs to run and look right.
const KEEP = /\.(js|css|woff2)$/;

function precacheManifest(): Plugin {
  const id = "virtual:precache-manifest";
  return {
    name: "tankside-precache-manifest",
    resolveId: (source) => (source === id ? `\0${id}` : null),
    load(source) {
      if (source !== `\0${id}`) return null;
      const assets = fs
        .readdirSync(path.join(client, "assets"))
        .filter((f) => KEEP.test(f))
        .sort()
        // Built assets carry a content hash in their names, so they need no revision.
        .map((f) => ({ url: `/assets/${f}`, revision: null as string | null }));
      const favicon = fs.readFileSync(path.join(client, "favicon.svg"));
      const entries = [...assets, { url: "/favicon.svg", revision: createHash("sha256").update(favicon).digest("hex").slice(0, 16) }];
      return `export default ${JSON.stringify(entries)};`;
    },
  };
}

export default defineConfig({
  publicDir: false,
  resolve: { tsconfigPaths: true },
  plugins: [precacheManifest()],
  define: { "process.env.NODE_ENV": JSON.stringify("production") },
  build: {
    outDir: client,
    emptyOutDir: false,
    copyPublicDir: false,
    minify: true,
    lib: { entry: path.resolve(import.meta.dirname, "app/sw/service-worker.ts"), formats: ["iife"], name: "tanksideServiceWorker", fileName: () => "sw.js" },
  },
});
