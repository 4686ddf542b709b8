import type { Guide } from "~/lib/guides/schema";
import { ownedBy } from "./tenancy.server";
import { walkRigOf, type WalkRig } from "~/lib/rigs/specs";
import { jobSummaryById } from "./jobs.server";
import type { CaseKind, Outcome } from "~/lib/vocabulary";
import { Case, CaseEvent, CasePhoto, GuideRecord, GuideVersion, Rig, User } from "./db.server";
import { notFound, type SessionUser } from "./guards.server";

type VersionInfo = { id: number; number: number; guideId: number; definition: Guide };

// A version a case follows is published or retired, and neither changes once published: read
// once per process rather than 12 KB of definition for every batch of answers.
const versions = new Map<number, VersionInfo>();

export async function guideVersion(id: number): Promise<VersionInfo> {
  let version = versions.get(id);
  if (!version) {
    const row = await GuideVersion.findByPk(id, { attributes: ["id", "number", "definition", "guideId", "status"] });
    if (!row) throw new Error(`Guide version ${id} is missing`);
    version = { id: row.id, number: row.number, guideId: row.guideId, definition: row.definition };
    // A draft can still change (a case never follows one, but be safe): keep only settled versions.
    if (row.status !== "draft") {
      if (versions.size >= 2000) versions.delete(versions.keys().next().value!);
      versions.set(id, version);
    }
  }
  return version;
}

/** The company's case with the guide version it follows; another company's id is a 404. */
export async function findCaseWithGuide(user: SessionUser, caseId: string) {
  const found = await Case.findOne({ where: ownedBy(user, { id: caseId }) });
  if (!found) notFound("That case");
  const version = await guideVersion(found.guideVersionId);
  return { found, guide: version.definition, version };
}

export interface CaseDetail {
  id: string;
  outcome: Outcome;
  openedAt: string;
  closedAt: string | null;
  engineHours: number | null;
  finalStep: string | null;
  causeCode: string | null;
  safetyAckAt: string | null;
  note: string | null;
  handoffResolvedAt: string | null;
  handoffResolvedBy: string | null;
  handoffResolvedNote: string | null;
  rig: WalkRig;
  guide: { slug: string; title: string; version: number; versionId: number; definition: Guide };
  openedBy: string | null;
  events: { id: string; seq: number; stepId: string; answer: string; at: string; note: string | null }[];
  photos: { id: number; stepId: string | null; contentType: string; takenAt: string }[];
  kind: CaseKind;
  rigId: number;
  /** On a closed card: items answered "can't do it". */
  cardGaps: number | null;
  /** The card this fix was opened from. */
  fromCard: { caseId: string; title: string } | null;
  /** The fixes opened from this card's items. */
  fixesOpened: { caseId: string; title: string; outcome: Outcome }[];
}

type WithTitle = Case & { guideVersion: GuideVersion & { guide: GuideRecord } };
const titled = [{ model: GuideVersion, as: "guideVersion", attributes: ["id"], include: [{ model: GuideRecord, as: "guide", attributes: ["title"] }] }];

/** The card a fix came from and the fixes a card opened, both within the company. */
async function cardLinks(user: SessionUser, found: Case) {
  const [from, opened] = await Promise.all([
    found.fromCaseId
      ? (Case.findOne({ where: ownedBy(user, { id: found.fromCaseId }), attributes: ["id"], include: titled }) as Promise<WithTitle | null>)
      : null,
    found.kind === "card"
      ? (Case.findAll({
          where: ownedBy(user, { fromCaseId: found.id }),
          attributes: ["id", "outcome"],
          include: titled,
          order: [["openedAt", "ASC"]],
        }) as Promise<WithTitle[]>)
      : [],
  ]);
  return {
    fromCard: from ? { caseId: from.id, title: from.guideVersion.guide.title } : null,
    fixesOpened: opened.map((c) => ({ caseId: c.id, title: c.guideVersion.guide.title, outcome: c.outcome })),
  };
}

export async function caseDetail(user: SessionUser, caseId: string): Promise<CaseDetail> {
  const { found, guide, version } = await findCaseWithGuide(user, caseId);
  const [rig, record, opener, resolver, events, photos, links, job] = await Promise.all([
    Rig.findByPk(found.rigId),
    GuideRecord.findByPk(version.guideId, { attributes: ["slug", "title"] }),
    found.openedBy ? User.findByPk(found.openedBy, { attributes: ["name"] }) : null,
    found.handoffResolvedBy ? User.findByPk(found.handoffResolvedBy, { attributes: ["name"] }) : null,
    CaseEvent.findAll({ where: { caseId }, order: [["seq", "ASC"]] }),
    CasePhoto.findAll({ where: { caseId }, attributes: ["id", "stepId", "contentType", "createdAt"], order: [["id", "ASC"]] }),
    cardLinks(user, found),
    jobSummaryById(user, found.jobId),
  ]);
  return {
    id: found.id,
    outcome: found.outcome,
    openedAt: found.openedAt.toISOString(),
    closedAt: found.closedAt?.toISOString() ?? null,
    engineHours: found.engineHours,
    finalStep: found.finalStep,
    causeCode: found.causeCode,
    safetyAckAt: found.safetyAckAt?.toISOString() ?? null,
    note: found.note,
    handoffResolvedAt: found.handoffResolvedAt?.toISOString() ?? null,
    handoffResolvedBy: resolver?.name ?? null,
    handoffResolvedNote: found.handoffResolvedNote,
    rig: { ...walkRigOf(rig!), job },
    guide: { slug: record!.slug, title: record!.title, version: version.number, versionId: version.id, definition: guide },
    openedBy: opener?.name ?? null,
    events: events.map((e) => ({ id: e.id, seq: e.seq, stepId: e.stepId, answer: e.answer, at: e.at.toISOString(), note: e.note })),
    photos: photos.map((p) => ({ id: p.id, stepId: p.stepId, contentType: p.contentType, takenAt: p.createdAt.toISOString() })),
    kind: found.kind,
    rigId: found.rigId,
    cardGaps: found.cardGaps,
    ...links,
  };
}
