import { describe, expect, it } from "vitest";
import { bruteForceBest, expectedMinutes, ratioOrder, type Check } from "~/lib/stats/check-order";
import { seededRandom } from "../../../seeds/random";

describe("check-order advisor (sequential-inspection ratio rule)", () => {
  it("worked example by hand", () => {
    // A: p 0.5, 10 min (ratio 0.05); B: p 0.3, 2 min (0.15); C: p 0.2, 1 min (0.2). Ratio order: C, B, A.
    // Expected: 0.2·1 + 0.3·(1+2) + 0.5·(1+2+10) = 0.2 + 0.9 + 6.5 = 7.6 min.
    // As listed (A, B, C): 0.5·10 + 0.3·12 + 0.2·13 = 5 + 3.6 + 2.6 = 11.2 min.
    const checks: Check[] = [
      { id: "A", probability: 0.5, minutes: 10 },
      { id: "B", probability: 0.3, minutes: 2 },
      { id: "C", probability: 0.2, minutes: 1 },
    ];
    expect(ratioOrder(checks).map((c) => c.id)).toEqual(["C", "B", "A"]);
    expect(expectedMinutes(ratioOrder(checks))).toBeCloseTo(7.6, 12);
    expect(expectedMinutes(checks)).toBeCloseTo(11.2, 12);
  });

  it("matches brute force over every order for 1 to 7 checks (300 random cases)", () => {
    const random = seededRandom(42);
    for (let trial = 0; trial < 300; trial++) {
      const n = 1 + (trial % 7);
      const checks = Array.from({ length: n }, (_, i) => ({ id: `c${i}`, probability: random.next(), minutes: 0.5 + random.int(0, 40) / 2 }));
      expect(expectedMinutes(ratioOrder(checks))).toBeCloseTo(bruteForceBest(checks).minutes, 9);
    }
  });
});
