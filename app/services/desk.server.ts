import { translationReport } from "~/lib/guides/translations";
import { createHash } from "node:crypto";
import { replacedBuiltIns, usableBy } from "./tenancy.server";
import { Op, QueryTypes } from "sequelize";
import { compileGuide } from "~/lib/guides/compile";
import { mainLine } from "~/lib/guides/main-line";
import { draftShapeSchema, wellFormedText, type Guide, type GuideKind } from "~/lib/guides/schema";
import { validateGuide, plainProblem } from "~/lib/guides/validate";
import { expectedMinutes, ratioOrder } from "~/lib/stats/check-order";
import { stepFlow, type FlowCase } from "~/lib/stats/step-flow";
import { GuideRecord, GuideVersion, guideScope, sequelize, User } from "./db.server";
import { fail, notFound, type SessionUser } from "./guards.server";
import { reportsChanged } from "./report-cache.server";
import { causeList, faultGuides } from "./guides.server";

const MAX_DEFINITION_CHARS = 200_000;
const hash = (definition: unknown) => createHash("sha256").update(JSON.stringify(definition)).digest("hex");
/** The guides a company's card may open: its crews' published fault guides. */
export const openableGuides = async (user: SessionUser) => (await faultGuides(user)).map((g) => ({ slug: g.slug, title: g.title }));

export const checkDefinition = async (user: SessionUser, definition: unknown) =>
  validateGuide(definition, { causes: causeList(), guideIds: (await openableGuides(user)).map((g) => g.slug) }).problems;

/** Problems and what a reviewer should look at (a restart with nothing put back first), from one run of the checker. */
export async function definitionChecks(user: SessionUser, definition: unknown) {
  const { problems, warnings } = validateGuide(definition, { causes: causeList(), guideIds: (await openableGuides(user)).map((g) => g.slug) });
  return { problems, warnings };
}

/** A guide the company may see on the desk: its own, or built-in. Another company's is a 404. */
export async function deskGuide(user: SessionUser, guideId: number) {
  const guide = await GuideRecord.findOne({ where: usableBy(user, { id: guideId }) });
  if (!guide) notFound("That guide");
  return guide;
}

/** A version's kind read in SQL, without its definition (`table`: the alias when the versions are included). */
const kindOf = (table?: string) =>
  [sequelize.literal(`JSON_VALUE(${table ? `\`${table}\`.` : ""}\`definition\`, '$.kind')`), "kind"] as [ReturnType<typeof sequelize.literal>, string];
/** Every version of a guide has the same kind: a card, or a guide. */
const kindOfVersions = (versions: GuideVersion[]): GuideKind => (versions.some((v) => v.get("kind") === "card") ? "card" : "guide");

/** A guide for the versions page: what it is, and every version newest first (plain data). */
export async function deskGuideVersions(user: SessionUser, guideId: number) {
  const guide = await deskGuide(user, guideId);
  const versions = await GuideVersion.findAll({
    where: { guideId: guide.id },
    attributes: ["number", "status", "changeNote", "reviewComment", "updatedAt", "definition", kindOf()],
    order: [["number", "DESC"]],
  });
  const kind = kindOfVersions(versions);
  return {
    guide: { id: guide.id, title: guide.title, slug: guide.slug, builtIn: guide.companyId === null, publishedVersion: guide.publishedVersion, kind },
    versions: versions.map((v) => ({
      number: v.number,
      status: v.status,
      changeNote: v.changeNote,
      reviewComment: v.reviewComment,
      updatedAt: v.updatedAt.toISOString(),
      spanish: translationSummary(v.definition),
    })),
  };
}

/** What a version's Spanish lacks: the title block and how many steps are missing or out of date. */
export function translationSummary(definition: Guide) {
  if (!definition?.states || typeof definition.states !== "object") return null;
  const report = translationReport(
    {
      title: definition.title ?? "",
      summary: definition.summary ?? "",
      symptoms: definition.symptoms ?? [],
      states: definition.states,
      translations: definition.translations,
    },
    "es",
  );
  return { head: report.head, missing: report.missing.length, stale: report.stale.length, steps: Object.keys(report.steps).length };
}

async function deskVersion(user: SessionUser, guideId: number, number: number) {
  const guide = await deskGuide(user, guideId);
  const version = await GuideVersion.findOne({ where: { guideId: guide.id, number } });
  if (!version) notFound("That version");
  return { guide, version };
}

