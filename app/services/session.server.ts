import { createSessionStorage } from "react-router";
import { Op } from "sequelize";
import { SessionRecord } from "./db.server";
import { env, isProduction } from "./env.server";
import { hashToken, newToken } from "./tokens.server";

// Development and tests get a fixed secret; production must set SESSION_SECRET (checked in env).
const DEV_SECRET = "tankside-development-only-secret";

/**
 * How long a sign-in lasts. A crew phone can sit at a site with no signal for a week or two and must
 * still open the walk-through when it comes back, so the idle limit is 14 days; whatever the use,
 * every sign-in ends after 60 days (about a season's quarter), when the person signs in again.
 */
export const IDLE_DAYS = 14;
export const ABSOLUTE_DAYS = 60;
const DAY = 86_400_000;
// A session's "last used" is written at most this often, not on every request.
const TOUCH_MS = 15 * 60_000;

type SessionData = { userId: number; userAgent?: string };

export const sessionStorage = createSessionStorage<SessionData>({
  cookie: {
    name: "__tankside",
    httpOnly: true,
    sameSite: "lax",
    path: "/",
    // Secure in production; a local production build served over plain http on loopback
    // (`npm start`) still needs its cookie, and browsers treat loopback as a secure context anyway.
    secure: isProduction() && !/^http:\/\/(127\.0\.0\.1|localhost)[:/]/.test(env().APP_URL),
    secrets: [env().SESSION_SECRET ?? DEV_SECRET],
    maxAge: ABSOLUTE_DAYS * 24 * 60 * 60,
  },
  async createData(data) {
    const { token, hash } = newToken();
    const now = new Date();
    await SessionRecord.create({
      idHash: hash,
      userId: data.userId!,
      userAgent: data.userAgent?.slice(0, 200) ?? null,
      createdAt: now,
      lastSeenAt: now,
      expiresAt: new Date(now.getTime() + ABSOLUTE_DAYS * DAY),
    });
    return token;
  },
  async readData(id) {
    const row = await SessionRecord.findByPk(hashToken(id));
    if (!row) return null;
    const now = Date.now();
    if (row.expiresAt.getTime() <= now || row.lastSeenAt.getTime() <= now - IDLE_DAYS * DAY) {
      await row.destroy();
      return null;
    }
    if (now - row.lastSeenAt.getTime() > TOUCH_MS) await row.update({ lastSeenAt: new Date(now) });
    return { userId: row.userId, sessionKey: row.idHash } as SessionData;
  },
  async updateData() {
    // A session holds only who signed in, set when it is made; nothing to update.
  },
  async deleteData(id) {
    await SessionRecord.destroy({ where: { idHash: hashToken(id) } });
  },
});

export const getSession = (request: Request) => sessionStorage.getSession(request.headers.get("Cookie"));

/** The cookie that signs a person in on this device: always a new session with a new random id. */
export async function signInCookie(request: Request, userId: number): Promise<HeadersInit> {
  const session = await sessionStorage.getSession();
  session.set("userId", userId);
  session.set("userAgent", request.headers.get("User-Agent") ?? undefined);
  return { "Set-Cookie": await sessionStorage.commitSession(session) };
}

/** Ends this device's session (sign-out): the row goes, and the cookie with it. */
export async function signOutCookie(request: Request): Promise<HeadersInit> {
  return { "Set-Cookie": await sessionStorage.destroySession(await getSession(request)) };
}

/** Ends a person's sessions, all of them or all but one (the device that asked). */
export async function endSessions(userId: number, { except }: { except?: string } = {}) {
  await SessionRecord.destroy({ where: { userId, ...(except ? { idHash: { [Op.ne]: except } } : {}) } });
}

/** The hash that names this request's session in the table (to mark "this device"), or null. */
export async function currentSessionKey(request: Request): Promise<string | null> {
  const session = await getSession(request);
  return (session.data as { sessionKey?: string }).sessionKey ?? null;
}
