import { Form, Link, redirect } from "react-router";
import { FormField, inputClass } from "~/components/forms/form-field";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { getFormProps, getInputProps } from "@conform-to/react";
import { newGuideSchema } from "~/lib/guides/desk-forms";
import { parseForm } from "~/lib/forms/parse";
import { ErrorList } from "~/components/ui/error-list";
import { PageTitle } from "~/components/ui/page-title";
import { statusLabel } from "~/lib/vocabulary";
import { createGuide, deskList, importGuide } from "~/services/desk.server";
import { answerRefusal, refusal, refused, requirePermission } from "~/services/guards.server";
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
      const submission = parseForm(form, newGuideSchema);
      if (submission.status !== "success") return refused(400, submission.error?.title?.[0] ?? "Give the new guide a title of 3 to 120 characters.");
      const { guideId, number } = await createGuide(user, submission.value.title, submission.value.kind);
      return redirect(`/desk/${guideId}/v/${number}`);
    }
    if (intent === "import") {
      const file = form.get("file");
      if (!(file instanceof File) || file.size === 0) return refused(400, "Choose a guide file (.json) to import.");
      if (file.size > MAX_IMPORT_BYTES) return refused(413, "That file is too large for a guide (over 200 kB).");
      const { guideId, number } = await importGuide(user, await file.text());
      return redirect(`/desk/${guideId}/v/${number}`);
    }
  } catch (thrown) {
    // A refused import lists every problem; the desk stays as it was.
    const r = refusal(thrown);
    if (r) return answerRefusal(r);
    throw thrown;
  }
  return refused(400, "Say what to do: new or import.");
}

export default function Desk({ loaderData, actionData }: Route.ComponentProps) {
  const own = loaderData.guides.filter((g) => !g.builtIn);
  const builtIn = loaderData.guides.filter((g) => g.builtIn && g.kind === "guide");
  const builtInCards = loaderData.guides.filter((g) => g.builtIn && g.kind === "card");
  const row = (g: (typeof loaderData.guides)[number]) => (
    <li key={g.id} className="rounded-md border-2 border-rule bg-paper p-3">
      <Link to={`/desk/${g.id}`} className="text-lg font-bold">
        {g.title}
      </Link>
      {g.kind === "card" ? <span className="ml-2 rounded bg-ink px-2 py-0.5 text-sm font-bold text-white">Rig card</span> : null}
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
      {actionData?.error ? <ErrorList error={actionData.error} problems={actionData.problems} /> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <NewGuideForm />
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
      <h2 className="mt-6 text-xl font-bold">Built-in rig cards</h2>
      <p>The routine parts of the day (pre-start, flush, loading, shut-down, service, storage), checked by the same safety rules as guides.</p>
      <ul className="mt-2 space-y-2">{builtInCards.map(row)}</ul>
    </>
  );
}

function NewGuideForm() {
  const [form, fields] = useCheckedForm(newGuideSchema, { id: "new-guide" });
  return (
    <Form method="post" {...getFormProps(form)} className="rounded-lg border-2 border-ink bg-paper p-3">
      <input type="hidden" name="intent" value="new" />
      <FormField field={fields.title} label="Write a new guide or rig card">
        <input {...getInputProps(fields.title, { type: "text" })} placeholder="e.g. Hopper gate sticks" className={inputClass} />
      </FormField>
      <fieldset className="mt-2">
        <legend className="font-bold">It is</legend>
        <label className="flex min-h-12 items-center gap-2">
          <input type="radio" name="kind" value="guide" defaultChecked className="h-6 w-6" /> a guide for a fault
        </label>
        <label className="flex min-h-12 items-center gap-2">
          <input type="radio" name="kind" value="card" className="h-6 w-6" /> a rig card for a routine part of the day
        </label>
      </fieldset>
      <button className="mt-2 min-h-12 w-full rounded-md bg-go font-bold text-white">Start a draft</button>
    </Form>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Guide desk · Tankside" }];
