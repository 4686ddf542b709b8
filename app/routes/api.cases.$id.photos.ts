import { FormDataParseError, MaxFileSizeExceededError, parseFormData } from "@remix-run/form-data-parser";
import { z } from "zod";
import { fail, requireUser } from "~/services/guards.server";
import { requirePost } from "~/services/read-request.server";
import { addPhoto, MAX_PHOTO_BYTES } from "~/services/photos.server";
import type { Route } from "./+types/api.cases.$id.photos";

const fields = z.object({
  stepId: z.string().min(1).max(80).optional(),
  /** The phone's id for a photo kept while offline: a resend is stored once. */
  phoneId: z.string().uuid().optional(),
});

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requireUser({ request, context });
  requirePost(request);
  let form: FormData;
  try {
    form = await parseFormData(request, { maxFileSize: MAX_PHOTO_BYTES, maxFiles: 1 }, async (file) =>
      file.fieldName === "photo" ? new Blob([await file.arrayBuffer()], { type: file.type }) : null,
    );
  } catch (error) {
    if (error instanceof MaxFileSizeExceededError) fail(413, "Photos can be at most 10 MB.", { photo: "over 10 MB" });
    if (error instanceof FormDataParseError || error instanceof TypeError) fail(400, "Send the photo as multipart form data in a field named photo.");
    throw error;
  }
  const photo = form.get("photo");
  if (!(photo instanceof Blob)) fail(400, "Add a photo in the field named photo.", { photo: "missing" });
  const parsedFields = fields.safeParse({ stepId: form.get("stepId") ?? undefined, phoneId: form.get("phoneId") ?? undefined });
  if (!parsedFields.success) {
    const bad = parsedFields.error.issues[0]?.path[0];
    if (bad === "phoneId") fail(400, "phoneId must be a UUID made by the phone.", { phoneId: "not a UUID" });
    fail(400, "stepId must name a step (at most 80 characters).", { stepId: "not a step name" });
  }
  const { stepId, phoneId } = parsedFields.data;
  const { id, created } = await addPhoto(user, params.id, stepId ?? null, new Uint8Array(await photo.arrayBuffer()), phoneId ?? null);
  return Response.json({ id }, { status: created ? 201 : 200 });
}
