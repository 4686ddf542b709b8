import { randomUUID } from "node:crypto";
import { jobAt } from "./jobs.server";
import { ownedBy, usableBy } from "./tenancy.server";
import { Op, UniqueConstraintError, type Transaction } from "sequelize";
import { LATE_START_DAYS, type CaseEventInput, type CloseCaseInput, type StartCaseInput } from "~/lib/cases/schema";
import { answerFits } from "~/lib/walk/replay";
import { guideKind, isFinalKind, type Guide } from "~/lib/guides/schema";
import { outcomeLabel, type CaseKind } from "~/lib/vocabulary";
import { findCaseWithGuide } from "./case-detail.server";
import { Case, CaseEvent, changeCase, GuideRecord, GuideVersion, Rig, sequelize, ServiceRecord, ServiceRule, User } from "./db.server";
import { affirms, cardGaps, heldAnswers, type HeldAnswer } from "~/lib/walk/held-answers";
import { fail, notFound, type SessionUser } from "./guards.server";
import { usableGuides } from "./guides.server";
import { reportsChanged } from "./report-cache.server";
import { mailHandoffOnce, NO_MAIL } from "./handoff.server";

/**
 * The version a case follows: the one the phone walked, if it sent one (a start made with no signal; it may
 * have been retired since, and still counts, since the crew followed it), else the newest published one.
 * Its kind says whether the case is a fix or a rig card.
 */
async function versionToFollow(user: SessionUser, guideSlug: string, guideVersionId: number | undefined): Promise<{ id: number; kind: CaseKind }> {
  const caseKind = (definition: Guide): CaseKind => (guideKind(definition) === "card" ? "card" : "fix");
  if (guideVersionId === undefined) {
    const guide = (await usableGuides(user)).find((g) => g.slug === guideSlug);
    if (!guide) notFound(`Guide ${guideSlug}`);
    return { id: guide.versionId, kind: caseKind(guide.definition) };
  }
  const version = await GuideVersion.findOne({
    where: { id: guideVersionId, status: { [Op.in]: ["published", "retired"] } },
    include: [{ model: GuideRecord, as: "guide", where: usableBy(user, { slug: guideSlug }), attributes: ["id"] }],
    attributes: ["id", "definition"],
  });
  if (!version) notFound(`Version ${guideVersionId} of guide ${guideSlug}`);
  return { id: version.id, kind: caseKind(version.definition) };
}

/** A phone's opening time: up to LATE_START_DAYS old (a start kept with no signal), never ahead of the server by more than a few minutes. */
function openingTime(openedAt: string | undefined, now = new Date()): Date {
  if (!openedAt) return now;
  const at = new Date(openedAt);
  if (at.getTime() > now.getTime() + 5 * 60_000) fail(422, "openedAt is in the future: check the phone's clock.", { openedAt: "in the future" });
  if (at.getTime() < now.getTime() - LATE_START_DAYS * 86_400_000) {
    fail(422, `This fix was started more than ${LATE_START_DAYS} days ago and can no longer be sent. Its answers stay on this phone; tell your supervisor.`, {
      openedAt: `more than ${LATE_START_DAYS} days old`,
    });
  }
  return at;
}

/**
 * Starts a case on one of the company's active rigs. Resending the same id is harmless. A start made on a
 * phone with no signal arrives later with its own opening time and the version it walked.
 */
