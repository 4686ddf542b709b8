import { useEffect, useState } from "react";
import { FormField, inputClass } from "~/components/forms/form-field";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { getFormProps, getInputProps } from "@conform-to/react";
import { submitDraftSchema } from "~/lib/guides/desk-forms";
import { parseForm } from "~/lib/forms/parse";
import { Form, Link, redirect } from "react-router";
import { GuideEditor, type Draft } from "~/components/desk/guide-editor";
import { ProblemsPanel } from "~/components/desk/problems-panel";
import { TreeDrawing } from "~/components/desk/tree-drawing";
import { TranslationPanel } from "~/components/desk/translation-status";
import { PageTitle } from "~/components/ui/page-title";
import { ErrorList } from "~/components/ui/error-list";
import { definitionChecks, openableGuides, submitDraft, versionFor } from "~/services/desk.server";
import { deskParams } from "~/services/desk-params.server";
import { answerRefusal, refusedForm, requirePermission, unlessRefused } from "~/services/guards.server";
import { readForm } from "~/services/read-request.server";
import { causeList } from "~/services/guides.server";
import type { Route } from "./+types/desk.$guideId.v.$number";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  const { guideId, number } = deskParams(params);
  const v = await versionFor(user, guideId, number);
  return {
    ...v,
    editable: v.version.status === "draft" && !v.guide.builtIn,
    causes: causeList(),
    guides: await openableGuides(user),
    ...(await definitionChecks(user, v.version.definition)),
  };
}

/** Sending the draft for review from the editor: problems keep the trainer here, listed. */
export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  const { guideId, number } = deskParams(params);
  const submission = parseForm(await readForm(request), submitDraftSchema);
  if (submission.status !== "success") return refusedForm(submission);
  const r = await unlessRefused(() => submitDraft(user, guideId, number, submission.value.changeNote));
  if (r) return answerRefusal(r);
  return redirect(`/desk/${guideId}`);
}

export default function EditVersion({ loaderData, actionData }: Route.ComponentProps) {
  const { guide, version, editable, causes, problems } = loaderData;
  return (
    <>
      <PageTitle lead={`Version ${version.number} · ${version.status.replace("_", " ")}${version.author ? ` · by ${version.author}` : ""}`}>
        {guide.title}
      </PageTitle>
      <p className="mb-3 flex flex-wrap gap-x-4">
        <Link to={`/desk/${guide.id}`}>Versions and review</Link>
        <Link to="preview">Preview as crew</Link>
        <Link to="preview?lang=es">Preview in Spanish</Link>
        <a href={`/desk/${guide.id}/v/${version.number}/export`} download>
          Export JSON
        </a>
        <a href={`/guides/${guide.slug}/print?g=${guide.id}&v=${version.number}&lang=en`}>Print (English)</a>
        <a href={`/guides/${guide.slug}/print?g=${guide.id}&v=${version.number}&lang=es`}>Print (Spanish)</a>
      </p>
      {version.reviewComment && version.status === "draft" ? (
        <p className="mb-3 rounded-md border-2 border-ink bg-caution p-3 font-bold">Reviewer: {version.reviewComment}</p>
      ) : null}
      {editable ? (
        <>
          <GuideEditor
            initial={version.definition as unknown as Draft}
            causes={causes}
            guides={loaderData.guides}
            saveUrl={`/api/desk/${guide.id}/v/${version.number}`}
            footer={({ dirty, edits }) => <SendForReview dirty={dirty} edits={edits} result={actionData} />}
          />
        </>
      ) : (
        <div className="space-y-3">
          <p>This version is {version.status.replace("_", " ")} and is never changed. Open a draft from the versions page to change the guide.</p>
          <ProblemsPanel problems={problems} warnings={loaderData.warnings} onSelect={() => {}} />
          <TranslationPanel definition={version.definition} />
          <TreeDrawing states={version.definition.states} selected={null} onSelect={() => {}} />
        </div>
      )}
    </>
  );
}

/**
 * Sending the saved draft for review. With unsaved changes it waits (the saved draft is what the
 * reviewer gets); problems the server listed are shown until the draft is edited again.
 */
function SendForReview({ dirty, edits, result }: { dirty: boolean; edits: number; result?: { error: string; problems: string[] } }) {
  const [editsAtResult, setEditsAtResult] = useState(edits);
  useEffect(() => setEditsAtResult(edits), [result]); // eslint-disable-line react-hooks/exhaustive-deps -- only when a new answer arrives
  const showResult = result && editsAtResult === edits;
  const [form, fields] = useCheckedForm(submitDraftSchema, { id: "send-for-review" });
  return (
    <Form method="post" {...getFormProps(form)} className="mt-6 space-y-2 rounded-lg border-2 border-ink bg-paper p-3">
      <h2 className="text-xl font-bold">Send for review</h2>
      {dirty ? (
        <p className="font-bold text-stop">Save the draft first: the saved draft is what goes to the reviewer.</p>
      ) : (
        <p>The saved draft goes to a supervisor, who publishes it or sends it back with a comment.</p>
      )}
      {showResult ? <ErrorList error={result.error} problems={result.problems} /> : null}
      <FormField field={fields.changeNote} label="Change note for the reviewer">
        <input {...getInputProps(fields.changeNote, { type: "text" })} className={inputClass} />
      </FormField>
      <button name="intent" value="submit" disabled={dirty} className="min-h-12 rounded-md border-2 border-ink bg-paper px-4 font-bold disabled:opacity-60">
        Send for review
      </button>
    </Form>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `Edit ${data?.guide.title ?? "guide"} · Tankside` }];
