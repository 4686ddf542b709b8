import { describe, expect, it } from "vitest";
import { landingFor, NAV_ITEMS, navFor } from "~/lib/navigation";
import { can, PERMISSIONS, roleDescription, type Permission } from "~/lib/permissions";
import { ROLES } from "~/lib/people/roles";

describe("the permission map", () => {
  it("gives each role what the roles below it have, and more", () => {
    for (const action of Object.keys(PERMISSIONS) as Permission[]) {
      const allowed = ROLES.filter((role) => can({ role }, action));
      // Once a role may, every role above it may too.
      expect(allowed, action).toEqual(ROLES.slice(ROLES.indexOf(PERMISSIONS[action].role)));
    }
    expect(can({ role: "trainer" }, "edit-guides")).toBe(true);
    expect(can({ role: "trainer" }, "publish-guides")).toBe(false);
    expect(can({ role: "supervisor" }, "edit-rigs")).toBe(false);
    expect(can({ role: "admin" }, "edit-rigs")).toBe(true);
  });

  it("derives the menu, where people land and the words for each role", () => {
    expect(navFor("crew").map((i) => i.label)).toEqual(["Start a fix", "Rigs", "Jobs", "Field math"]);
    expect(navFor("admin")).toHaveLength(NAV_ITEMS.length);
    expect([landingFor("crew"), landingFor("trainer"), landingFor("supervisor"), landingFor("admin")]).toEqual(["/", "/", "/board", "/board"]);
    expect(roleDescription("crew")).toBe(
      "start a fix on a rig and walk through a guide, see the rigs, use the field math, record routine service done on a rig and see the jobs and record the loads sprayed on them",
    );
    expect(roleDescription("trainer")).toBe("also write and edit guides on the guide desk");
    expect(roleDescription("admin")).toMatch(
      /^also add, edit and retire rigs, invite people and set their roles, set the company's time zone and loading rules and send the weekly digest at once$/,
    );
  });
});
