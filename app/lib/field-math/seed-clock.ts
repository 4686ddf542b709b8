// Kept apart from the load card (and zod): every screen shows a running seed clock.

/** Where the phone keeps a running seed clock, and the event a change to it raises on this page. */
export const SEED_CLOCK_KEY = "tankside.seed-clock";
export const SEED_CLOCK_CHANGED = "tankside:seed-clock";

/** Minutes and seconds left on the seed clock (negative once over). */
export function seedClock(startedAtMs: number, nowMs: number, limitMinutes: number) {
  const leftMs = startedAtMs + limitMinutes * 60_000 - nowMs;
  const abs = Math.abs(leftMs);
  const text = `${Math.floor(abs / 60_000)}:${String(Math.floor((abs % 60_000) / 1000)).padStart(2, "0")}`;
  return { leftMs, over: leftMs < 0, text };
}
