/**
 * The production server (`npm start` and the browser tests): Express in front of the React Router
 * build, as React Router's own Express set-up does, with what every response needs on the way out —
 * security headers from helmet (a Content-Security-Policy with a fresh nonce per response for the
 * framework's inline scripts), a same-origin check on every request that changes something, and an
 * access log that never shows a sign-in link's token. Plain JavaScript so it runs on `node` alone.
 */
import cluster from "node:cluster";
import { randomBytes } from "node:crypto";
import os from "node:os";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { createRequestHandler } from "@react-router/express";
import compression from "compression";
import express from "express";
import helmet from "helmet";
import morgan from "morgan";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);
/** Pages whose address holds a single-use token: no Referer leaves them, no log line shows them. */
const TOKEN_PAGES = /^\/(join|reset)\/[^/?#]+/;

const originOf = (url) => {
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
};

/** The Express app around a server build; `appUrl` is the one origin that may send changes. */
export async function createApp({ buildPath = path.resolve("build/server/index.js"), appUrl = process.env.APP_URL, logStream = process.stdout } = {}) {
  const ownOrigin = originOf(appUrl);
  if (!ownOrigin) throw new Error(`APP_URL must be the app's public address, like https://tankside.example (got ${appUrl})`);
  const https = ownOrigin.startsWith("https:");
  const build = await import(pathToFileURL(buildPath).href);
  const app = express();
  app.disable("x-powered-by");

  // Behind a load balancer, TRUST_PROXY (e.g. "1" or "loopback") lets req.ip be the phone's address.
  if (process.env.TRUST_PROXY) app.set("trust proxy", /^\d+$/.test(process.env.TRUST_PROXY) ? Number(process.env.TRUST_PROXY) : process.env.TRUST_PROXY);
  // A fresh nonce per response, and the client's address for throttling: the app reads both from
  // headers set here, overwriting anything a client sent under those names.
  app.use((req, res, next) => {
    res.locals.nonce = randomBytes(16).toString("base64");
    req.headers["x-tankside-nonce"] = res.locals.nonce;
    req.headers["x-tankside-client-ip"] = req.ip ?? "unknown";
    next();
  });
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'", (_req, res) => `'nonce-${res.locals.nonce}'`],
          // Style attributes (chart libraries set them) are not scripts; scripts get no 'unsafe-inline'.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", "data:", "blob:"],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          workerSrc: ["'self'"],
          manifestSrc: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          frameAncestors: ["'none'"],
          ...(https ? { upgradeInsecureRequests: [] } : {}),
        },
      },
      crossOriginEmbedderPolicy: false,
      crossOriginOpenerPolicy: { policy: "same-origin" },
      referrerPolicy: { policy: "same-origin" },
      strictTransportSecurity: https ? { maxAge: 31_536_000, includeSubDomains: true } : false,
    }),
  );
  app.use((req, res, next) => {
    // The camera only for photos at a step; nothing else a page might ask the phone for.
    res.setHeader("Permissions-Policy", "camera=(self), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()");
    if (TOKEN_PAGES.test(req.path)) res.setHeader("Referrer-Policy", "no-referrer");
    next();
  });

  // Cross-site requests: anything that changes something must come from this app's own pages.
  app.use((req, res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get("origin") ?? originOf(req.get("referer") ?? "");
    if (origin === ownOrigin) return next();
    res.status(403).json({ error: "Refused: this request did not come from Tankside's own pages." });
  });

  app.use(compression());
  app.use("/assets", express.static(path.resolve(path.dirname(buildPath), "../client/assets"), { immutable: true, maxAge: "1y" }));
  app.use(express.static(path.resolve(path.dirname(buildPath), "../client")));
  app.use(express.static("public", { maxAge: "1h" }));
  morgan.token("safe-url", (req) => req.originalUrl.replace(TOKEN_PAGES, "/$1/[token]"));
  app.use(morgan(":method :safe-url :status :res[content-length] - :response-time ms", { stream: logStream }));
  app.all("*", createRequestHandler({ build, mode: process.env.NODE_ENV }));
  return app;
}

// `node server.js`: serve on HOST:PORT, in APP_PROCESSES processes (a number, or "auto" for one
// per core; default 1). The processes share nothing but the database, so a sign-in made on one
// works on every other; each answers with its number in X-Tankside-Process.
if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const wanted = process.env.APP_PROCESSES === "auto" ? os.availableParallelism() : Number(process.env.APP_PROCESSES ?? 1);
  const processes = Number.isInteger(wanted) && wanted >= 1 ? Math.min(wanted, 64) : 1;
  if (processes > 1 && cluster.isPrimary) await supervise(processes);
  else await serve(cluster.isWorker ? Number(process.env.TANKSIDE_PROCESS) : null);
}

async function serve(processNumber) {
  const port = Number(process.env.PORT ?? 3000);
  const host = process.env.HOST ?? "127.0.0.1";
  process.env.NODE_ENV ??= "production";
  const app = await createApp({ appUrl: process.env.APP_URL ?? `http://${host}:${port}` });
  const server = (
    processNumber
      ? express()
          .use((_req, res, next) => (res.setHeader("X-Tankside-Process", String(processNumber)), next()))
          .use(app)
      : app
  ).listen(port, host, () => console.log(`[tankside] http://${host}:${port}${processNumber ? ` (process ${processNumber})` : ""}`));
  // Stop taking requests, let the ones under way finish (a few seconds at most), then exit: the
  // database pools would otherwise keep the process alive.
  for (const signal of ["SIGTERM", "SIGINT"]) {
    process.once(signal, () => {
      server.close(() => process.exit(0));
      server.closeIdleConnections();
      setTimeout(() => process.exit(0), 3000).unref();
    });
  }
}

/** Runs the app processes; one that dies is replaced, and a stop signal stops them all. */
async function supervise(processes) {
  let stopping = false;
  const start = (n) => cluster.fork({ TANKSIDE_PROCESS: String(n) }).on("exit", () => !stopping && start(n));
  for (let n = 1; n <= processes; n++) start(n);
  for (const signal of ["SIGTERM", "SIGINT"]) {
    process.once(signal, () => {
      stopping = true;
      for (const worker of Object.values(cluster.workers ?? {})) worker?.kill("SIGTERM");
      const check = setInterval(() => Object.keys(cluster.workers ?? {}).length === 0 && process.exit(0), 100);
      setTimeout(() => process.exit(0), 5000).unref();
      check.unref?.();
    });
  }
}
