/** Whether an error is the browser failing to reach the server (offline, or the request never got out). */
export function isNoSignal(error: unknown): boolean {
  if (typeof navigator !== "undefined" && navigator.onLine === false) return true;
  return error instanceof TypeError && /fetch|network|load failed/i.test(error.message);
}