/** The desk's list: built-in and company guides with their versions, newest first. */
export async function deskList(user: SessionUser) {
  const guides = await GuideRecord.findAll({
    where: usableBy(user),
    attributes: ["id", "companyId", "slug", "title", "publishedVersion", "basedOnGuideId"],
    include: [
      {
        model: GuideVersion,
        as: "versions",
        // The kind from each version's definition (every version of one guide has the same kind).
        attributes: ["number", "status", "updatedAt", kindOf("versions")],
      },
    ],
    order: [["title", "ASC"]],
  });
  const replaced = replacedBuiltIns(guides);
  return guides.map((g) => ({
    id: g.id,
    kind: kindOfVersions((g as GuideRecord & { versions: GuideVersion[] }).versions ?? []),
    slug: g.slug,
    title: g.title,
    builtIn: g.companyId === null,
    replacedByCompanyCopy: replaced.has(g.id),
    publishedVersion: g.publishedVersion,
    versions: ((g as GuideRecord & { versions: GuideVersion[] }).versions ?? [])
      .map((v) => ({ number: v.number, status: v.status, updatedAt: v.updatedAt.toISOString() }))
      .sort((a, b) => b.number - a.number),
  }));
}

/**
 * Opens a draft to edit. A built-in guide is never edited: the company gets its own copy
 * (which replaces the built-in for its crews once published). An existing draft is reused.
 */
export async function openDraft(user: SessionUser, guideId: number): Promise<{ guideId: number; number: number }> {
  const source = await deskGuide(user, guideId);
  return sequelize.transaction(async (transaction) => {
    let guide = source;
    if (source.companyId === null) {
      const scope = guideScope(user.companyId);
      guide =
        (await GuideRecord.findOne({ where: { scope, slug: source.slug }, transaction, lock: transaction.LOCK.UPDATE })) ??
        (await GuideRecord.create(
          { companyId: user.companyId, scope, slug: source.slug, title: source.title, publishedVersion: null, basedOnGuideId: source.id },
          { transaction },
        ));
    }
    const draft = await GuideVersion.findOne({ where: { guideId: guide.id, status: "draft" }, transaction });
    if (draft) return { guideId: guide.id, number: draft.number };
    const ownLatest = await GuideVersion.findOne({ where: { guideId: guide.id }, order: [["number", "DESC"]], transaction });
    const from =
      (guide.publishedVersion ? await GuideVersion.findOne({ where: { guideId: guide.id, number: guide.publishedVersion }, transaction }) : null) ??
      ownLatest ??
      (source.publishedVersion ? await GuideVersion.findOne({ where: { guideId: source.id, number: source.publishedVersion }, transaction }) : null);
    if (!from) notFound("A version to start from");
    const number = (ownLatest?.number ?? 0) + 1;
    await GuideVersion.create(
      {
        guideId: guide.id,
        number,
        status: "draft",
        definition: from.definition,
        sourceHash: hash(from.definition),
        authorId: user.id,
        reviewerId: null,
        changeNote: null,
        reviewComment: null,
        publishedAt: null,
      },
      { transaction },
    );
    return { guideId: guide.id, number };
  });
}

/** A new company guide from a small, valid starting point. */
export async function createGuide(user: SessionUser, title: string, kind: GuideKind = "guide"): Promise<{ guideId: number; number: number }> {
  const base =
    title
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-|-$/g, "")
      .slice(0, 60) || "new-guide";
  const scope = guideScope(user.companyId);
  let slug = /^[a-z]/.test(base) ? base : `guide-${base}`;
  for (
    let n = 2;
    await GuideRecord.findOne({
      where: {
        [Op.or]: [
          { scope, slug },
          { scope: "builtin", slug },
        ],
      },
    });
    n++
  )
    slug = `${base}-${n}`;
  const definition: Guide =
    kind === "card"
      ? {
          kind: "card",
          id: slug,
          title,
          summary: "",
          symptoms: [title.toLowerCase()],
          initial: "first-item",
          states: {
            "first-item": { on: { DONE: "complete", CANT: "not-ready" }, meta: { kind: "task", prompt: "The first item of the routine.", minutes: 1 } },
            complete: { type: "final", meta: { kind: "fixed", prompt: "Card complete." } },
            "not-ready": { type: "final", meta: { kind: "handoff", prompt: "The rig is not ready: tell your supervisor (write what is wrong in the note)." } },
          },
        }
      : {
          id: slug,
          title,
          // Left empty on purpose: the checker asks for it, so no placeholder sentence reaches a crew.
          summary: "",
          symptoms: [title.toLowerCase()],
          initial: "first-check",
          states: {
            "first-check": {
              on: { YES: "fixed-end", NO: "handoff-end" },
              meta: { kind: "check", prompt: "Is the first likely cause the problem?", minutes: 1 },
            },
            "fixed-end": { type: "final", meta: { kind: "fixed", prompt: "Fixed.", cause: causeList()[0].code, component: causeList()[0].component } },
            "handoff-end": { type: "final", meta: { kind: "handoff", prompt: "This needs more than the crew can do on site: hand it to the supervisor." } },
          },
        };
  const guide = await GuideRecord.create({ companyId: user.companyId, scope, slug, title, publishedVersion: null, basedOnGuideId: null });
  await GuideVersion.create({
    guideId: guide.id,
    number: 1,
    status: "draft",
    definition,
    sourceHash: hash(definition),
    authorId: user.id,
    reviewerId: null,
    changeNote: null,
    reviewComment: null,
    publishedAt: null,
  });
  return { guideId: guide.id, number: 1 };
}

