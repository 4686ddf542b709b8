import { spanishLine } from "~/components/desk/translation-status";
import { Form, Link, redirect } from "react-router";
import { FormField, inputClass } from "~/components/forms/form-field";
import { useCheckedForm } from "~/components/forms/use-checked-form";
import { getFormProps, getInputProps } from "@conform-to/react";
import { versionActionSchema } from "~/lib/guides/desk-forms";
import { parseForm } from "~/lib/forms/parse";
import { PageTitle } from "~/components/ui/page-title";
import { ErrorList } from "~/components/ui/error-list";
import { fmt } from "~/lib/field-math/units";
import { deskGuideVersions, learnFromCases, openDraft, reviewVersion, submitDraft } from "~/services/desk.server";
import { answerRefusal, fail, refusedForm, requirePermission, unlessRefused } from "~/services/guards.server";
import { ADVISOR_MIN_CASES } from "~/lib/stats/check-order";
import { ANSWERS, answerLabel, statusLabel, type Answer } from "~/lib/vocabulary";
import { useTimes } from "~/components/use-time-zone";
import { readForm } from "~/services/read-request.server";
import { can } from "~/lib/permissions";
import type { Route } from "./+types/desk.$guideId";

const guideIdOf = (params: { guideId: string }) => {
  const id = Number(params.guideId);
  if (!Number.isInteger(id) || id < 1) fail(404, "That guide was not found.");
  return id;
};

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  const { guide, versions } = await deskGuideVersions(user, guideIdOf(params));
  return {
    guide,
    versions,
    canPublish: can(user, "publish-guides"),
    learning: await learnFromCases(user, guide.id),
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "edit-guides");
  const guideId = guideIdOf(params);
  const submission = parseForm(await readForm(request), versionActionSchema);
  if (submission.status !== "success") return refusedForm(submission);
  const a = submission.value;
  if (a.intent === "edit") {
    const draft = await openDraft(user, guideId);
    return redirect(`/desk/${draft.guideId}/v/${draft.number}`);
  }
  if (a.intent === "submit") {
    const r = await unlessRefused(() => submitDraft(user, guideId, a.number, a.changeNote));
    if (r) return answerRefusal(r);
    return { done: `Version ${a.number} sent for review.` };
  }
  await requirePermission({ request, context }, "publish-guides");
  const r = await unlessRefused(() => reviewVersion(user, guideId, a.number, a.intent === "approve" ? "approve" : "return", a.comment ?? null));
  if (r) return answerRefusal(r);
  return { done: a.intent === "approve" ? `Version ${a.number} published: new cases use it.` : `Version ${a.number} sent back to draft.` };
}

