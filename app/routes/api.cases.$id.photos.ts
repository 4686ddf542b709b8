import { FormDataParseError, MaxFileSizeExceededError, parseFormData } from "@remix-run/form-data-parser";
import { z } from "zod";
import { fail, requireUser } from "~/services/guards.server";
import { requirePost } from "~/services/read-request.server";
import { addPhoto, MAX_PHOTO_BYTES } from "~/services/photos.server";
import type { Route } from "./+types/api.cases.$id.photos";

const fields = z.object({ stepId: z.string().min(1).max(80).optional() });

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
  const parsedFields = fields.safeParse({ stepId: form.get("stepId") ?? undefined });
  if (!parsedFields.success) fail(400, "stepId must name a step (at most 80 characters).", { stepId: "not a step name" });
  const { stepId } = parsedFields.data;
  const saved = await addPhoto(user, params.id, stepId ?? null, new Uint8Array(await photo.arrayBuffer()));
  return Response.json(saved, { status: 201 });
}
