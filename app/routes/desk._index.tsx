import { data, Form, Link, redirect } from "react-router";
import { PageTitle } from "~/components/ui/page-title";
import { statusLabel } from "~/lib/vocabulary";
import { createGuide, deskList, importGuide } from "~/services/desk.server";
import { requirePermission } from "~/services/guards.server";
import { readForm } from "~/services/read-request.server";
import type { Route } from "./+types/desk._index";

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  return { guides: await deskList(user) };
}

const MAX_IMPORT_BYTES = 200_000;

export async function action({ request, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  const form = await readForm(request);
  const intent = form.get("intent");
  try {
    if (intent === "new") {
      const title = String(form.get("title") ?? "").trim();
      if (title.length < 3 || title.length > 120)
        return data({ error: "Give the new guide a title of 3 to 120 characters.", problems: [] as string[] }, { status: 400 });
      const { guideId, number } = await createGuide(user, title);
      return redirect(`/desk/${guideId}/v/${number}`);
    }
    if (intent === "import") {
      const file = form.get("file");
      if (!(file instanceof File) || file.size === 0)
        return data({ error: "Choose a guide file (.json) to import.", problems: [] as string[] }, { status: 400 });
      if (file.size > MAX_IMPORT_BYTES) return data({ error: "That file is too large for a guide (over 200 kB).", problems: [] as string[] }, { status: 413 });
      const { guideId, number } = await importGuide(user, await file.text());
      return redirect(`/desk/${guideId}/v/${number}`);
    }
  } catch (thrown) {
    // A refused import lists every problem; the desk stays as it was.
    const body = (thrown as { data?: { error?: string; fields?: Record<string, string> } }).data;
    if (body?.error)
      return data(
        { error: body.error, problems: Object.values(body.fields ?? {}) },
        { status: (thrown as { init?: { status?: number } }).init?.status ?? 400 },
      );
    throw thrown;
  }
  return data({ error: "Unknown action.", problems: [] as string[] }, { status: 400 });
}

export default function Desk({ loaderData, actionData }: Route.ComponentProps) {
  const own = loaderData.guides.filter((g) => !g.builtIn);
  const builtIn = loaderData.guides.filter((g) => g.builtIn);
  const row = (g: (typeof loaderData.guides)[number]) => (
    <li key={g.id} className="rounded-md border-2 border-rule bg-paper p-3">
      <Link to={`/desk/${g.id}`} className="text-lg font-bold">
        {g.title}
      </Link>
      <p className="text-sm">
        {g.publishedVersion ? `Crews use version ${g.publishedVersion}` : "Not published yet"}
        {g.replacedByCompanyCopy ? " · replaced by your company's copy" : ""}
        {" · "}
        {g.versions.map((v) => `v${v.number} ${statusLabel(v.status).toLowerCase()}`).join(", ")}
      </p>
    </li>
  );
  return (
    <>
      <PageTitle lead="Write, review and publish the guides your crews follow.">Guide desk</PageTitle>
      {actionData?.error ? (
        <div role="alert" className="mb-4 rounded-md border-4 border-stop bg-paper p-3">
          <p className="font-bold text-stop">{actionData.error}</p>
          {actionData.problems.length ? (
            <ul className="mt-2 list-disc pl-6">
              {actionData.problems.map((p, i) => (
                <li key={i}>{p}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <Form method="post" className="rounded-lg border-2 border-ink bg-paper p-3">
          <input type="hidden" name="intent" value="new" />
          <label className="block font-bold">
            Write a new guide
            <input name="title" placeholder="e.g. Hopper gate sticks" className="mt-1 block min-h-12 w-full rounded-md border-2 border-ink px-2" />
          </label>
          <button className="mt-2 min-h-12 w-full rounded-md bg-go font-bold text-white">Start a draft</button>
        </Form>
        <Form method="post" encType="multipart/form-data" className="rounded-lg border-2 border-ink bg-paper p-3">
          <input type="hidden" name="intent" value="import" />
          <label className="block font-bold">
            Import a guide file (.json)
            <input type="file" name="file" accept="application/json,.json" className="mt-1 block min-h-12 w-full" />
          </label>
          <button className="mt-2 min-h-12 w-full rounded-md border-2 border-ink bg-paper font-bold">Import as a draft</button>
        </Form>
      </div>
      <h2 className="mt-6 text-xl font-bold">Your company's guides</h2>
      {own.length ? <ul className="mt-2 space-y-2">{own.map(row)}</ul> : <p>None yet. Edit a built-in guide to make your own copy, or write a new one.</p>}
      <h2 className="mt-6 text-xl font-bold">Built-in library</h2>
      <ul className="mt-2 space-y-2">{builtIn.map(row)}</ul>
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Guide desk · Tankside" }];
