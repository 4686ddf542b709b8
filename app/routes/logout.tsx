import { redirect } from "react-router";
import { getSession, sessionStorage } from "~/services/session.server";
import type { Route } from "./+types/logout";

export async function loader() {
  return redirect("/login");
}

export async function action({ request }: Route.ActionArgs) {
  const session = await getSession(request);
  return redirect("/login", { headers: { "Set-Cookie": await sessionStorage.destroySession(session) } });
}