export async function startCase(user: SessionUser, input: StartCaseInput) {
  const rig = await Rig.findOne({ where: ownedBy(user, { code: input.rigCode.toUpperCase() }), attributes: ["id", "code", "retired", "hasHourMeter"] });
  if (!rig) notFound(`Rig ${input.rigCode}`);
  const id = input.id ?? randomUUID();
  const existing = await Case.findByPk(id, { attributes: ["id", "companyId", "rigId", "guideVersionId"] });
  if (existing) {
    if (existing.companyId !== user.companyId) fail(409, "That case id is already taken.");
    if (existing.rigId !== rig.id) fail(409, "That case id belongs to a case on another rig.");
    return { id, created: false };
  }
  if (rig.retired) fail(409, `Rig ${rig.code} has been retired, so no new fix can be saved on it. Tell your supervisor which rig you were working on.`);
  const version = await versionToFollow(user, input.guideSlug, input.guideVersionId);
  const openedAt = openingTime(input.openedAt);
  // A card keeps the hour meter current every day: its reading is taken as it starts.
  const engineHours = version.kind === "card" && rig.hasHourMeter ? (input.engineHours ?? null) : null;
  if (version.kind === "card" && rig.hasHourMeter && engineHours === null)
    fail(422, `Give the hour meter reading: rig ${rig.code} has one, and a card records it as it starts.`, { engineHours: "required for a card on this rig" });
  // The job the rig was on that day, read at the case's own time (a case sent later keeps its day).
  const jobId = await jobAt(user, rig.id, openedAt);
  const fromCaseId = input.fromCaseId ?? null;
  if (fromCaseId) {
    // A card still on the phone (no signal) may arrive after the fix it opened: an unknown id is kept;
    // one that is another company's, another rig's or not a card is refused.
    const from = await Case.findByPk(fromCaseId, { attributes: ["companyId", "rigId", "kind"] });
    if (from && (from.companyId !== user.companyId || from.rigId !== rig.id || from.kind !== "card")) notFound(`Card ${fromCaseId} on rig ${rig.code}`);
  }
  try {
    await changeCase(sequelize, user.companyId, async (transaction) => {
      const created = await Case.create(
        {
          id,
          companyId: user.companyId,
          rigId: rig.id,
          guideVersionId: version.id,
          kind: version.kind,
          fromCaseId,
          jobId,
          openedBy: user.id,
          openedAt,
          closedAt: null,
          engineHours,
          finalStep: null,
          causeCode: null,
          safetyAckAt: null,
          note: null,
        },
        { transaction },
      );
      if (engineHours !== null) await Rig.update({ engineHours }, { where: { id: rig.id, engineHours: { [Op.lt]: engineHours } }, transaction });
      return { id, companyId: user.companyId, rigId: rig.id, kind: version.kind, causeCode: null, openedAt: created.openedAt };
    });
  } catch (error) {
    // The same start sent twice at once (two tabs, or a resend racing the first): the first one stands.
    if (error instanceof UniqueConstraintError && (await Case.count({ where: { id, companyId: user.companyId, rigId: rig.id } })))
      return { id, created: false };
    throw error;
  }
  return { id, created: true };
}

/**
 * Stores a batch of answers exactly once each. Every event must fit the guide version,
 * or nothing of the batch is stored (422). Resent events are counted as duplicates.
 */
export async function storeEvents(user: SessionUser, caseId: string, events: CaseEventInput[]) {
  const { found, guide } = await findCaseWithGuide(user, caseId);
  const misfits = events.flatMap((e) => {
    const why = answerFits(guide, e.stepId, e.answer);
    return why ? [`event ${e.seq}: ${why}`] : [];
  });
  if (misfits.length) fail(422, `Nothing stored: ${misfits.join("; ")}.`);
  if (found.outcome !== "open") {
    // A closed case takes no more answers; a resend of answers it already holds is still a harmless duplicate.
    const held = await CaseEvent.count({ where: { caseId, id: events.map((e) => e.id) } });
    if (held === new Set(events.map((e) => e.id)).size) return { stored: 0, duplicates: events.length };
    fail(409, `Nothing stored: this case was closed as ${outcomeLabel(found.outcome).toLowerCase()} and takes no more answers.`);
  }

  // The usual batch is new answers only: one multi-row INSERT, which InnoDB stores whole or not at
  // all, with no transaction or lock around it. A resend (or a clash) takes the careful way below.
  const rowOf = (e: CaseEventInput) => ({ id: e.id, caseId, seq: e.seq, stepId: e.stepId, answer: e.answer, at: new Date(e.at), note: e.note?.trim() || null });
  if (new Set(events.map((e) => e.id)).size === events.length) {
    try {
      await CaseEvent.bulkCreate(events.map(rowOf));
      await noteFirstAck(found, events);
      return { stored: events.length, duplicates: 0 };
    } catch (error) {
      if (!(error instanceof UniqueConstraintError)) throw error;
    }
  }

  return withDeadlockRetry(() =>
    sequelize.transaction(async (transaction) => {
      // Batches for one case take turns on the case's own row: a lock on a row that exists, never the
      // gap locks that "SELECT … FOR UPDATE" on not-yet-stored event ids takes (those deadlocked).
      await Case.findByPk(caseId, { attributes: ["id"], transaction, lock: transaction.LOCK.UPDATE });
      const known = await CaseEvent.findAll({
        where: { caseId, [Op.or]: [{ id: events.map((e) => e.id) }, { seq: events.map((e) => e.seq) }] },
        attributes: ["id", "seq"],
        transaction,
      });
      const knownIds = new Set(known.map((k) => k.id));
      const seqOwner = new Map(known.map((k) => [k.seq, k.id]));
      const fresh = [...new Map(events.filter((e) => !knownIds.has(e.id)).map((e) => [e.id, e])).values()];
      for (const e of fresh) {
        if (seqOwner.has(e.seq) && seqOwner.get(e.seq) !== e.id) fail(409, `Nothing stored: event ${e.seq} is already taken by another event.`);
      }
      try {
        await CaseEvent.bulkCreate(fresh.map(rowOf), { transaction });
      } catch (error) {
        if (error instanceof UniqueConstraintError) fail(409, "Nothing stored: two events in the batch share a sequence number.");
        throw error;
      }
      await noteFirstAck(found, fresh, transaction);
      return { stored: fresh.length, duplicates: events.length - fresh.length };
    }),
  );
}

