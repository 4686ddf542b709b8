import { randomUUID } from "node:crypto";
import { MAX_PHOTO_BYTES } from "~/lib/cases/limits";
import { ownedBy } from "./tenancy.server";
import { fileTypeFromBuffer } from "file-type";
import sharp from "sharp";
import { Case, CasePhoto } from "./db.server";
import { fail, notFound, type SessionUser } from "./guards.server";
import { getObject, putObject } from "./storage.server";

export { MAX_PHOTO_BYTES };
const IMAGE_TYPES = new Set(["image/jpeg", "image/png", "image/webp", "image/heic", "image/heif", "image/avif"]);

async function companyCase(user: SessionUser, caseId: string) {
  const found = await Case.findOne({ where: ownedBy(user, { id: caseId }), attributes: ["id", "companyId"] });
  if (!found) notFound("That case");
  return found;
}

/** Stores a photo for a case under a key the server makes. The bytes, not the name, decide whether it is an image. */
export async function addPhoto(user: SessionUser, caseId: string, stepId: string | null, bytes: Uint8Array, phoneId: string | null = null) {
  await companyCase(user, caseId);
  // Sent again after a dropped connection: the first copy stands.
  const already = phoneId ? await CasePhoto.findOne({ where: { caseId, phoneId }, attributes: ["id"] }) : null;
  if (already) return { id: already.id, created: false };
  if (bytes.byteLength === 0) fail(400, "The photo is empty.", { photo: "empty file" });
  if (bytes.byteLength > MAX_PHOTO_BYTES) fail(413, "Photos can be at most 10 MB.", { photo: "over 10 MB" });
  const type = await fileTypeFromBuffer(bytes);
  if (!type || !IMAGE_TYPES.has(type.mime)) {
    fail(415, "That file is not a photo (JPEG, PNG, WebP or HEIC).", { photo: `looks like ${type?.mime ?? "an unknown file type"}` });
  }
  const clean = await withoutMetadata(bytes, type.mime);
  const key = `companies/${user.companyId}/cases/${caseId}/${randomUUID()}.${clean.ext}`;
  await putObject(key, clean.bytes, clean.mime);
  try {
    const photo = await CasePhoto.create({
      caseId,
      stepId,
      storageKey: key,
      contentType: clean.mime,
      bytes: clean.bytes.byteLength,
      uploadedBy: user.id,
      phoneId,
    });
    return { id: photo.id, created: true };
  } catch (error) {
    // Two copies sent at once: the unique (case, phone id) index keeps one.
    if (phoneId && (error as { name?: string }).name === "SequelizeUniqueConstraintError") {
      const first = await CasePhoto.findOne({ where: { caseId, phoneId }, attributes: ["id"] });
      if (first) return { id: first.id, created: false };
    }
    throw error;
  }
}

/**
 * A phone's photo carries where it was taken (GPS), the phone's make and more in its EXIF and XMP
 * blocks. The image is turned upright by its orientation tag, then written again without any
 * metadata (sharp keeps none unless asked). HEIC/AVIF come back as JPEG, which every browser shows.
 */
async function withoutMetadata(bytes: Uint8Array, mime: string): Promise<{ bytes: Uint8Array; mime: string; ext: string }> {
  const image = sharp(bytes, { failOn: "error" }).rotate();
  try {
    if (mime === "image/png") return { bytes: await image.png().toBuffer(), mime, ext: "png" };
    if (mime === "image/webp") return { bytes: await image.webp({ quality: 85 }).toBuffer(), mime, ext: "webp" };
    return { bytes: await image.jpeg({ quality: 85, mozjpeg: true }).toBuffer(), mime: "image/jpeg", ext: "jpg" };
  } catch {
    fail(415, "That photo could not be read (the file is damaged or not a whole image).", { photo: "unreadable image" });
  }
}

export async function readPhoto(user: SessionUser, caseId: string, photoId: number) {
  await companyCase(user, caseId);
  const photo = await CasePhoto.findOne({ where: { id: photoId, caseId }, attributes: ["storageKey", "contentType"] });
  if (!photo) notFound("That photo");
  return getObject(photo.storageKey);
}
