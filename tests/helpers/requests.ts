import { User } from "../../db/index";
import { sessionStorage } from "~/services/session.server";

/** A session cookie for a demo person, as if they had signed in. */
export async function cookieFor(email: string): Promise<string> {
  const user = await User.findOne({ where: { email }, attributes: ["id"] });
  if (!user) throw new Error(`No user ${email}`);
  const session = await sessionStorage.getSession();
  session.set("userId", user.id);
  return (await sessionStorage.commitSession(session)).split(";")[0];
}

export async function requestAs(email: string | null, path: string, init: RequestInit & { form?: Record<string, string> } = {}) {
  const headers = new Headers(init.headers);
  if (email) headers.set("Cookie", await cookieFor(email));
  let body = init.body;
  if (init.form) {
    body = new URLSearchParams(init.form);
    headers.set("Content-Type", "application/x-www-form-urlencoded");
  }
  return new Request(`http://127.0.0.1${path}`, { ...init, method: init.method ?? (body ? "POST" : "GET"), headers, body });
}

/** Calls a loader or action and returns what it threw or returned, as a Response-like result. */
export async function run<T>(fn: () => Promise<T>): Promise<{ status: number; data: unknown; location?: string | null }> {
  try {
    const value = await fn();
    return describe(value);
  } catch (thrown) {
    return describe(thrown);
  }
}

function describe(value: unknown): { status: number; data: unknown; location?: string | null } {
  if (value instanceof Response) return { status: value.status, data: undefined, location: value.headers.get("Location") };
  if (value && typeof value === "object" && "type" in value && (value as { type: string }).type === "DataWithResponseInit") {
    const d = value as unknown as { data: unknown; init: ResponseInit | null };
    return { status: d.init?.status ?? 200, data: d.data };
  }
  if (value instanceof Error) throw value;
  return { status: 200, data: value };
}
