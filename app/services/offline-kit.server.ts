import { RIG_SPEC_FIELDS, walkRigOf, type WalkRig } from "~/lib/rigs/specs";
import type { Guide } from "~/lib/guides/schema";
import { Rig } from "./db.server";
import type { SessionUser } from "./guards.server";
import { causeList, usableGuides } from "./guides.server";
import { ownedBy } from "./tenancy.server";

/** What a phone keeps so its person can start a fix with no signal: the company's active rigs, the guides they may start, cause names. */
export interface OfflineKit {
  /** When the server made it (the phone shows how fresh it is). */
  madeAt: string;
  companyId: number;
  rigs: WalkRig[];
  guides: { slug: string; title: string; summary: string; symptoms: string[]; versionId: number; version: number; definition: Guide }[];
  causeNames: Record<string, string>;
}

export async function offlineKit(user: SessionUser): Promise<OfflineKit> {
  const [rigs, guides] = await Promise.all([
    Rig.findAll({ where: ownedBy(user, { retired: false }), attributes: [...RIG_SPEC_FIELDS, "hasHourMeter", "engineHours"], order: [["code", "ASC"]] }),
    usableGuides(user),
  ]);
  return {
    madeAt: new Date().toISOString(),
    companyId: user.companyId,
    rigs: rigs.map(walkRigOf),
    guides: guides.map((g) => ({
      slug: g.slug,
      title: g.title,
      summary: g.definition.summary,
      symptoms: g.definition.symptoms,
      versionId: g.versionId,
      version: g.version,
      definition: g.definition,
    })),
    causeNames: Object.fromEntries(causeList().map((c) => [c.code, c.name])),
  };
}
