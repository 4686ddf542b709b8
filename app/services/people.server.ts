import { Op, UniqueConstraintError } from "sequelize";
import { ownedBy } from "./tenancy.server";
import { inviteMail } from "~/lib/mail/invite";
import { hashPassword } from "~/services/password.server";
import type { InviteInput, PersonAction } from "~/lib/people/schema";
import { Company, Invite, sequelize, User } from "./db.server";
import { env } from "./env.server";
import { fail, notFound, type SessionUser } from "./guards.server";
import { deliver } from "./mail.server";
import { endSessions } from "./session.server";
import { reportsChanged } from "./report-cache.server";
import { hashToken, newToken } from "./tokens.server";

export const INVITE_DAYS = 7;

/** The company's people (removed ones last) and the invitations not yet used. */
export async function listPeople(user: SessionUser) {
  const [people, invites] = await Promise.all([
    User.findAll({
      where: ownedBy(user),
      attributes: ["id", "name", "email", "role", "accessRemovedAt", "createdAt"],
      order: [
        ["accessRemovedAt", "ASC"],
        ["name", "ASC"],
      ],
    }),
    Invite.findAll({
      where: ownedBy(user, { acceptedAt: null }),
      attributes: ["id", "name", "email", "role", "expiresAt", "createdAt"],
      order: [["createdAt", "DESC"]],
    }),
  ]);
  const now = Date.now();
  return {
    people: people.map((p) => ({ ...p.get({ plain: true }), you: p.id === user.id })),
    invites: invites.map((i) => ({ ...i.get({ plain: true }), expired: i.expiresAt.getTime() <= now })),
  };
}

export type InviteResult = { ok: true; email: string; mailFailed: boolean } | { ok: false; fieldErrors: Partial<Record<keyof InviteInput, string>> };

/**
 * Invites someone by e-mail: a link with a random token (only its hash is stored) that lets
 * them choose a password once within a week. Inviting the same address again replaces the
 * earlier link.
 */
export async function invitePerson(user: SessionUser, input: InviteInput): Promise<InviteResult> {
  if (await User.findOne({ where: { email: input.email }, attributes: ["id"] })) {
    return { ok: false, fieldErrors: { email: "This e-mail already signs in to Tankside. Each person needs their own address." } };
  }
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + INVITE_DAYS * 86_400_000);
  await sequelize.transaction(async (transaction) => {
    await Invite.destroy({ where: ownedBy(user, { email: input.email, acceptedAt: null }), transaction });
    await Invite.create(
      { companyId: user.companyId, email: input.email, name: input.name, role: input.role, tokenHash: hash, invitedBy: user.id, expiresAt },
      { transaction },
    );
  });
  const mail = inviteMail({
    name: input.name,
    company: user.companyName,
    invitedBy: user.name,
    role: input.role,
    link: new URL(`/join/${token}`, env().APP_URL).toString(),
    expiresAt,
    timeZone: user.timeZone,
  });
  const sent = await deliver({ companyId: user.companyId, to: [input.email], ...mail }, `Invitation mail to ${input.email}`);
  return { ok: true, email: input.email, mailFailed: !sent };
}

/** Changes a role, or turns a sign-in off or on, for someone in the admin's company; never the admin's own. */
export async function actOnPerson(user: SessionUser, action: PersonAction): Promise<string> {
  if (action.intent === "cancel-invite") {
    const invite = await Invite.findOne({ where: ownedBy(user, { id: action.inviteId, acceptedAt: null }) });
    if (!invite) notFound("That invitation");
    await invite.destroy();
    return `The invitation to ${invite.email} is cancelled; its link no longer works.`;
  }
  const person = await User.findOne({ where: ownedBy(user, { id: action.personId }) });
  if (!person) notFound("That person");
  // Admins cannot lock themselves out, so a company always keeps at least one admin.
  if (person.id === user.id) fail(409, "You cannot change your own role or sign-in. Ask another admin.");
  if (action.intent === "role") {
    await person.update({ role: action.role });
    await reportsChanged(user.companyId);
    return `${person.name} is now ${action.role}.`;
  }
  const removed = action.intent === "remove-access";
  // Turning it back on does not revive old sessions: the person signs in afresh.
  await person.update({ accessRemovedAt: removed ? new Date() : null });
  await reportsChanged(user.companyId);
  if (removed) await endSessions(person.id);
  return removed ? `${person.name} can no longer sign in; their cases stay as they are.` : `${person.name} can sign in again with their old password.`;
}

export type InviteCheck = { ok: true; invite: Invite; company: string } | { ok: false; message: string };

/** What a join link leads to: the invitation, or why it cannot be used. */
export async function checkInvite(token: string): Promise<InviteCheck> {
  const invite = await Invite.findOne({ where: { tokenHash: hashToken(token) }, include: [{ model: Company, attributes: ["name"] }] });
  if (!invite) return { ok: false, message: "This link is not (or no longer) an invitation. Ask your admin to send a new one." };
  if (invite.acceptedAt) return { ok: false, message: "This invitation has already been used. Sign in with the password chosen then." };
  if (invite.expiresAt.getTime() <= Date.now()) return { ok: false, message: "This invitation has expired. Ask your admin to send a new one." };
  return { ok: true, invite, company: (invite as Invite & { Company: Company }).Company.name };
}

/** Uses an invitation once: makes the person's sign-in with the password they chose, and returns their id. */
export async function acceptInvite(token: string, password: string): Promise<{ ok: true; userId: number } | { ok: false; message: string }> {
  const passwordHash = await hashPassword(password);
  try {
    return await sequelize.transaction(async (transaction) => {
      // Locked so two taps on the same link make one person.
      const invite = await Invite.findOne({
        where: { tokenHash: hashToken(token), acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!invite) {
        const why = await checkInvite(token);
        return { ok: false as const, message: why.ok ? "This invitation could not be used just now. Open the link again." : why.message };
      }
      const person = await User.create(
        {
          companyId: invite.companyId,
          email: invite.email,
          name: invite.name,
          role: invite.role,
          passwordHash,
        },
        { transaction },
      );
      await invite.update({ acceptedAt: new Date() }, { transaction });
      await reportsChanged(invite.companyId, transaction);
      return { ok: true as const, userId: person.id };
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) return { ok: false, message: "This e-mail already signs in to Tankside. Sign in instead." };
    throw error;
  }
}
