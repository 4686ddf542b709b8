import { Link } from "react-router";
import { fillRigWords } from "~/lib/guides/rig-words";
import { CHECKLIST_LABELS, checklistOf } from "~/lib/guides/safety";
import { z } from "zod";
import { ConfirmAction } from "~/components/ui/confirm-action";
import { Markdown } from "~/components/ui/markdown";
import { PageTitle } from "~/components/ui/page-title";
import { formatDuration } from "~/lib/format";
import { answerLabel, caseOutcomeLabel, causeBasis, outcomeLabel } from "~/lib/vocabulary";
import { caseDetail } from "~/services/case-detail.server";
import { resolveHandoff } from "~/services/cases.server";
import { fail, requirePermission, requireUser } from "~/services/guards.server";
import { causeList } from "~/services/guides.server";
import { useTimes } from "~/components/use-time-zone";
import { readForm } from "~/services/read-request.server";
import { can } from "~/lib/permissions";
import type { Route } from "./+types/cases.$id";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const detail = await caseDetail(user, params.id);
  const cause = causeList().find((c) => c.code === detail.causeCode) ?? null;
  const states = detail.guide.definition.states;
  // The words the crew read: this rig's directions filled in, as on the walk.
  const words = (text: string) => fillRigWords(text, detail.rig);
  return {
    ...detail,
    canResolve: can(user, "resolve-handoffs"),
    guide: { slug: detail.guide.slug, title: detail.guide.title, version: detail.guide.version },
    cause,
    stepPrompts: Object.fromEntries(Object.entries(states).map(([id, s]) => [id, words(s.meta.prompt)])),
    finalPrompt: detail.finalStep ? words(states[detail.finalStep]?.meta.prompt ?? "") || null : null,
    // Which stop was acknowledged, when, and what it isolated (the version's own checklist).
    stops: detail.events
      .filter((e) => e.answer === "ACK" && states[e.stepId])
      .map((e) => ({ seq: e.seq, stepId: e.stepId, at: e.at, checklist: [...checklistOf(states[e.stepId].meta)] })),
    events: detail.events.map((e) => ({ ...e, prompt: words(states[e.stepId]?.meta.prompt ?? e.stepId), kind: states[e.stepId]?.meta.kind ?? "check" })),
  };
}

const resolveHandoffSchema = z.object({
  intent: z.literal("resolve-handoff", { error: "Say what to do: resolve-handoff." }),
  confirmed: z.literal("yes", { error: "Confirm marking the hand-off dealt with." }),
  note: z
    .string()
    .trim()
    .max(1000, "Keep the note under 1,000 characters.")
    .optional()
    .transform((v) => v || undefined),
});

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requirePermission({ request, context }, "resolve-handoffs");
  const form = await readForm(request);
  const parsed = resolveHandoffSchema.safeParse(Object.fromEntries(form));
  if (!parsed.success) fail(400, `Nothing changed: ${parsed.error.issues.map((i) => i.message).join(" ")}`);
  await resolveHandoff(user, params.id, parsed.data.note ?? null);
  return { ok: true };
}

