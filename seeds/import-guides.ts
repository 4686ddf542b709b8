/**
 * Imports the shipped library (content/guides) as built-in guides. A new file becomes
 * published version 1; an unchanged file changes nothing; a changed file becomes a new
 * published version and retires the one before (a published version is never edited).
 */
import { createHash } from "node:crypto";
import { db, GuideRecord, GuideVersion, guideScope } from "../db/index";
import type { Guide } from "../app/lib/guides/schema";

export const definitionHash = (guide: Guide) => createHash("sha256").update(JSON.stringify(guide)).digest("hex");

export async function importBuiltinGuides(library: Guide[]): Promise<{ created: number; updated: number; unchanged: number }> {
  const counts = { created: 0, updated: 0, unchanged: 0 };
  const sequelize = db();
  for (const guide of library) {
    const hash = definitionHash(guide);
    await sequelize.transaction(async (transaction) => {
      const [record, created] = await GuideRecord.findOrCreate({
        where: { scope: guideScope(null), slug: guide.id },
        defaults: { companyId: null, scope: guideScope(null), slug: guide.id, title: guide.title, publishedVersion: null, basedOnGuideId: null },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      const latest = await GuideVersion.findOne({ where: { guideId: record.id }, order: [["number", "DESC"]], transaction });
      if (latest?.sourceHash === hash) {
        counts.unchanged++;
        return;
      }
      const number = (latest?.number ?? 0) + 1;
      await GuideVersion.update({ status: "retired" }, { where: { guideId: record.id, status: "published" }, transaction });
      await GuideVersion.create(
        {
          guideId: record.id,
          number,
          status: "published",
          definition: guide,
          sourceHash: hash,
          authorId: null,
          reviewerId: null,
          changeNote: number === 1 ? "Shipped with Tankside." : "Updated shipped guide.",
          reviewComment: null,
          publishedAt: new Date(),
        },
        { transaction },
      );
      await record.update({ publishedVersion: number, title: guide.title }, { transaction });
      if (created) counts.created++;
      else counts.updated++;
    });
  }
  return counts;
}