/** Saves a draft as it stands (problems and all); repeating a save changes nothing more. A published version cannot be saved over. */
export async function saveDraft(user: SessionUser, guideId: number, number: number, definition: unknown) {
  const { guide, version } = await deskVersion(user, guideId, number);
  if (guide.companyId !== user.companyId || version.status !== "draft") fail(409, "Only a draft of your company's guide can be saved.");
  if (typeof definition !== "object" || definition === null || Array.isArray(definition)) fail(400, "The guide must be a JSON object.");
  if (JSON.stringify(definition).length > MAX_DEFINITION_CHARS) fail(413, "That guide is too large (over 200,000 characters).");
  if (!wellFormedText(definition)) fail(400, "Nothing saved: the guide has text that is not valid Unicode, or is nested too deeply.");
  const shape = draftShapeSchema.safeParse(definition);
  if (!shape.success) {
    const first = shape.error.issues[0];
    fail(400, `Nothing saved: the draft is not in a shape the editor can open (${first.path.join(".") || "guide"}: ${first.message}).`);
  }
  const sourceHash = hash(definition);
  if (sourceHash !== version.sourceHash) await version.update({ definition: definition as Guide, sourceHash });
  return { problems: await checkDefinition(user, definition) };
}

/** Draft → in review, with a change note; refused while the validator finds problems. */
export async function submitDraft(user: SessionUser, guideId: number, number: number, changeNote: string) {
  const { guide, version } = await deskVersion(user, guideId, number);
  if (guide.companyId !== user.companyId || version.status !== "draft") fail(409, "Only a draft can be sent for review.");
  const problems = await checkDefinition(user, version.definition);
  if (problems.length) {
    const listed = Object.fromEntries(problems.map((p, i) => [String(i + 1), `${p.step ? `Step “${p.step}”: ` : ""}${plainProblem(p.message)}`]));
    fail(422, `Fix ${problems.length} problem${problems.length === 1 ? "" : "s"} before sending this for review.`, listed);
  }
  await version.update({ status: "in_review", changeNote, authorId: version.authorId ?? user.id });
}

/** A supervisor approves (publishes; the previous published version is retired) or sends back to draft with a comment. */
export async function reviewVersion(user: SessionUser, guideId: number, number: number, decision: "approve" | "return", comment: string | null) {
  const { guide, version } = await deskVersion(user, guideId, number);
  if (guide.companyId !== user.companyId || version.status !== "in_review") fail(409, "Only a version in review can be approved or sent back.");
  if (decision === "return") {
    if (!comment) fail(400, "Say what needs changing.", { comment: "required when sending back" });
    await version.update({ status: "draft", reviewComment: comment, reviewerId: user.id });
    return;
  }
  const problems = await checkDefinition(user, version.definition);
  if (problems.length) fail(422, "This version has problems and cannot be published.");
  await sequelize.transaction(async (transaction) => {
    await GuideVersion.update({ status: "retired" }, { where: { guideId: guide.id, status: "published" }, transaction });
    await version.update({ status: "published", reviewerId: user.id, reviewComment: comment, publishedAt: new Date() }, { transaction });
    await guide.update({ publishedVersion: version.number, title: version.definition.title }, { transaction });
    await reportsChanged(user.companyId, transaction);
  });
}

