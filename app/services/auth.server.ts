import { Authenticator } from "remix-auth";
import { FormStrategy } from "remix-auth-form";
import { z } from "zod";
import { checkPassword, hashPassword } from "~/lib/password";
import { emailAddress, fitsBcrypt, TOO_LONG } from "~/lib/people-schema";
import type { Role } from "~/lib/roles";
import { User } from "./db.server";

export const MAX_FAILURES = 10;
export const FAILURE_WINDOW_MS = 15 * 60_000;
export const LOCK_MS = 15 * 60_000;

/** A sign-in that did not succeed: the message is what the person sees. */
export class SignInError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly fields: { email?: string; password?: string } = {},
  ) {
    super(message);
  }
}

const WRONG = "That e-mail and password do not match an account. Check both and try again.";

// Compared against when no account matches, so timing does not tell which part was wrong.
let dummyHash: Promise<string> | undefined;

const credentials = z.object({
  email: emailAddress("your"),
  password: z.string().min(1, "Enter your password.").refine(fitsBcrypt, TOO_LONG),
});

async function verify(form: FormData): Promise<SignedIn> {
  const parsed = credentials.safeParse({ email: form.get("email") ?? "", password: form.get("password") ?? "" });
  if (!parsed.success) {
    // The first problem per field is the one worth saying.
    const fields: Record<string, string> = {};
    for (const issue of parsed.error.issues) fields[String(issue.path[0])] ??= issue.message;
    throw new SignInError("Check the highlighted fields.", 400, fields);
  }
  const { email, password } = parsed.data;
  const user = await User.findOne({ where: { email } });
  const now = Date.now();
  if (user?.lockedUntil && user.lockedUntil.getTime() > now) {
    const minutes = Math.ceil((user.lockedUntil.getTime() - now) / 60_000);
    throw new SignInError(
      `This account is locked for ${minutes} more minute${minutes === 1 ? "" : "s"} after too many failed sign-ins. Choosing a new password (“Forgot your password?”) opens it at once.`,
      423,
    );
  }
  const ok = await checkPassword(password, user?.passwordHash ?? (await (dummyHash ??= hashPassword("no-such-account"))));
  if (!user || !ok) {
    if (user) await recordFailure(user, now);
    throw new SignInError(WRONG, 401);
  }
  // Said only after the right password, so it does not tell strangers who has an account.
  if (user.accessRemovedAt) throw new SignInError("Your company's admin has turned this sign-in off. Ask them if you need it back.", 403);
  if (user.failedLogins > 0 || user.lockedUntil) {
    await user.update({ failedLogins: 0, firstFailedAt: null, lockedUntil: null });
  }
  return { id: user.id, role: user.role };
}

async function recordFailure(user: User, now: number) {
  const windowOpen = user.firstFailedAt && now - user.firstFailedAt.getTime() < FAILURE_WINDOW_MS;
  const failedLogins = windowOpen ? user.failedLogins + 1 : 1;
  await user.update({
    failedLogins,
    firstFailedAt: windowOpen ? user.firstFailedAt : new Date(now),
    lockedUntil: failedLogins >= MAX_FAILURES ? new Date(now + LOCK_MS) : null,
  });
}

/** Who signed in, and their role (where their day starts). */
export interface SignedIn {
  id: number;
  role: Role;
}

export const authenticator = new Authenticator<SignedIn>();
authenticator.use(new FormStrategy(({ form }) => verify(form)), "form");
