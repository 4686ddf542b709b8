/** Signs a demo person in to the app at `base` through the real form; returns the session cookie as "name=value". */
export async function demoCookie(base: string, email: string): Promise<string> {
  const res = await fetch(`${base}/login`, {
    method: "POST",
    redirect: "manual",
    headers: { "Content-Type": "application/x-www-form-urlencoded", Origin: base },
    body: new URLSearchParams({ email, password: "field-demo-2026", redirectTo: "" }),
  });
  const cookie = res.headers.get("set-cookie")?.split(";")[0];
  if (res.status !== 302 || !cookie) throw new Error(`Sign-in failed (${res.status}): is the demo running at ${base}?`);
  return cookie;
}
