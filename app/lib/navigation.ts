import { hasRole, type Role } from "./roles";

export interface NavItem {
  to: string;
  label: string;
  minRole: Role;
  /** What the section is for, in a line (the home page lists a role's sections with it). */
  about: string;
}

/** The app's sections, each shown from the role that may use it upward. */
export const NAV_ITEMS: NavItem[] = [
  { to: "/", label: "Start a fix", minRole: "crew", about: "Pick a rig and walk through what is wrong." },
  { to: "/rigs", label: "Rigs", minRole: "crew", about: "Each rig's specs, tips, labels and recent cases." },
  { to: "/tools", label: "Field math", minRole: "crew", about: "Tank loads, hose friction and reach, suction head, torque." },
  { to: "/desk", label: "Guide desk", minRole: "trainer", about: "Write, check, preview and publish the guides; see how crews go through them." },
  { to: "/board", label: "Fault board", minRole: "supervisor", about: "Which faults recur on which rigs and why, downtime, open hand-offs." },
  { to: "/cases", label: "Cases", minRole: "supervisor", about: "Every walk-through: filter, open each answer, download as CSV." },
  { to: "/rigs/new", label: "Add a rig", minRole: "admin", about: "Add a rig to the fleet; retire one from its page." },
  { to: "/admin/people", label: "People", minRole: "admin", about: "Invite people, set roles, turn a sign-in off." },
  { to: "/admin/outbox", label: "Outbox", minRole: "admin", about: "The mail the local mail server kept (development only)." },
  { to: "/admin/company", label: "Company", minRole: "admin", about: "The time zone your screens, mail and CSV use." },
];

export const navFor = (role: Role) => NAV_ITEMS.filter((item) => hasRole(role, item.minRole));

/** Where a role starts the day after signing in: supervisors and admins on the fault board, others at "start a fix". */
export const landingFor = (role: Role) => (hasRole(role, "supervisor") ? "/board" : "/");
