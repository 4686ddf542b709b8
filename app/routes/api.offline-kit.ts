import { offlineKit } from "~/services/offline-kit.server";
import { requireUser } from "~/services/guards.server";
import type { Route } from "./+types/api.offline-kit";

/** GET /api/offline-kit: what the phone keeps for starting a fix with no signal (refreshed whenever it has signal). */
export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  return Response.json(await offlineKit(user), { headers: { "Cache-Control": "private, no-store" } });
}
