const BASE = "http://tankside.invalid";

/**
 * A path on this site to go to after sign-in, or null. Only a path that stays on this origin once a
 * browser has read it: no `//host`, no backslashes, tabs or other control characters (browsers
 * drop or turn them into slashes, so `/\evil.example` and `/\t/evil.example` leave the site), no scheme.
 */
export function safeRedirect(to: unknown): string | null {
  if (typeof to !== "string" || !to.startsWith("/") || to.startsWith("//")) return null;
  // eslint-disable-next-line no-control-regex -- control characters are exactly what must be refused
  if (/[\\\u0000-\u001f\u007f]/.test(to)) return null;
  let url: URL;
  try {
    url = new URL(to, BASE);
  } catch {
    return null;
  }
  if (url.origin !== BASE) return null;
  const path = url.pathname + url.search + url.hash;
  return path.startsWith("//") ? null : path;
}