/** Imports a guide file as a new draft; a bad file lists every problem and changes nothing. */
export async function importGuide(user: SessionUser, text: string): Promise<{ guideId: number; number: number }> {
  const { guide: parsed, problems } = validateGuide(text, {
    causes: causeList(),
    name: "imported file",
    guideIds: (await openableGuides(user)).map((g) => g.slug),
  });
  if (!parsed)
    fail(
      400,
      `The file has ${problems.length} problem${problems.length === 1 ? "" : "s"}; nothing was imported.`,
      Object.fromEntries(problems.map((p, i) => [String(i + 1), `${p.step ? `step "${p.step}": ` : ""}${p.message}`])),
    );
  const scope = guideScope(user.companyId);
  return sequelize.transaction(async (transaction) => {
    const builtIn = await GuideRecord.findOne({ where: { scope: "builtin", slug: parsed.id }, transaction });
    const guide =
      (await GuideRecord.findOne({ where: { scope, slug: parsed.id }, transaction, lock: transaction.LOCK.UPDATE })) ??
      (await GuideRecord.create(
        { companyId: user.companyId, scope, slug: parsed.id, title: parsed.title, publishedVersion: null, basedOnGuideId: builtIn?.id ?? null },
        { transaction },
      ));
    const existingDraft = await GuideVersion.findOne({ where: { guideId: guide.id, status: "draft" }, transaction });
    if (existingDraft) fail(409, "This guide already has a draft: finish or send it for review before importing another.");
    const latest = await GuideVersion.findOne({ where: { guideId: guide.id }, order: [["number", "DESC"]], transaction });
    const number = (latest?.number ?? 0) + 1;
    await GuideVersion.create(
      {
        guideId: guide.id,
        number,
        status: "draft",
        definition: parsed,
        sourceHash: hash(parsed),
        authorId: user.id,
        reviewerId: null,
        changeNote: "Imported from a file.",
        reviewComment: null,
        publishedAt: null,
      },
      { transaction },
    );
    return { guideId: guide.id, number };
  });
}

export async function versionFor(user: SessionUser, guideId: number, number: number) {
  const { guide, version } = await deskVersion(user, guideId, number);
  const people = await User.findAll({ where: { id: [version.authorId, version.reviewerId].filter((x): x is number => !!x) }, attributes: ["id", "name"] });
  const nameOf = (id: number | null) => people.find((p) => p.id === id)?.name ?? null;
  return {
    guide: { id: guide.id, slug: guide.slug, title: guide.title, builtIn: guide.companyId === null, publishedVersion: guide.publishedVersion },
    version: {
      number: version.number,
      status: version.status,
      definition: version.definition,
      changeNote: version.changeNote,
      reviewComment: version.reviewComment,
      author: nameOf(version.authorId),
      reviewer: nameOf(version.reviewerId),
      publishedAt: version.publishedAt?.toISOString() ?? null,
      updatedAt: version.updatedAt.toISOString(),
    },
  };
}

/** How crews went through a guide's published version, and what order of checks past causes suggest. */
export async function learnFromCases(user: SessionUser, guideId: number) {
  const guide = await deskGuide(user, guideId);
  if (!guide.publishedVersion) return null;
  const version = (await GuideVersion.findOne({ where: { guideId: guide.id, number: guide.publishedVersion } }))!;
  const rows = await sequelize.query<Record<string, unknown>>(
    `SELECT c.id, c.outcome, c.final_step, c.opened_at, c.cause_code, e.seq, e.step_id, e.answer, e.at
     FROM cases c LEFT JOIN case_events e ON e.case_id = c.id
     WHERE c.company_id = :company AND c.guide_version_id = :version ORDER BY c.id, e.seq`,
    { replacements: { company: user.companyId, version: version.id }, type: QueryTypes.SELECT },
  );
  const cases = new Map<string, FlowCase & { cause: string | null }>();
  for (const r of rows) {
    const id = String(r.id);
    if (!cases.has(id))
      cases.set(id, {
        outcome: String(r.outcome),
        finalStep: (r.final_step as string) ?? null,
        openedAt: new Date(r.opened_at as string).toISOString(),
        events: [],
        cause: (r.cause_code as string) ?? null,
      });
    if (r.seq !== null)
      cases.get(id)!.events.push({ seq: Number(r.seq), stepId: String(r.step_id), answer: String(r.answer), at: new Date(r.at as string).toISOString() });
  }
  const definition = version.definition;
  const flow = stepFlow(compileGuide(definition), Object.keys(definition.states), [...cases.values()]);
  const causeCounts = new Map<string, number>();
  for (const c of cases.values()) if (c.cause) causeCounts.set(c.cause, (causeCounts.get(c.cause) ?? 0) + 1);
  const line = mainLine(definition);
  const checks = line.map((l) => ({
    id: l.stepId,
    minutes: l.minutes,
    probability: l.causes.reduce((s, c) => s + (causeCounts.get(c) ?? 0), 0),
    guard: l.guard,
    causes: l.causes,
  }));
  const suggested = ratioOrder(checks);
  return {
    version: version.number,
    cases: cases.size,
    flow,
    // Trainers read steps by what they ask, not by their ids.
    prompts: Object.fromEntries(Object.entries(definition.states).map(([id, s]) => [id, s.meta.prompt.replace(/\*\*|__|`/g, "")])),
    advisor: {
      current: checks,
      suggested,
      currentMinutes: expectedMinutes(checks),
      suggestedMinutes: expectedMinutes(suggested),
      foundCases: checks.reduce((s, c) => s + c.probability, 0),
    },
  };
}
