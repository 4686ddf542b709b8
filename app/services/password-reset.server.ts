import { Op } from "sequelize";
import { hashPassword } from "~/services/password.server";
import { RESET_MINUTES, resetMail } from "~/lib/mail/reset";
import { PasswordReset, sequelize, SessionRecord, User } from "./db.server";
import { env } from "./env.server";
import { deliver } from "./mail.server";
import { hashToken, newToken } from "./tokens.server";

/** More links than this in an hour are not sent: nobody can use the form to flood a mailbox. */
export const RESETS_PER_HOUR = 3;

/** Link requests still being worked on after their answer went out (the form answers first). */
const inFlight = new Set<Promise<void>>();

/** Starts a link request without waiting for it; `linkRequestsSettled` waits for all started (tests, shutdown). */
export function startResetRequest(email: string) {
  const work = requestReset(email)
    .catch((error) => console.warn(`Password link request failed: ${error instanceof Error ? error.message : error}`))
    .finally(() => inFlight.delete(work));
  inFlight.add(work);
}

export const linkRequestsSettled = () => Promise.all([...inFlight]).then(() => undefined);

/**
 * Mails a "choose a new password" link if the address signs in and has not been turned off.
 * The caller answers the same either way, so the form does not tell who has an account.
 */
export async function requestReset(email: string): Promise<void> {
  const user = await User.findOne({ where: { email, accessRemovedAt: null }, attributes: ["id", "name", "email", "companyId"] });
  if (!user) return;
  const recent = await PasswordReset.count({ where: { userId: user.id, createdAt: { [Op.gt]: new Date(Date.now() - 3_600_000) } } });
  if (recent >= RESETS_PER_HOUR) return;
  const { token, hash } = newToken();
  await PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt: new Date(Date.now() + RESET_MINUTES * 60_000) });
  // The page answers the same either way (it must not tell who has an account); a refused mail is only logged.
  await deliver(
    {
      companyId: user.companyId,
      to: [user.email],
      ...resetMail({ name: user.name, link: new URL(`/reset/${token}`, env().APP_URL).toString(), minutes: RESET_MINUTES }),
    },
    `Password link mail to user ${user.id}`,
  );
}

const UNUSABLE = "This link has expired or has already been used. Ask for a new one from the sign-in page.";

/** Whether a reset link can still be used (and whose it is). */
export async function checkReset(token: string): Promise<{ ok: true; name: string } | { ok: false; message: string }> {
  const reset = await PasswordReset.findOne({
    where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
    include: [{ model: User, attributes: ["name", "accessRemovedAt"] }],
  });
  const user = (reset as (PasswordReset & { User: User }) | null)?.User;
  if (!reset || !user || user.accessRemovedAt) return { ok: false, message: UNUSABLE };
  return { ok: true, name: user.name };
}

/** Sets the new password, ends any sign-in lock, and spends this link and every other one the person had. */
export async function completeReset(token: string, password: string): Promise<{ ok: true; userId: number } | { ok: false; message: string }> {
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (transaction) => {
    const reset = await PasswordReset.findOne({
      where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const user = reset ? await User.findByPk(reset.userId, { transaction }) : null;
    if (!reset || !user || user.accessRemovedAt) return { ok: false as const, message: UNUSABLE };
    // Whoever else held a session (perhaps the reason for the reset) is signed out.
    await user.update({ passwordHash }, { transaction });
    await SessionRecord.destroy({ where: { userId: user.id }, transaction });
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null }, transaction });
    return { ok: true as const, userId: user.id };
  });
}
