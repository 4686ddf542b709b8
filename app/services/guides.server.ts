import { Op } from "sequelize";
import { replacedBuiltIns, usableBy } from "./tenancy.server";
import { loadCauses } from "~/lib/guides/files.server";
import type { Cause } from "~/lib/guides/causes";
import { guideKind, type Guide, type GuideKind } from "~/lib/guides/schema";
import { createGuideSearch, searchDocFor, type SearchHit } from "~/lib/guides/search";
import { localizeGuide } from "~/lib/guides/translations";
import type { Language } from "~/lib/i18n/languages";
import { GuideRecord, GuideVersion } from "./db.server";
import { notFound, type SessionUser } from "./guards.server";
import { can } from "~/lib/permissions";

let causes: Cause[] | undefined;
/** The cause list from content/causes.json, read once per process. */
export const causeList = () => (causes ??= loadCauses());
/** Every cause's name by its code, in a language (English where it has none). */
export const causeNames = (lang: Language = "en"): Record<string, string> =>
  Object.fromEntries(causeList().map((c) => [c.code, (lang !== "en" && c.names?.[lang]) || c.name]));

export interface UsableGuide {
  guideId: number;
  slug: string;
  title: string;
  versionId: number;
  version: number;
  definition: Guide;
  /** A fault guide or a rig card (the definition says; guides leave it out). */
  kind: GuideKind;
}

/** The published fault guides (no rig cards), for the fix page. */
export const faultGuides = async (user: SessionUser) => (await usableGuides(user)).filter((g) => g.kind === "guide");
/** The published rig cards, for the cards page. */
export const rigCards = async (user: SessionUser) => (await usableGuides(user)).filter((g) => g.kind === "card");

/**
 * The published guides and cards a company's crews get: its own, plus every built-in guide it has
 * not replaced with its own copy.
 */
export async function usableGuides(user: SessionUser): Promise<UsableGuide[]> {
  const records = await GuideRecord.findAll({
    where: usableBy(user, { publishedVersion: { [Op.ne]: null } }),
    attributes: ["id", "companyId", "slug", "title", "publishedVersion", "basedOnGuideId"],
  });
  const replaced = replacedBuiltIns(records);
  const chosen = records.filter((r) => !replaced.has(r.id));
  if (!chosen.length) return [];
  const versions = await GuideVersion.findAll({
    where: { [Op.or]: chosen.map((r) => ({ guideId: r.id, number: r.publishedVersion! })) },
    attributes: ["id", "guideId", "number"],
  });
  const definitions = await publishedDefinitions(versions.map((v) => v.id));
  const byGuide = new Map(versions.map((v) => [v.guideId, v]));
  return chosen
    .filter((r) => byGuide.has(r.id))
    .map((r) => {
      const v = byGuide.get(r.id)!;
      const definition = definitions.get(v.id)!;
      return { guideId: r.id, slug: r.slug, title: r.title, versionId: v.id, version: v.number, definition, kind: guideKind(definition) };
    })
    .sort((a, b) => a.title.localeCompare(b.title));
}

// A published version's definition never changes: each is read from the database once per process
// (the fix page, search and the offline kit ask for every usable guide on every request).
const definitionCache = new Map<number, Guide>();

async function publishedDefinitions(ids: number[]): Promise<Map<number, Guide>> {
  const missing = ids.filter((id) => !definitionCache.has(id));
  if (missing.length) {
    for (const v of await GuideVersion.findAll({ where: { id: missing }, attributes: ["id", "definition"] })) {
      if (definitionCache.size >= 2000) definitionCache.delete(definitionCache.keys().next().value!);
      definitionCache.set(v.id, v.definition);
    }
  }
  return new Map(ids.map((id) => [id, definitionCache.get(id)!]));
}

// Search indexes by the exact set of guide versions they cover: a new publish changes the key.
const indexes = new Map<string, ReturnType<typeof createGuideSearch>>();

/** Symptom search in the reader's language (their own, unless asked for another). */
export async function searchGuides(user: SessionUser, query: string, lang: Language = user.language ?? "en"): Promise<SearchHit[]> {
  const guides = await usableGuides(user);
  const key = `${lang}:${guides.map((g) => g.versionId).join(",")}`;
  let search = indexes.get(key);
  if (!search) {
    search = buildIndex(guides, lang);
    if (indexes.size >= 100) indexes.delete(indexes.keys().next().value!);
    indexes.set(key, search);
  }
  return search(query);
}

function buildIndex(guides: UsableGuide[], lang: Language) {
  const names = causeNames(lang);
  // Symptom search finds fault guides; rig cards are chosen from their own list.
  return createGuideSearch(
    guides
      .filter((g) => g.kind === "guide")
      .map((g) => {
        const definition = localizeGuide(g.definition, lang).guide;
        return searchDocFor({ slug: g.slug, title: lang === "en" ? g.title : definition.title, definition }, names);
      }),
    lang,
  );
}

/**
 * A guide version to print: by default the one crews use (the company's own copy once published,
 * else the built-in); a trainer may ask for any version of the company's own or the built-in
 * (the desk's print). Another company's guide, or a version a crew member may not see, is a 404.
 */
export async function printableGuide(user: SessionUser, slug: string, number?: number, guideId?: number) {
  const records = await GuideRecord.findAll({
    where: usableBy(user, { slug }),
    attributes: ["id", "companyId", "slug", "title", "publishedVersion", "basedOnGuideId"],
  });
  const own = records.find((r) => r.companyId === user.companyId);
  const builtIn = records.find((r) => r.companyId === null);
  const trainer = can(user, "edit-guides");
  // The desk names the guide it prints (the built-in and the company's copy share a slug).
  const named = guideId !== undefined ? records.find((r) => r.id === guideId) : undefined;
  const record = number !== undefined && trainer ? (named ?? own ?? builtIn) : own?.publishedVersion ? own : builtIn;
  const wanted = number !== undefined && trainer ? number : record?.publishedVersion;
  if (!record || !wanted) notFound("That guide");
  const version = await GuideVersion.findOne({
    where: { guideId: record.id, number: wanted },
    attributes: ["number", "status", "definition", "publishedAt", "updatedAt"],
  });
  if (!version) notFound("That version");
  return {
    slug: record.slug,
    number: version.number,
    status: version.status,
    definition: version.definition,
    /** Published versions carry their publish date; a draft the date it was last changed. */
    dated: (version.publishedAt ?? version.updatedAt).toISOString(),
  };
}
