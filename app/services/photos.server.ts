import { randomUUID } from "node:crypto";
import { fileTypeFromBuffer } from "file-type";
import { Case, CasePhoto } from "./db.server";
import { fail, notFound, type SessionUser } from "./guards.server";
import { getObject, putObject } from "./storage.server";

export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
const IMAGE_TYPES = new Set(["image/jpeg", "image/png", "image/webp", "image/heic", "image/heif", "image/avif"]);

async function companyCase(user: SessionUser, caseId: string) {
  const found = await Case.findOne({ where: { id: caseId, companyId: user.companyId }, attributes: ["id", "companyId"] });
  if (!found) notFound("That case");
  return found;
}

/** Stores a photo for a case under a key the server makes. The bytes, not the name, decide whether it is an image. */
export async function addPhoto(user: SessionUser, caseId: string, stepId: string | null, bytes: Uint8Array) {
  await companyCase(user, caseId);
  if (bytes.byteLength === 0) fail(400, "The photo is empty.", { photo: "empty file" });
  if (bytes.byteLength > MAX_PHOTO_BYTES) fail(413, "Photos can be at most 10 MB.", { photo: "over 10 MB" });
  const type = await fileTypeFromBuffer(bytes);
  if (!type || !IMAGE_TYPES.has(type.mime)) {
    fail(415, "That file is not a photo (JPEG, PNG, WebP or HEIC).", { photo: `looks like ${type?.mime ?? "an unknown file type"}` });
  }
  const key = `companies/${user.companyId}/cases/${caseId}/${randomUUID()}.${type.ext}`;
  await putObject(key, bytes, type.mime);
  const photo = await CasePhoto.create({ caseId, stepId, storageKey: key, contentType: type.mime, bytes: bytes.byteLength, uploadedBy: user.id });
  return { id: photo.id };
}

export async function readPhoto(user: SessionUser, caseId: string, photoId: number) {
  await companyCase(user, caseId);
  const photo = await CasePhoto.findOne({ where: { id: photoId, caseId }, attributes: ["storageKey", "contentType"] });
  if (!photo) notFound("That photo");
  return getObject(photo.storageKey);
}
