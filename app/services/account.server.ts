import { languageFromHeader, type Language } from "~/lib/i18n/languages";
import { checkPassword, hashPassword } from "~/services/password.server";
import { PasswordReset, sequelize, SessionRecord, User } from "./db.server";
import type { SessionUser } from "./guards.server";
import { endSessions } from "./session.server";

/**
 * Changes the signed-in person's password after checking the current one. Every other device is
 * signed out, and every password link sent before now stops working.
 */
export async function changePassword(
  user: SessionUser,
  current: string,
  next: string,
  thisSession: string | null,
): Promise<{ ok: true } | { ok: false; fieldErrors: { current: string } }> {
  const me = await User.findByPk(user.id, { attributes: ["id", "passwordHash"] });
  if (!me || !(await checkPassword(current, me.passwordHash))) return { ok: false, fieldErrors: { current: "That is not your current password." } };
  const passwordHash = await hashPassword(next);
  await sequelize.transaction(async (transaction) => {
    await me.update({ passwordHash }, { transaction });
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null }, transaction });
  });
  await endSessions(user.id, { except: thisSession ?? undefined });
  return { ok: true };
}

/** The person's signed-in devices, newest use first. */
export async function listSessions(user: SessionUser) {
  const rows = await SessionRecord.findAll({ where: { userId: user.id }, order: [["lastSeenAt", "DESC"]] });
  return rows.map((r) => ({
    key: r.idHash,
    userAgent: r.userAgent,
    createdAt: r.createdAt.toISOString(),
    lastSeenAt: r.lastSeenAt.toISOString(),
  }));
}

/** Ends one of the person's own sessions (another person's key ends nothing). */
export async function endOneSession(user: SessionUser, key: string) {
  await SessionRecord.destroy({ where: { userId: user.id, idHash: key } });
}

/** At a first sign-in the person's language comes from their browser; after that it is theirs to change. */
export async function settleLanguage(userId: number, acceptLanguage: string | null) {
  await User.update({ language: languageFromHeader(acceptLanguage) }, { where: { id: userId, language: null } });
}

/** The language the person reads Tankside in, from the account page. */
export async function setLanguage(user: SessionUser, language: Language) {
  await User.update({ language }, { where: { id: user.id, companyId: user.companyId } });
}
