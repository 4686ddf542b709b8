import { createContext, data, redirect, type RouterContextProvider } from "react-router";
import { isLanguage, type Language } from "~/lib/i18n/languages";
import { can, lowestRole, type Permission } from "~/lib/permissions";
import type { Role } from "~/lib/people/roles";
import { Company, User } from "./db.server";
import { getSession } from "./session.server";

export interface SessionUser {
  id: number;
  name: string;
  email: string;
  role: Role;
  companyId: number;
  companyName: string;
  /** The company's IANA time zone: every time a person reads is shown in it. */
  timeZone: string;
  /** The language they read Tankside in; null until their first sign-in (then the browser's). */
  language?: Language | null;
}

const isApi = (request: Request) => new URL(request.url).pathname.startsWith("/api/");

async function getUser(request: Request): Promise<SessionUser | null> {
  const session = await getSession(request);
  const userId = session.get("userId");
  if (!userId) return null;
  const user = await User.findByPk(userId, {
    attributes: ["id", "name", "email", "role", "companyId", "accessRemovedAt", "language"],
    include: [{ model: Company, attributes: ["name", "timeZone"] }],
  });
  // A sign-in turned off by an admin ends at once, on every device (its sessions are deleted too).
  if (!user || user.accessRemovedAt) return null;
  const company = (user as User & { Company: Company }).Company;
  return {
    id: user.id,
    name: user.name,
    email: user.email,
    role: user.role,
    companyId: user.companyId,
    companyName: company.name,
    timeZone: company.timeZone,
    language: isLanguage(user.language) ? user.language : null,
  };
}

/** What a loader or action is handed: the request and the request's own context (one per request, shared by every loader). */
export interface RequestArgs {
  request: Request;
  context: Readonly<RouterContextProvider>;
}

// The signed-in person, looked up once per request: a desk page runs three or four loaders that all need them.
const signedIn = createContext<Promise<SessionUser | null> | null>(null);

/** The signed-in person or null, from the request context (looked up on first use). */
export function currentUser({ request, context }: RequestArgs): Promise<SessionUser | null> {
  let lookup = context.get(signedIn);
  if (!lookup) {
    lookup = getUser(request);
    (context as RouterContextProvider).set(signedIn, lookup);
  }
  return lookup;
}

/** The signed-in person, or a redirect to sign-in (401 JSON for API routes). */
export async function requireUser(args: RequestArgs): Promise<SessionUser> {
  const { request } = args;
  const user = await currentUser(args);
  if (user) return user;
  if (isApi(request)) fail(401, "Sign in first.");
  const url = new URL(request.url);
  throw redirect(`/login?redirectTo=${encodeURIComponent(url.pathname + url.search)}`);
}

/** The signed-in person if they may do `action` (the permission map in lib/permissions); otherwise a 403. */
export async function requirePermission(args: RequestArgs, action: Permission): Promise<SessionUser> {
  return requireCan(await requireUser(args), action);
}

/** The same check for a person already read (an action whose intents need different permissions). */
export function requireCan(user: SessionUser, action: Permission): SessionUser {
  if (!can(user, action)) fail(403, `This needs the ${lowestRole(action)} role or above.`);
  return user;
}

/** Stops a loader or action with a status and a message the person can act on (`{ error }`, for pages and APIs alike). */
export function fail(status: number, message: string, fields?: Record<string, string>): never {
  throw data({ error: message, ...(fields ? { fields } : {}) }, { status });
}

/** Missing and foreign records look the same from outside: both are 404. */
export function notFound(what = "That record"): never {
  fail(404, `${what} was not found.`);
}

/**
 * The one answer a page action gives when it refuses and the page stays: `{ error, problems }` with its
 * status (the same words `fail` would throw, shown in place by ErrorList). Pass a zod error or a refusal.
 */
export function refused(status: number, error: string, problems: string[] = []) {
  return data({ error, problems }, { status });
}

/** `refused` for a form conform could not accept: every message, in one sentence. */
export const refusedForm = (submission: { error?: Record<string, string[] | null> | null }) =>
  refused(
    400,
    Object.values(submission.error ?? {})
      .flat()
      .join(" ") || "Check the form.",
  );

/** `refused` for what `unlessRefused` caught. */
export const answerRefusal = (r: { status: number; error: string; fields: Record<string, string> }) => refused(r.status, r.error, Object.values(r.fields));

/** What `fail` threw, read back, so a page can show a refusal in place instead of an error page; null for anything else. */
export function refusal(thrown: unknown): { status: number; error: string; fields: Record<string, string> } | null {
  if (!thrown || typeof thrown !== "object" || (thrown as { type?: string }).type !== "DataWithResponseInit") return null;
  const { data: body, init } = thrown as { data: { error?: unknown; fields?: Record<string, string> }; init: ResponseInit | null };
  if (typeof body?.error !== "string") return null;
  return { status: init?.status ?? 400, error: body.error, fields: body.fields ?? {} };
}

/** Runs a service call that may refuse; its refusal comes back as a value (see `refusal`), anything else is rethrown. */
export async function unlessRefused(work: () => Promise<unknown>) {
  try {
    await work();
    return null;
  } catch (thrown) {
    const refused = refusal(thrown);
    if (refused) return refused;
    throw thrown;
  }
}
