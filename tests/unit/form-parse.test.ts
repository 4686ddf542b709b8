import { describe, expect, it } from "vitest";
import { parseForm } from "~/lib/forms/parse";
import { rigInputSchema } from "~/lib/rigs/schema";

const form = (fields: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.set(k, v);
  return f;
};
const rig = {
  code: "CF-21",
  name: "Test rig",
  mount: "truck",
  pumpKind: "Centrifugal",
  engineHours: "12.5",
  hoseLengthFt: "300",
  hoseDiameterIn: "1.5",
  yardElevationFt: "420",
};

describe("reading a page form", () => {
  it("accepts thousands separators in numbers, as people type them", () => {
    for (const typed of ["1,200", "1200", " 1,200 ", "1 200"]) {
      const parsed = parseForm(form({ ...rig, tankGal: typed }), rigInputSchema);
      expect(parsed.status, typed).toBe("success");
      expect(parsed.status === "success" && parsed.value.tankGal).toBe(1200);
    }
  });

  it("still names a number that is not one", () => {
    for (const typed of ["12OO", "1.2.0", "-", "   "]) {
      const parsed = parseForm(form({ ...rig, tankGal: typed }), rigInputSchema);
      expect(parsed.status, typed).toBe("error");
      expect(parsed.status === "error" && parsed.error?.tankGal?.[0], typed).toMatch(/tank size/);
    }
  });
});

describe("a company's calendar day", () => {
  it("starts at the zone's own midnight, across daylight-saving changes (IANA tz database offsets)", async () => {
    const { startOfDayIn } = await import("~/lib/format");
    expect(startOfDayIn("2026-12-01", "America/Denver").toISOString()).toBe("2026-12-01T07:00:00.000Z"); // MST, UTC−7
    expect(startOfDayIn("2026-07-01", "America/Denver").toISOString()).toBe("2026-07-01T06:00:00.000Z"); // MDT, UTC−6
    expect(startOfDayIn("2026-03-08", "America/Denver").toISOString()).toBe("2026-03-08T07:00:00.000Z"); // DST starts at 2:00 that day
    expect(startOfDayIn("2026-11-01", "America/Denver").toISOString()).toBe("2026-11-01T06:00:00.000Z"); // DST ends at 2:00 that day
    expect(startOfDayIn("2026-06-01", "UTC").toISOString()).toBe("2026-06-01T00:00:00.000Z");
  });
});
