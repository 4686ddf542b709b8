import { RIG_SPEC_FIELDS, walkRigOf } from "~/lib/rigs/specs";
import type { OfflineKit } from "~/lib/walk/kept";
import { lastRigIdFor } from "./cases.server";
import { loadRulesFor } from "./company.server";
import { Rig } from "./db.server";
import { guideTexts } from "./guide-text.server";
import { hiddenSections } from "./env.server";
import type { SessionUser } from "./guards.server";
import { causeNames, usableGuides } from "./guides.server";
import { ownedBy } from "./tenancy.server";
import { localizeGuide } from "~/lib/guides/translations";
import { upcomingPlan } from "./jobs.server";

export type { OfflineKit };

/** What a phone keeps so its person can start a fix with no signal: the company's active rigs, the guides they may start, cause names. */
export async function offlineKit(user: SessionUser): Promise<OfflineKit> {
  const [rigs, guides, lastRigId, loadRules, upcoming] = await Promise.all([
    Rig.findAll({
      where: ownedBy(user, { retired: false }),
      attributes: ["id", ...RIG_SPEC_FIELDS, "hasHourMeter", "engineHours", "mount", "pumpKind"],
      order: [["code", "ASC"]],
    }),
    usableGuides(user),
    lastRigIdFor(user),
    loadRulesFor(user),
    upcomingPlan(user),
  ]);
  const lang = user.language ?? "en";
  return {
    madeAt: new Date().toISOString(),
    person: {
      id: user.id,
      name: user.name,
      email: user.email,
      role: user.role,
      companyId: user.companyId,
      companyName: user.companyName,
      timeZone: user.timeZone,
    },
    hidden: hiddenSections(),
    rigs: rigs.map((r) => ({ ...walkRigOf(r), mount: r.mount, pumpKind: r.pumpKind })),
    lastRigCode: rigs.find((r) => r.id === lastRigId)?.code ?? null,
    // In the person's language, as the walk's own page has them.
    guides: guides.map((g) => {
      const { guide: definition, inEnglish } = localizeGuide(g.definition, lang);
      return {
        slug: g.slug,
        title: lang === "en" ? g.title : definition.title,
        summary: definition.summary,
        symptoms: definition.symptoms,
        versionId: g.versionId,
        version: g.version,
        definition,
        texts: guideTexts(g.versionId, definition, lang),
        inEnglish,
      };
    }),
    language: lang,
    causeNames: causeNames(lang),
    loadRules,
    jobs: { jobs: upcoming.jobs, plan: upcoming.plan },
  };
}
