/**
 * Chi-square quantiles for the exact Poisson interval, from the regularized lower incomplete
 * gamma function P(a, x) (series and continued fraction, as in Numerical Recipes §6.2) and a
 * bisection on it. Tested against a general-purpose statistics package.
 */
function logGamma(x: number): number {
  // Lanczos approximation (g = 7, n = 9).
  const c = [
    0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059, 12.507343278686905, -0.13857109526572012,
    9.9843695780195716e-6, 1.5056327351493116e-7,
  ];
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  x -= 1;
  let a = c[0];
  const t = x + 7.5;
  for (let i = 1; i < 9; i++) a += c[i] / (x + i);
  return 0.5 * Math.log(2 * Math.PI) + (x + 0.5) * Math.log(t) - t + Math.log(a);
}

/** Regularized lower incomplete gamma P(a, x). */
export function gammaP(a: number, x: number): number {
  if (x <= 0) return 0;
  const lead = -x + a * Math.log(x) - logGamma(a);
  if (x < a + 1) {
    let sum = 1 / a;
    let term = sum;
    for (let n = 1; n < 1000; n++) {
      term *= x / (a + n);
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * 1e-15) break;
    }
    return sum * Math.exp(lead);
  }
  // Continued fraction for Q(a, x) (modified Lentz).
  let b = x + 1 - a;
  let c = 1e300;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 1000; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < 1e-300) d = 1e-300;
    c = b + an / c;
    if (Math.abs(c) < 1e-300) c = 1e-300;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < 1e-15) break;
  }
  return 1 - Math.exp(lead) * h;
}

/** The p-quantile of the chi-square distribution with k degrees of freedom. */
export function chiSquareQuantile(p: number, k: number): number {
  if (!(p > 0 && p < 1) || !(k > 0)) throw new RangeError("chi-square quantile needs 0 < p < 1 and k > 0");
  let lo = 0;
  let hi = Math.max(1, k);
  while (gammaP(k / 2, hi / 2) < p) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-12 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (gammaP(k / 2, mid / 2) < p) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/**
 * Exact (Garwood) confidence interval for a Poisson count k:
 * lower = χ²(α/2; 2k)/2 (0 when k = 0), upper = χ²(1 − α/2; 2k + 2)/2.
 */
export function poissonInterval(k: number, confidence = 0.95): { lower: number; upper: number } {
  const alpha = 1 - confidence;
  return {
    lower: k === 0 ? 0 : chiSquareQuantile(alpha / 2, 2 * k) / 2,
    upper: chiSquareQuantile(1 - alpha / 2, 2 * k + 2) / 2,
  };
}