/** The case remembers when a shut-down stop was first acknowledged. */
async function noteFirstAck(found: Case, events: CaseEventInput[], transaction?: Transaction) {
  const firstAck = events
    .filter((e) => e.answer === "ACK")
    .map((e) => new Date(e.at))
    .sort((a, b) => +a - +b)[0];
  if (firstAck && (!found.safetyAckAt || firstAck < found.safetyAckAt)) await found.update({ safetyAckAt: firstAck }, { transaction });
}

/** Runs a transaction again (up to three times) when InnoDB picks it as a deadlock victim. */
async function withDeadlockRetry<T>(work: () => Promise<T>, tries = 3): Promise<T> {
  for (let i = 1; ; i++) {
    try {
      return await work();
    } catch (error) {
      const code = (error as { parent?: { errno?: number } }).parent?.errno;
      if (code !== 1213 || i >= tries) throw error;
    }
  }
}

/** Closes a case once: fixed or handoff at a matching end step, or abandoned. A hand-off tells the supervisors. */
export async function closeCase(user: SessionUser, caseId: string, input: CloseCaseInput) {
  const { found, guide } = await findCaseWithGuide(user, caseId);
  if (found.outcome !== "open") {
    if (found.outcome === input.outcome && found.finalStep === (input.finalStep ?? null))
      return { outcome: found.outcome, alreadyClosed: true, ...(found.outcome === "handoff" ? await mailHandoffOnce(user, caseId) : NO_MAIL) };
    fail(409, `This case is already closed as ${found.outcome}.`);
  }
  let causeCode: string | null = null;
  if (input.outcome !== "abandoned") {
    const step = input.finalStep ? guide.states[input.finalStep] : undefined;
    if (!step) fail(422, "finalStep must name an end step of this guide.", { finalStep: "not a step of this guide" });
    if (!isFinalKind(step.meta.kind) || step.meta.kind !== input.outcome) {
      fail(422, `Step "${input.finalStep}" is a ${step.meta.kind} step, not a ${input.outcome} end.`, { finalStep: "does not match the outcome" });
    }
    causeCode = step.meta.cause ?? null;
  }
  const closedAt = input.at ? new Date(input.at) : new Date();
  const card = found.kind === "card";
  const held = card ? heldAnswers(await storedAnswers(caseId)) : [];
  await changeCase(sequelize, found.companyId, async (transaction) => {
    await found.update(
      {
        outcome: input.outcome,
        finalStep: input.finalStep ?? null,
        causeCode,
        closedAt,
        // A card's reading was taken as it started; a later one given at its end wins.
        engineHours: input.engineHours ?? (card ? found.engineHours : null),
        note: input.note?.trim() || null,
        cardGaps: card ? cardGaps(held) : null,
      },
      { transaction },
    );
    if (card) await recordCardServices(found, guide, held, transaction);
    if (input.engineHours !== undefined) {
      await Rig.update({ engineHours: input.engineHours }, { where: { id: found.rigId, engineHours: { [Op.lt]: input.engineHours } }, transaction });
    }
    return { id: found.id, companyId: found.companyId, rigId: found.rigId, kind: found.kind, causeCode, openedAt: found.openedAt };
  });
  // The case is closed either way; a mail server that is down must not lose the crew's answers.
  return { outcome: input.outcome, alreadyClosed: false, ...(input.outcome === "handoff" ? await mailHandoffOnce(user, caseId) : NO_MAIL) };
}

const storedAnswers = async (caseId: string) =>
  (await CaseEvent.findAll({ where: { caseId }, attributes: ["stepId", "answer", "at"], order: [["seq", "ASC"]] })).map((e) => ({
    stepId: e.stepId,
    answer: e.answer,
    at: e.at.toISOString(),
  }));

