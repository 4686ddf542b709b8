import { redirect } from "react-router";
import { signOutCookie } from "~/services/session.server";
import type { Route } from "./+types/logout";

export async function loader() {
  return redirect("/login");
}

/** Signing out deletes this device's session on the server, not only the cookie. */
export async function action({ request }: Route.ActionArgs) {
  return redirect("/login", { headers: await signOutCookie(request) });
}
