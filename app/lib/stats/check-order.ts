/**
 * Order of checks. With exactly one fault present, checking in descending order of
 * probability ÷ time-to-check minimises the expected time to find it (the classic
 * sequential-inspection ratio rule); brute force over every order is the test oracle.
 */
/**
 * Past cases with a found cause the advisor needs before it suggests an order: with fewer, one or
 * two unusual cases would decide the order (a judgement for this product, not a published figure).
 */
export const ADVISOR_MIN_CASES = 20;

export interface Check {
  id: string;
  probability: number;
  minutes: number;
}

/** Expected minutes to find the fault when checking in this order (probabilities normalised). */
export function expectedMinutes(order: Check[]): number {
  const total = order.reduce((s, c) => s + c.probability, 0);
  if (total <= 0) return order.reduce((s, c) => s + c.minutes, 0);
  let elapsed = 0;
  let expected = 0;
  for (const c of order) {
    elapsed += c.minutes;
    expected += (c.probability / total) * elapsed;
  }
  return expected;
}

/** The ratio rule: highest probability per minute first (ties: the quicker check first). */
export function ratioOrder<T extends Check>(checks: T[]): T[] {
  const ratio = (c: Check) => (c.minutes > 0 ? c.probability / c.minutes : c.probability > 0 ? Infinity : 0);
  return [...checks].sort((a, b) => ratio(b) - ratio(a) || a.minutes - b.minutes || a.id.localeCompare(b.id));
}

/** Every order, for small lists only (n! grows fast): the oracle the ratio rule is tested against. */
export function bruteForceBest(checks: Check[]): { order: Check[]; minutes: number } {
  if (checks.length > 8) throw new RangeError("brute force is for 8 checks or fewer");
  let best = { order: checks, minutes: expectedMinutes(checks) };
  const permute = (done: Check[], rest: Check[]) => {
    if (rest.length === 0) {
      const m = expectedMinutes(done);
      if (m < best.minutes - 1e-12) best = { order: done, minutes: m };
      return;
    }
    rest.forEach((c, i) => permute([...done, c], [...rest.slice(0, i), ...rest.slice(i + 1)]));
  };
  permute([], checks);
  return best;
}
