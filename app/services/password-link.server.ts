import { readForm } from "./read-request.server";
import { parseForm } from "~/lib/forms/parse";
import { data, redirect } from "react-router";
import { choosePasswordSchema } from "~/lib/people/schema";
import { signInCookie } from "./session.server";

type SpendLink = (password: string) => Promise<{ ok: true; userId: number } | { ok: false; message: string }>;

/** The action behind an e-mailed password link (joining, resetting): check the form, spend the link, sign the person in. */
export async function setPasswordFromLink(request: Request, spend: SpendLink) {
  const submission = parseForm(await readForm(request), choosePasswordSchema);
  if (submission.status !== "success") return data({ result: submission.reply({ hideFields: ["password", "confirm"] }), message: null }, { status: 400 });
  const done = await spend(submission.value.password);
  if (!done.ok) return data({ result: null, message: done.message }, { status: 410 });
  return redirect("/", { headers: await signInCookie(request, done.userId) });
}
