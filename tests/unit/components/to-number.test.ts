import { describe, expect, it } from "vitest";
import { toNumber } from "~/components/field-math/kit";

describe("numbers as crews type them", () => {
  it("reads thousands separators and decimal commas", () => {
    expect(toNumber("1,200")).toBe(1200);
    expect(toNumber("1,200.5")).toBe(1200.5);
    expect(toNumber("12,345,678")).toBe(12_345_678);
    expect(toNumber("1,5")).toBe(1.5); // a phone keyboard's decimal comma
    expect(toNumber("60,5")).toBe(60.5);
    expect(toNumber(" 2.8 ")).toBe(2.8);
  });
  it("leaves anything else NaN, for the calculators to refuse by name", () => {
    expect(toNumber("")).toBeNaN();
    expect(toNumber("abc")).toBeNaN();
    expect(toNumber("1,2,3")).toBeNaN();
  });
});