const plainPrompt = (prompt: string | undefined) => prompt?.replace(/\*\*|__|`/g, "");

export default function CasePage({ loaderData: c }: Route.ComponentProps) {
  const times = useTimes();
  const states = c.stepPrompts;
  const stops = c.stops;
  const duration = c.closedAt ? formatDuration(Date.parse(c.closedAt) - Date.parse(c.openedAt)) : "still open";
  const facts: [string, React.ReactNode][] = [
    [
      "Rig",
      <Link to={`/rigs/${c.rig.code}`}>
        {c.rig.code} · {c.rig.name}
      </Link>,
    ],
    [c.kind === "card" ? "Card" : "Guide", `${c.guide.title} (version ${c.guide.version})`],
    ["Started by", c.openedBy ?? "—"],
    ["Opened", `${times.dateTime(c.openedAt)}`],
    ["Closed", c.closedAt ? `${times.dateTime(c.closedAt)}` : "—"],
    ["Time taken", duration],
    ["Outcome", caseOutcomeLabel(c.kind, c.outcome, c.cardGaps)],
    ["Job", c.rig.job ? <Link to={`/jobs/${c.rig.job.id}`}>{c.rig.job.name}</Link> : "none that day"],
    ...(c.kind === "card"
      ? []
      : ([
          [
            "Cause",
            c.cause
              ? `${c.cause.name} (${c.cause.component}) · ${causeBasis(c.outcome, c.cause.code) === "suspected" ? "suspected at hand-off" : "found"}`
              : "—",
          ],
        ] as [string, React.ReactNode][])),
    [
      "Shut-downs acknowledged",
      stops.length ? (
        <ul>
          {stops.map((s) => (
            <li key={s.seq}>
              {times.time(s.at)}, “{plainPrompt(states[s.stepId]) ?? s.stepId}”: {s.checklist.map((i) => CHECKLIST_LABELS[i].replace(/\.$/, "")).join("; ")}
            </li>
          ))}
        </ul>
      ) : (
        "no hands-on step reached"
      ),
    ],
    [c.kind === "card" ? "Engine hours at the start" : "Engine hours", c.engineHours !== null ? `${c.engineHours.toLocaleString("en-US")} h` : "—"],
    ...(c.fromCard
      ? ([["Opened from", <Link key="from" to={`/cases/${c.fromCard.caseId}`}>{`the ${c.fromCard.title} card`}</Link>]] as [string, React.ReactNode][])
      : []),
    ...(c.kind === "card"
      ? ([
          [
            "Guides opened from it",
            c.fixesOpened.length ? (
              <ul>
                {c.fixesOpened.map((f) => (
                  <li key={f.caseId}>
                    <Link to={`/cases/${f.caseId}`}>{f.title}</Link> ({outcomeLabel(f.outcome).toLowerCase()})
                  </li>
                ))}
              </ul>
            ) : (
              "none"
            ),
          ],
        ] as [string, React.ReactNode][])
      : []),
  ];
  return (
    <>
      <PageTitle lead={`${c.rig.code} · ${c.guide.title}`}>
        {c.kind === "card" ? `Card: ${caseOutcomeLabel(c.kind, c.outcome, c.cardGaps).toLowerCase()}` : `Case ${outcomeLabel(c.outcome).toLowerCase()}`}
      </PageTitle>
      {c.outcome === "open" ? (
        <Link to={`/cases/${c.id}/walk`} className="mb-4 flex min-h-14 items-center justify-center rounded-md bg-go text-lg font-bold text-white no-underline">
          Continue the walk-through
        </Link>
      ) : null}
      <dl className="grid grid-cols-1 gap-x-4 rounded-lg border-2 border-ink bg-paper p-4 sm:grid-cols-[auto_1fr] sm:gap-y-2">
        {facts.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="mt-2 font-bold sm:mt-0">{k}</dt>
            <dd>{v}</dd>
          </div>
        ))}
      </dl>
      {c.finalPrompt ? (
        <p className="mt-3 text-lg">
          <strong>Where it ended:</strong> {c.finalPrompt.replace(/\*\*/g, "")}
        </p>
      ) : null}
      {c.note ? (
        <p className="mt-2 text-lg">
          <strong>Crew note:</strong> {c.note}
        </p>
      ) : null}
      {c.outcome === "handoff" ? (
        c.handoffResolvedAt ? (
          <p className="mt-2 font-bold">
            Hand-off dealt with {times.dateTime(c.handoffResolvedAt)}
            {c.handoffResolvedBy ? ` by ${c.handoffResolvedBy}` : ""}.{c.handoffResolvedNote ? ` Note: ${c.handoffResolvedNote}` : ""}
          </p>
        ) : c.canResolve ? (
          <div className="mt-3">
            <ConfirmAction
              label="Mark this hand-off dealt with"
              question="It leaves the board's open hand-offs. This cannot be undone."
              confirmLabel="Yes, mark it dealt with"
              intent="resolve-handoff"
            >
              <label className="block font-bold">
                What was done (optional)
                <textarea name="note" rows={2} maxLength={1000} className="mt-1 block w-full rounded-md border-2 border-ink p-2 font-normal" />
              </label>
            </ConfirmAction>
          </div>
        ) : (
          <p className="mt-2 font-bold">Waiting for a supervisor.</p>
        )
      ) : null}
      <h2 className="mt-6 text-xl font-bold">Answers</h2>
      <ol className="mt-2 space-y-2">
        {c.events.map((e, i) => {
          const gap = i === 0 ? Date.parse(e.at) - Date.parse(c.openedAt) : Date.parse(e.at) - Date.parse(c.events[i - 1].at);
          return (
            <li
              key={e.id}
              className={`rounded-md p-3 ${e.kind === "safety" ? "border-2 border-ink bg-caution" : e.answer === "CANT" ? "border-4 border-stop bg-paper" : "border-2 border-rule bg-paper"}`}
            >
              <p className="text-sm">
                {e.seq}. {times.time(e.at)} · +{formatDuration(gap)}
              </p>
              <Markdown className="font-bold">{e.prompt}</Markdown>
              <p className={e.answer === "CANT" ? "font-bold text-stop" : ""}>
                → {answerLabel(e.answer)}
                {e.answer === "CANT" && c.kind === "card" ? " (not done)" : ""}
              </p>
              {e.note ? <p className="mt-1 italic">Note: {e.note}</p> : null}
            </li>
          );
        })}
        {c.events.length === 0 ? <li>No answers yet.</li> : null}
      </ol>
      <h2 className="mt-6 text-xl font-bold">Photos</h2>
      {c.photos.length ? (
        <ul className="mt-2 flex flex-wrap gap-3">
          {c.photos.map((p) => (
            <li key={p.id}>
              <a href={`/cases/${c.id}/photos/${p.id}`}>
                <img
                  src={`/cases/${c.id}/photos/${p.id}`}
                  alt={`Photo at “${plainPrompt(p.stepId ? states[p.stepId] : undefined) ?? "no step"}”, ${times.dateTime(p.takenAt)}`}
                  className="h-28 w-28 rounded border-2 border-ink object-cover"
                />
              </a>
            </li>
          ))}
        </ul>
      ) : (
        <p>No photos.</p>
      )}
    </>
  );
}

export const meta: Route.MetaFunction = () => [{ title: "Case · Tankside" }];
