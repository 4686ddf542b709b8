import { can, lowestRole, type Permission } from "./permissions";
import type { Role } from "./people/roles";

export interface NavItem {
  to: string;
  label: string;
  /** The permission that opens the section (lib/permissions). */
  permission: Permission;
  /** What the section is for, in a line (the home page lists a role's sections with it). */
  about: string;
}

/** The app's sections, each shown from the role that may use it upward. */
export const NAV_ITEMS: NavItem[] = [
  { to: "/", label: "Start a fix", permission: "start-fix", about: "Pick a rig and walk through what is wrong." },
  { to: "/rigs", label: "Rigs", permission: "read-rigs", about: "Each rig's specs, tips, labels and recent cases." },
  { to: "/jobs", label: "Jobs", permission: "read-jobs", about: "Today's site, its spec and who is on it; progress of each job." },
  { to: "/field-math", label: "Field math", permission: "use-field-math", about: "Tank loads, hose friction and reach, suction head, torque." },
  { to: "/desk", label: "Guide desk", permission: "edit-guides", about: "Write, check, preview and publish the guides; see how crews go through them." },
  { to: "/board", label: "Fault board", permission: "read-board", about: "Which faults recur on which rigs and why, downtime, open hand-offs." },
  { to: "/cases", label: "Cases", permission: "read-cases", about: "Every walk-through: filter, open each answer, download as CSV." },
  { to: "/rigs/new", label: "Add a rig", permission: "edit-rigs", about: "Add a rig to the fleet; retire one from its page." },
  { to: "/admin/people", label: "People", permission: "manage-people", about: "Invite people, set roles, turn a sign-in off." },
  { to: "/admin/outbox", label: "Outbox", permission: "read-outbox", about: "The mail the local mail server kept (development only)." },
  { to: "/admin/company", label: "Company", permission: "company-settings", about: "The time zone your screens, mail and CSV use." },
];

export const navFor = (role: Role) => NAV_ITEMS.filter((item) => can({ role }, item.permission));

/** A section that every signed-in person has (the crew's own). */
export const forEveryone = (item: NavItem) => lowestRole(item.permission) === "crew";

/** Where a role starts the day after signing in: supervisors and admins on the fault board, others at "start a fix". */
export const landingFor = (role: Role) => (can({ role }, "read-board") ? "/board" : "/");
