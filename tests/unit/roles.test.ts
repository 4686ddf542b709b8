import { describe, expect, it } from "vitest";
import { navFor } from "~/lib/navigation";
import { hasRole, ROLES } from "~/lib/people/roles";

describe("roles", () => {
  it("orders crew < trainer < supervisor < admin", () => {
    expect(ROLES).toEqual(["crew", "trainer", "supervisor", "admin"]);
    expect(hasRole("admin", "crew")).toBe(true);
    expect(hasRole("supervisor", "trainer")).toBe(true);
    expect(hasRole("trainer", "supervisor")).toBe(false);
    expect(hasRole("crew", "trainer")).toBe(false);
    expect(hasRole("crew", "crew")).toBe(true);
  });

  it("shows each role only the sections it may use", () => {
    const crew = navFor("crew").map((i) => i.to);
    const admin = navFor("admin").map((i) => i.to);
    expect(crew).not.toContain("/rigs/new");
    expect(admin).toContain("/rigs/new");
    expect(admin.length).toBeGreaterThan(crew.length);
  });
});
