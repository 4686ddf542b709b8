import { describe, expect, it } from "vitest";
import { choosePasswordSchema, fitsBcrypt } from "~/lib/people/schema";
import { safeRedirect } from "~/lib/forms/safe-redirect";

describe("passwords bcrypt would cut short", () => {
  it("counts UTF-8 bytes, not characters", () => {
    expect(fitsBcrypt("a".repeat(72))).toBe(true);
    expect(fitsBcrypt("a".repeat(73))).toBe(false);
    // 36 letters of two bytes each is 72 bytes; one more is over.
    expect(fitsBcrypt("é".repeat(36))).toBe(true);
    expect(fitsBcrypt("é".repeat(36) + "a")).toBe(false);
    expect(fitsBcrypt("🌱".repeat(18))).toBe(true); // 4 bytes each
    expect(fitsBcrypt("🌱".repeat(19))).toBe(false);
  });

  it("refuses a new password over 72 bytes with a message that says why", () => {
    const long = "mulch ".repeat(13); // 78 bytes
    const result = choosePasswordSchema.safeParse({ password: long, confirm: long });
    expect(result.success).toBe(false);
    expect(result.error!.issues[0].message).toMatch(/72 bytes/);
  });
});

describe("where sign-in may send a person", () => {
  it.each(["/", "/board", "/cases?rig=CF-07&page=2", "/rigs/CF-07/fix#top", "/cases/%2Fx"])("keeps the same-site path %j", (to) => {
    expect(safeRedirect(to)).toBe(to);
  });

  // Known ways past a "starts with /" check: browsers read backslashes as slashes and drop tabs and newlines.
  it.each([
    "//evil.example",
    "/\\evil.example",
    "\\\\evil.example",
    "/\t/evil.example",
    "/\n/evil.example",
    "/\r/evil.example",
    "/%09/evil.example",
    "https://evil.example",
    "http:/evil.example",
    "javascript:alert(1)",
    "evil.example",
    "/\\/evil.example",
    " //evil.example",
    "",
    null,
    undefined,
  ])("refuses %j", (to) => {
    const out = safeRedirect(to);
    if (out !== null) expect(new URL(out, "http://tankside.test").host).toBe("tankside.test");
    else expect(out).toBeNull();
  });
});
