import { requireUser } from "~/services/guards.server";
import type { Route } from "./+types/not-found";

/** Any address the app does not have: a 404 inside the app, with its navigation (signed out: sign in first). */
export async function loader({ request, context }: Route.LoaderArgs) {
  await requireUser({ request, context });
  throw new Response(null, { status: 404 });
}

export default function NotFound() {
  return null;
}
