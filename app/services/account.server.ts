import { checkPassword, hashPassword } from "~/lib/password";
import { User } from "./db.server";
import type { SessionUser } from "./guards.server";

/** Changes the signed-in person's password after checking the current one; every other session ends. */
export async function changePassword(
  user: SessionUser,
  current: string,
  next: string,
): Promise<{ ok: true } | { ok: false; fieldErrors: { current: string } }> {
  const me = await User.findByPk(user.id, { attributes: ["id", "passwordHash", "sessionEpoch"] });
  if (!me || !(await checkPassword(current, me.passwordHash))) return { ok: false, fieldErrors: { current: "That is not your current password." } };
  await me.update({ passwordHash: await hashPassword(next), sessionEpoch: me.sessionEpoch + 1 });
  return { ok: true };
}
