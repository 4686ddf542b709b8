import mysql from "mysql2";
import { RateLimiterMySQL, type RateLimiterRes } from "rate-limiter-flexible";
import { onDbClose } from "../../db/index";

/**
 * Throttling of sign-in and password links, kept in MariaDB (table `rate_limits`) so every app
 * process counts together. Keys are the client and the typed address+client: an unknown address
 * is throttled exactly like a known one, so the answer never tells who has an account, and nobody
 * can lock someone else out (only their own client is slowed).
 */
const MINUTE = 60;
let pool: mysql.Pool | undefined;

function store() {
  if (!pool) {
    const url = new URL(process.env.DATABASE_URL!);
    pool = mysql.createPool({
      host: url.hostname,
      port: Number(url.port || 3306),
      user: decodeURIComponent(url.username),
      password: decodeURIComponent(url.password),
      database: decodeURIComponent(url.pathname.slice(1)),
      connectionLimit: 5,
    });
    onDbClose(() => new Promise<void>((resolve) => pool!.end(() => resolve())).then(() => void (pool = undefined)));
  }
  return pool;
}

const limiters = new Map<string, RateLimiterMySQL>();
function limiter(keyPrefix: string, points: number, durationSeconds: number): RateLimiterMySQL {
  let l = limiters.get(keyPrefix);
  if (!l || (l as unknown as { client: unknown }).client !== store()) {
    const db = new URL(process.env.DATABASE_URL!).pathname.slice(1);
    l = new RateLimiterMySQL({
      storeClient: store(),
      storeType: "pool",
      dbName: decodeURIComponent(db),
      tableName: "rate_limits",
      tableCreated: true,
      clearExpiredByTimeout: false,
      keyPrefix,
      points,
      duration: durationSeconds,
    });
    limiters.set(keyPrefix, l);
  }
  return l;
}

/** Failed sign-ins: 30 per client in 15 minutes; 5 per address from one client, then a back-off that doubles. */
const signInByClient = () => limiter("signin-client", 30, 15 * MINUTE);
const signInByAccount = () => limiter("signin-account", 5, 60 * MINUTE);
/** Password-link requests: 10 per client an hour (each address also gets at most 3 links an hour). */
const linksByClient = () => limiter("links-client", 10, 60 * MINUTE);

export const FREE_FAILURES = 5;
/** Seconds to wait after the n-th failure beyond the free ones: 30 s, 60 s, 2 min … at most 15 min. */
export const backOffSeconds = (beyondFree: number) => Math.min(30 * 2 ** (beyondFree - 1), 15 * MINUTE);

/** The client's address as server.js passes it (never taken from the client itself). */
export const clientOf = (request: Request) => request.headers.get("x-tankside-client-ip") ?? "unknown";
const accountKey = (email: string, request: Request) => `${email.trim().toLowerCase()}|${clientOf(request)}`;

function tooMany(retrySeconds: number, what: string): never {
  const seconds = Math.max(1, Math.ceil(retrySeconds));
  throw Response.json(
    { error: `Too many tries ${what}. Wait ${seconds < 90 ? `${seconds} seconds` : `${Math.ceil(seconds / 60)} minutes`} and try again.` },
    { status: 429, headers: { "Retry-After": String(seconds) } },
  );
}

const blockedFor = (res: RateLimiterRes | null, points: number) => (res && res.consumedPoints > points ? res.msBeforeNext / 1000 : 0);

/** Before checking a password: stops with 429 (and Retry-After) while this client or this address+client must wait. */
export async function checkSignInAllowed(email: string, request: Request) {
  const [byClient, byAccount] = await Promise.all([signInByClient().get(clientOf(request)), signInByAccount().get(accountKey(email, request))]);
  const forAddress = blockedFor(byAccount, FREE_FAILURES);
  const fromHere = blockedFor(byClient, 30);
  if (forAddress > 0 || fromHere > 0)
    tooMany(Math.max(forAddress, fromHere), forAddress >= fromHere ? "with this address from here" : "from this device or network");
}

/** After a wrong password (or an unknown address): counts it, and starts the back-off past the free tries. */
export async function recordSignInFailure(email: string, request: Request) {
  const key = accountKey(email, request);
  await signInByClient()
    .consume(clientOf(request))
    .catch(() => undefined);
  const res = await signInByAccount()
    .consume(key)
    .catch((r: RateLimiterRes) => r);
  if (res.consumedPoints > FREE_FAILURES) await signInByAccount().block(key, backOffSeconds(res.consumedPoints - FREE_FAILURES));
}

/** A right password clears this address+client's count. */
export async function recordSignInSuccess(email: string, request: Request) {
  await signInByAccount().delete(accountKey(email, request));
}

/** A password-link request: stops with 429 past 10 an hour from one client. */
export async function checkLinkRequest(request: Request) {
  await linksByClient()
    .consume(clientOf(request))
    .catch((res: RateLimiterRes) => tooMany(res.msBeforeNext / 1000, "for password links from this device or network"));
}