export default function DeskGuide({ loaderData, actionData }: Route.ComponentProps) {
  const times = useTimes();
  const { guide, versions, canPublish, learning } = loaderData;
  const draft = guide.builtIn ? undefined : versions.find((v) => v.status === "draft");
  return (
    <>
      <PageTitle
        lead={
          guide.builtIn
            ? `Built-in ${guide.kind === "card" ? "rig card" : "guide"}: editing makes your company's own copy; the built-in stays as it is.`
            : `Your company's ${guide.kind === "card" ? "rig card" : "guide"}.`
        }
      >
        {guide.title}
      </PageTitle>
      {actionData && "error" in actionData ? (
        <ErrorList error={actionData.error} problems={actionData.problems}>
          {actionData.problems.length && draft ? (
            <p className="mt-2">
              <Link to={`v/${draft.number}`} className="font-bold">
                Open version {draft.number} in the editor to fix them
              </Link>
            </p>
          ) : null}
        </ErrorList>
      ) : null}
      {actionData && "done" in actionData ? (
        <p role="status" className="mb-3 font-bold text-go">
          {actionData.done}
        </p>
      ) : null}
      <Form method="post">
        <button name="intent" value="edit" className="min-h-14 rounded-md bg-go px-5 text-lg font-bold text-white">
          {guide.builtIn ? "Edit as your company's copy" : versions.some((v) => v.status === "draft") ? "Open the draft" : "Start a new draft"}
        </button>
      </Form>

      <h2 className="mt-6 text-xl font-bold">Versions</h2>
      <ul className="mt-2 space-y-3">
        {versions.map((v, i) => (
          <li key={v.number} className="rounded-lg border-2 border-ink bg-paper p-3">
            <p className="font-bold">
              Version {v.number}: {statusLabel(v.status)} <span className="font-normal">· {times.dateTime(v.updatedAt)}</span>
            </p>
            {v.changeNote ? <p>Change: {v.changeNote}</p> : null}
            <p data-testid={`spanish-v${v.number}`}>{spanishLine(v.spanish)}</p>
            {v.reviewComment ? <p>Review: {v.reviewComment}</p> : null}
            <p className="mt-1 flex flex-wrap gap-x-4">
              <Link to={`v/${v.number}`}>{v.status === "draft" && !guide.builtIn ? "Edit" : "View"}</Link>
              <Link to={`v/${v.number}/preview`}>Preview as crew</Link>
              <a href={`/desk/${guide.id}/v/${v.number}/export`} download>
                Export JSON
              </a>
              <a href={`/guides/${guide.slug}/print?g=${guide.id}&v=${v.number}&lang=en`}>Print (English)</a>
              <a href={`/guides/${guide.slug}/print?g=${guide.id}&v=${v.number}&lang=es`}>Print (Spanish)</a>
              <Link to={`v/${v.number}/preview?lang=es`}>Preview in Spanish</Link>
              {versions[i + 1] ? <Link to={`diff?a=${versions[i + 1].number}&b=${v.number}`}>What changed from v{versions[i + 1].number}</Link> : null}
            </p>
            {v.status === "draft" && !guide.builtIn ? <SubmitVersionForm number={v.number} /> : null}
            {v.status === "in_review" && canPublish ? <ReviewVersionForm number={v.number} /> : null}
            {v.status === "in_review" && !canPublish ? <p className="mt-1">Waiting for a supervisor to review.</p> : null}
          </li>
        ))}
      </ul>

      {learning ? (
        <>
          <h2 className="mt-6 text-xl font-bold">
            How crews went through version {learning.version} ({learning.cases} cases)
          </h2>
          <p className="text-sm sm:hidden">The table scrolls sideways for answers, stops and times.</p>
          <div
            className="mt-2 overflow-x-auto rounded-lg border-2 border-ink bg-paper"
            tabIndex={0}
            role="region"
            aria-label="How crews went through this version"
          >
            <table className="w-full min-w-[36rem] text-left">
              <thead>
                <tr className="border-b-2 border-ink">
                  <th scope="col" className="p-2">
                    Step
                  </th>
                  <th scope="col" className="p-2">
                    Reached
                  </th>
                  <th scope="col" className="p-2">
                    Answers
                  </th>
                  <th scope="col" className="p-2">
                    Stopped here
                  </th>
                  <th scope="col" className="p-2">
                    Median time
                  </th>
                </tr>
              </thead>
              <tbody>
                {learning.flow.map((f) => (
                  <tr key={f.stepId} className="border-b border-rule">
                    <td className="p-2">{learning.prompts[f.stepId] ?? f.stepId}</td>
                    <td className="p-2">{f.reached}</td>
                    <td className="p-2">
                      {Object.entries(f.answers)
                        .sort(([a], [b]) => ANSWERS.indexOf(a as Answer) - ANSWERS.indexOf(b as Answer))
                        .map(([a, n]) => `${answerLabel(a)} ${n}`)
                        .join(", ") || "—"}
                    </td>
                    <td className="p-2">
                      {f.abandonedHere ? `${f.abandonedHere} abandoned` : ""}
                      {f.endedHere ? `${f.endedHere} ended` : ""}
                    </td>
                    <td className="p-2">{f.medianSeconds === null ? "—" : `${fmt(f.medianSeconds / 60, 1)} min`}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {/* A card has no causes to find: its items go in the routine's own order. */}
          {guide.kind === "card" ? null : <h2 className="mt-6 text-xl font-bold">Check-order advisor</h2>}
          {guide.kind === "card" ? null : learning.advisor.foundCases < ADVISOR_MIN_CASES ? (
            <p>
              The advisor needs at least {ADVISOR_MIN_CASES} past cases on this version whose cause was found before it suggests an order; it has{" "}
              {learning.advisor.foundCases}. With fewer, one or two unusual cases would decide the order rather than the pattern of faults.
            </p>
          ) : (
            <>
              <p>
                From {learning.advisor.foundCases} past causes and each check's minutes, checking in this order would find the fault in about{" "}
                <strong>{fmt(learning.advisor.suggestedMinutes, 1)} min</strong> on average, against{" "}
                <strong>{fmt(learning.advisor.currentMinutes, 1)} min</strong> in the guide's order now (highest chance per minute first). A safety stop moves
                with the check it guards.
              </p>
              <ol className="mt-2 list-decimal space-y-1 pl-6">
                {learning.advisor.suggested.map((c) => (
                  <li key={c.id}>
                    <strong>“{learning.prompts[c.id] ?? c.id}”</strong>
                    {c.guard ? ` (after its stop “${learning.prompts[c.guard] ?? c.guard}”)` : ""} — {c.probability} cases, {fmt(c.minutes, 1)} min
                  </li>
                ))}
              </ol>
            </>
          )}
        </>
      ) : null}
    </>
  );
}

function SubmitVersionForm({ number }: { number: number }) {
  const [form, fields] = useCheckedForm(versionActionSchema, { id: `submit-v${number}` });
  return (
    <Form method="post" {...getFormProps(form)} className="mt-2">
      <input type="hidden" name="number" value={number} />
      <FormField field={fields.changeNote} label="Change note for the reviewer">
        <input {...getInputProps(fields.changeNote, { type: "text" })} className={inputClass} />
      </FormField>
      <button name="intent" value="submit" className="mt-2 min-h-12 rounded-md border-2 border-ink bg-paper px-4 font-bold">
        Send for review
      </button>
    </Form>
  );
}

function ReviewVersionForm({ number }: { number: number }) {
  const [form, fields] = useCheckedForm(versionActionSchema, { id: `review-v${number}` });
  return (
    <Form method="post" {...getFormProps(form)} className="mt-2">
      <input type="hidden" name="number" value={number} />
      <FormField field={fields.comment} label="Comment" hint="Needed when you send it back: say what needs changing.">
        <input {...getInputProps(fields.comment, { type: "text" })} className={inputClass} />
      </FormField>
      <div className="mt-2 flex flex-wrap gap-2">
        <button name="intent" value="approve" className="min-h-12 rounded-md bg-go px-4 font-bold text-white">
          Approve and publish
        </button>
        <button name="intent" value="return" className="min-h-12 rounded-md border-2 border-ink bg-paper px-4 font-bold">
          Send back to draft
        </button>
      </div>
    </Form>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.guide.title ?? "Guide"} · Guide desk · Tankside` }];
