import { notFound, requireUser } from "~/services/guards.server";
import { readPhoto } from "~/services/photos.server";
import type { Route } from "./+types/cases.$id.photos.$photoId";

/** A case photo, streamed through the app so the bucket stays private and company checks stay in one place. */
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const id = Number(params.photoId);
  if (!Number.isInteger(id) || id < 1) notFound("That photo");
  const photo = await readPhoto(user, params.id, id);
  return new Response(photo.body, {
    headers: {
      "Content-Type": photo.contentType,
      "Content-Disposition": `inline; filename="case-${params.id.slice(0, 8)}-photo-${id}.${photo.contentType.split("/")[1]}"`,
      // Opened on its own, a photo is a sandboxed document that can run nothing.
      "Content-Security-Policy": "sandbox; default-src 'none'; img-src 'self'; style-src 'unsafe-inline'",
      "Cache-Control": "private, max-age=86400",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
