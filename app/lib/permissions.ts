import { hasRole, ROLES, type Role } from "./people/roles";

/**
 * Who may do what, in one place: each action with the lowest role that may do it (roles read
 * upward: crew < trainer < supervisor < admin). Guards, navigation, buttons, the words on the
 * people page and in invitations, and who is mailed all come from here.
 */
export const PERMISSIONS = {
  "start-fix": { role: "crew", words: "start a fix on a rig and walk through a guide" },
  "read-rigs": { role: "crew", words: "see the rigs" },
  "use-field-math": { role: "crew", words: "use the field math" },
  "record-service": { role: "crew", words: "record routine service done on a rig" },
  "read-jobs": { role: "crew", words: "see the jobs and record the loads sprayed on them" },
  "edit-guides": { role: "trainer", words: "write and edit guides on the guide desk" },
  "read-board": { role: "supervisor", words: "see the fault board" },
  "read-cases": { role: "supervisor", words: "see every case" },
  "publish-guides": { role: "supervisor", words: "publish guides" },
  "resolve-handoffs": { role: "supervisor", words: "take hand-offs and mark them dealt with" },
  "edit-service-rules": { role: "supervisor", words: "set each rig's service intervals" },
  "manage-jobs": { role: "supervisor", words: "create, plan and close jobs" },
  "edit-rigs": { role: "admin", words: "add, edit and retire rigs" },
  "manage-people": { role: "admin", words: "invite people and set their roles" },
  "company-settings": { role: "admin", words: "set the company's time zone and loading rules" },
  "read-outbox": { role: "admin", words: "read the local outbox" },
  "send-digest": { role: "admin", words: "send the weekly digest at once" },
} as const satisfies Record<string, { role: Role; words: string }>;

export type Permission = keyof typeof PERMISSIONS;

/** May this person do this? */
export const can = (user: { role: Role }, action: Permission) => hasRole(user.role, PERMISSIONS[action].role);

/** The lowest role that may do an action. */
export const lowestRole = (action: Permission): Role => PERMISSIONS[action].role;

/** What a role adds to the one below it, in words: "write and edit guides on the guide desk". */
export function roleAdds(role: Role): string {
  const own = Object.values(PERMISSIONS).filter((p) => p.role === role && !/local outbox/.test(p.words));
  const words = own.map((p) => p.words);
  return words.length > 1 ? `${words.slice(0, -1).join(", ")} and ${words.at(-1)}` : (words[0] ?? "");
}

/** What a role may do, said as the invitation and the people page say it ("also …" above crew). */
export const roleDescription = (role: Role) => (role === ROLES[0] ? roleAdds(role) : `also ${roleAdds(role)}`);
