import { boardQuerySchema } from "~/lib/stats/board-query";
import { boardFor, jobBoardFor } from "~/services/board.server";
import { careFor } from "~/services/care.server";
import { requirePermission } from "~/services/guards.server";
import { keptJson } from "~/services/kept-json.server";
import { readQuery } from "~/services/read-request.server";
import type { Route } from "./+types/api.board";

/** GET /api/board?from=…&to=…&rig=…&repeatDays=…: the fault board's figures as JSON (supervisor and admin). */
export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "read-board");
  const q = readQuery(request, boardQuerySchema);
  const [board, care, jobs] = await Promise.all([boardFor(user, q), careFor(user, q), jobBoardFor(user, q)]);
  // Both are kept per company and window (report-cache) under the same reports version, so the
  // encoded answer is kept with the board.
  return keptJson(request, board, () => ({ window: { from: q.fromDay, to: q.toDay, rig: q.rigCode ?? null, repeatDays: q.repeatDays }, ...board, care, jobs }));
}
