import { z } from "zod";
import { requireUser } from "~/services/guards.server";
import { readQuery } from "~/services/read-request.server";
import { searchGuides } from "~/services/guides.server";
import type { Route } from "./+types/api.guides.search";

const query = z.object({
  q: z
    .string({ error: "Say what is wrong, like “pump lost prime”." })
    .trim()
    .min(1, "Say what is wrong, like “pump lost prime”.")
    .max(120, "Keep it under 120 characters."),
});

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const { q } = readQuery(request, query);
  return Response.json({ results: await searchGuides(user, q) });
}
