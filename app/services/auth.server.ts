import { Authenticator } from "remix-auth";
import { FormStrategy } from "remix-auth-form";
import { checkPassword, hashPassword } from "~/services/password.server";
import { signInSchema } from "~/lib/people/schema";
import type { Role } from "~/lib/people/roles";
import { User } from "./db.server";
import { checkSignInAllowed, recordSignInFailure, recordSignInSuccess } from "./throttle.server";

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

async function verify(form: FormData, request: Request): Promise<SignedIn> {
  const parsed = signInSchema.safeParse({ email: form.get("email") ?? "", password: form.get("password") ?? "" });
  if (!parsed.success) {
    // The first problem per field is the one worth saying.
    const fields: Record<string, string> = {};
    for (const issue of parsed.error.issues) fields[String(issue.path[0])] ??= issue.message;
    throw new SignInError("Check the highlighted fields.", 400, fields);
  }
  const { email, password } = parsed.data;
  // Throttled before any lookup: a known and an unknown address wait alike.
  await checkSignInAllowed(email, request);
  const user = await User.findOne({ where: { email }, attributes: ["id", "role", "passwordHash", "accessRemovedAt"] });
  // An unknown address is compared against a dummy hash, so it takes as long as a known one.
  const ok = await checkPassword(password, user?.passwordHash ?? (await (dummyHash ??= hashPassword("no-such-account"))));
  if (!user || !ok) {
    await recordSignInFailure(email, request);
    throw new SignInError(WRONG, 401);
  }
  // Said only after the right password, so it does not tell strangers who has an account.
  if (user.accessRemovedAt) throw new SignInError("Your company's admin has turned this sign-in off. Ask them if you need it back.", 403);
  await recordSignInSuccess(email, request);
  return { id: user.id, role: user.role };
}

/** Who signed in, and their role (where their day starts). */
export interface SignedIn {
  id: number;
  role: Role;
}

export const authenticator = new Authenticator<SignedIn>();
authenticator.use(new FormStrategy(({ form, request }) => verify(form, request)), "form");
