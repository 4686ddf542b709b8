import { createCookieSessionStorage } from "react-router";
import { User } from "./db.server";
import { env, isProduction } from "./env.server";

// Development and tests get a fixed secret; production must set SESSION_SECRET (checked in env).
const DEV_SECRET = "tankside-development-only-secret";

export const sessionStorage = createCookieSessionStorage<{ userId: number; epoch: number }, { flash: string }>({
  cookie: {
    name: "__tankside",
    httpOnly: true,
    sameSite: "lax",
    path: "/",
    // Secure in production; a local production build served over plain http on loopback
    // (`npm start`) still needs its cookie, and browsers treat loopback as a secure context anyway.
    secure: isProduction() && !/^http:\/\/(127\.0\.0\.1|localhost)[:/]/.test(env().APP_URL),
    secrets: [env().SESSION_SECRET ?? DEV_SECRET],
    maxAge: 60 * 60 * 24 * 14,
  },
});

export const getSession = (request: Request) => sessionStorage.getSession(request.headers.get("Cookie"));

/** The cookie that signs a person in on this device, carrying their current session epoch. */
export async function signInCookie(request: Request, userId: number): Promise<HeadersInit> {
  const user = await User.findByPk(userId, { attributes: ["id", "sessionEpoch"] });
  if (!user) throw new Error(`No user ${userId} to sign in`);
  const session = await getSession(request);
  session.set("userId", user.id);
  session.set("epoch", user.sessionEpoch);
  return { "Set-Cookie": await sessionStorage.commitSession(session) };
}