/**
 * A card item that records a service (grease points, lubricator…), answered done or yes, is a
 * service done on every active rule of the rig for that task, at the answer's time with the card's
 * reading. Called once, as the card closes.
 */
async function recordCardServices(found: Case, guide: Guide, held: HeldAnswer[], transaction: Transaction) {
  const done = held.flatMap((e) => {
    const task = guide.states[e.stepId]?.meta.service;
    return task && affirms(e.answer) ? [{ task, at: new Date(e.at) }] : [];
  });
  if (!done.length) return;
  const rules = await ServiceRule.findAll({
    where: { companyId: found.companyId, rigId: found.rigId, retired: false, task: [...new Set(done.map((d) => d.task))] },
    attributes: ["id", "task"],
    transaction,
  });
  const rows = done.flatMap((d) =>
    rules
      .filter((r) => r.task === d.task)
      .map((r) => ({
        companyId: found.companyId,
        rigId: found.rigId,
        ruleId: r.id,
        doneAt: d.at,
        engineHours: found.engineHours,
        doneBy: found.openedBy,
        note: null,
        caseId: found.id,
      })),
  );
  if (rows.length) await ServiceRecord.bulkCreate(rows, { transaction });
}

/** A rig's latest fixes, newest first, for its page (its cards are listed apart). */
export async function recentRigCases(user: SessionUser, rigId: number, limit = 10) {
  const rows = await Case.findAll({
    where: ownedBy(user, { rigId, kind: "fix" }),
    attributes: ["id", "outcome", "openedAt", "closedAt", "causeCode"],
    include: [
      { model: GuideVersion, as: "guideVersion", attributes: ["number"], include: [{ model: GuideRecord, as: "guide", attributes: ["title"] }] },
      { model: User, as: "opener", attributes: ["name"] },
    ],
    order: [["openedAt", "DESC"]],
    limit,
  });
  return rows.map((c) => {
    const v = (c as Case & { guideVersion: GuideVersion & { guide: GuideRecord } }).guideVersion;
    const opener = (c as Case & { opener: User | null }).opener;
    return {
      id: c.id,
      outcome: c.outcome,
      openedAt: c.openedAt.toISOString(),
      closedAt: c.closedAt?.toISOString() ?? null,
      causeCode: c.causeCode,
      guideTitle: v.guide.title,
      openedBy: opener?.name ?? null,
    };
  });
}

/** This person's walk-throughs still open on a rig from the last three days, newest first: "continue" beats a second case. */
export async function openWalksOn(user: SessionUser, rigId: number) {
  const rows = await Case.findAll({
    where: ownedBy(user, { rigId, openedBy: user.id, outcome: "open", openedAt: { [Op.gt]: new Date(Date.now() - 3 * 86_400_000) } }),
    attributes: ["id", "openedAt"],
    include: [{ model: GuideVersion, as: "guideVersion", attributes: ["number"], include: [{ model: GuideRecord, as: "guide", attributes: ["title"] }] }],
    order: [["openedAt", "DESC"]],
    limit: 3,
  });
  return rows.map((c) => ({
    id: c.id,
    openedAt: c.openedAt.toISOString(),
    guideTitle: (c as Case & { guideVersion: GuideVersion & { guide: GuideRecord } }).guideVersion.guide.title,
  }));
}

/** The rig this person last started a fix on, so it can be offered first. */
export async function lastRigIdFor(user: SessionUser): Promise<number | null> {
  const last = await Case.findOne({ where: ownedBy(user, { openedBy: user.id }), attributes: ["rigId"], order: [["openedAt", "DESC"]] });
  return last?.rigId ?? null;
}

/** The unit code of the rig this person last started a fix on, if it is still active. */
export async function lastRigCodeFor(user: SessionUser): Promise<string | null> {
  const id = await lastRigIdFor(user);
  if (id === null) return null;
  return (await Rig.findOne({ where: ownedBy(user, { id, retired: false }), attributes: ["code"] }))?.code ?? null;
}

/** A supervisor marks a hand-off as dealt with, so it leaves the board's open list. */
export async function resolveHandoff(user: SessionUser, caseId: string, note: string | null) {
  const { found } = await findCaseWithGuide(user, caseId);
  if (found.outcome !== "handoff") fail(409, "Only a handed-off case can be marked dealt with.");
  if (found.handoffResolvedAt) return;
  await found.update({ handoffResolvedAt: new Date(), handoffResolvedBy: user.id, handoffResolvedNote: note });
  await reportsChanged(user.companyId);
}
