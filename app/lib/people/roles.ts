/** Roles in the order they may read: each role sees what the ones before it see. */
export const ROLES = ["crew", "trainer", "supervisor", "admin"] as const;
export type Role = (typeof ROLES)[number];

export function hasRole(actual: Role, needed: Role): boolean {
  return ROLES.indexOf(actual) >= ROLES.indexOf(needed);
}

export const ROLE_LABELS: Record<Role, string> = {
  crew: "Crew",
  trainer: "Trainer",
  supervisor: "Supervisor",
  admin: "Admin",
};
