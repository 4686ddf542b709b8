import { hasRole, type Role } from "./roles";

export interface NavItem {
  to: string;
  label: string;
  minRole: Role;
}

/** The app's sections, each shown from the role that may use it upward. */
export const NAV_ITEMS: NavItem[] = [
  { to: "/", label: "Start a fix", minRole: "crew" },
  { to: "/rigs", label: "Rigs", minRole: "crew" },
  { to: "/tools", label: "Field math", minRole: "crew" },
  { to: "/desk", label: "Guide desk", minRole: "trainer" },
  { to: "/board", label: "Fault board", minRole: "supervisor" },
  { to: "/cases", label: "Cases", minRole: "supervisor" },
  { to: "/rigs/new", label: "Add a rig", minRole: "admin" },
  { to: "/admin/people", label: "People", minRole: "admin" },
  { to: "/admin/outbox", label: "Outbox", minRole: "admin" },
  { to: "/admin/company", label: "Company", minRole: "admin" },
];

export const navFor = (role: Role) => NAV_ITEMS.filter((item) => hasRole(role, item.minRole));
