import { RouterContextProvider } from "react-router";
import { User } from "../../db/index";
import { signInCookie } from "~/services/session.server";

/** A session cookie for a demo person, made the way a real sign-in makes it (a session row in the database). */
export async function cookieFor(email: string): Promise<string> {
  const user = await User.findOne({ where: { email }, attributes: ["id"] });
  if (!user) throw new Error(`No user ${email}`);
  const headers = new Headers(await signInCookie(new Request("http://127.0.0.1/login", { headers: { "User-Agent": "tests" } }), user.id));
  return headers.get("Set-Cookie")!.split(";")[0];
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

export interface Outcome {
  status: number;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- tests read whatever the route answered
  data: any;
  location?: string | null;
  /** The session cookie the answer set, as a request's Cookie header would carry it. */
  cookie?: string;
}

const cookieOf = (headers: HeadersInit | undefined) => new Headers(headers).get("Set-Cookie")?.split(";")[0];

/** Calls a loader or action and returns what it threw or returned: status, body (JSON parsed) and redirect. */
export async function run<T>(fn: () => Promise<T>): Promise<Outcome> {
  try {
    return await describe(await fn());
  } catch (thrown) {
    return describe(thrown);
  }
}

async function describe(value: unknown): Promise<Outcome> {
  if (value instanceof Response) {
    const type = value.headers.get("Content-Type") ?? "";
    return {
      status: value.status,
      data: type.includes("json") ? await value.json() : undefined,
      location: value.headers.get("Location"),
      cookie: cookieOf(value.headers),
    };
  }
  if (value && typeof value === "object" && "type" in value && (value as { type: string }).type === "DataWithResponseInit") {
    const d = value as unknown as { data: unknown; init: ResponseInit | null };
    return { status: d.init?.status ?? 200, data: d.data, cookie: cookieOf(d.init?.headers) };
  }
  if (value instanceof Error) throw value;
  return { status: 200, data: value };
}

/** The arguments React Router passes a loader or action, for calling one directly. */
export const args = (request: Request, params: Record<string, string> = {}) => ({ request, params, context: new RouterContextProvider() }) as never;
