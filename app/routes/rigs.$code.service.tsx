import { data, Form, Link, useNavigation } from "react-router";
import { z } from "zod";
import { DoneNote } from "~/components/ui/done-note";
import { PageTitle } from "~/components/ui/page-title";
import { useTimes } from "~/components/use-time-zone";
import { fmt } from "~/lib/field-math/units";
import { parseForm } from "~/lib/forms/parse";
import { can } from "~/lib/permissions";
import { dueText, intervalWords, readingProblem, SERVICE_STATUS_LABELS, type ServiceStatus } from "~/lib/rigs/service";
import { serviceDoneSchema, serviceRuleSchema } from "~/lib/rigs/service-forms";
import { SERVICE_TASK_KEYS, SERVICE_TASKS, type ServiceTask } from "~/lib/guides/kinds";
import { rigCards } from "~/services/guides.server";
import { fail, requireCan, requireUser } from "~/services/guards.server";
import { readForm } from "~/services/read-request.server";
import { findRig } from "~/services/rigs.server";
import {
  addServiceRule,
  recordService,
  ruleOf,
  retireServiceRule,
  sameNameOnRig,
  serviceLines,
  taskTakenOnRig,
  updateServiceRule,
  type ServiceLine,
} from "~/services/service.server";
import { ConfirmAction } from "~/components/ui/confirm-action";
import type { Route } from "./+types/rigs.$code.service";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = await requireUser({ request, context });
  const rig = await findRig(user, params.code);
  return {
    rig: { code: rig.code, name: rig.name, hasHourMeter: rig.hasHourMeter, engineHours: rig.engineHours, retired: rig.retired },
    lines: await serviceLines(user, { rigId: rig.id }),
    canRecord: can(user, "record-service"),
    canEditRules: can(user, "edit-service-rules"),
    // The tasks the company's published cards record: only those can record a service.
    cardTasks: [
      ...new Set((await rigCards(user)).flatMap((c) => Object.values(c.definition.states).flatMap((st) => (st.meta.service ? [st.meta.service] : [])))),
    ],
  };
}

const ruleId = z.object({ ruleId: z.coerce.number({ error: "Pick a service from the list." }).int().positive("Pick a service from the list.") });

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = await requireUser({ request, context });
  const form = await readForm(request);
  const intent = form.get("intent");
  const rig = await findRig(user, params.code);
  if (rig.retired) fail(400, `${rig.code} is retired: its service is no longer kept.`);
  const pickRule = () => {
    const picked = ruleId.safeParse({ ruleId: form.get("ruleId") });
    if (!picked.success) fail(400, picked.error.issues[0].message);
    return picked.data.ruleId;
  };
  switch (intent) {
    case "done": {
      requireCan(user, "record-service");
      const id = pickRule();
      await ruleOf(user, rig.id, id);
      const submission = parseForm(form, serviceDoneSchema);
      if (submission.status !== "success") return data({ ruleId: id, result: submission.reply(), message: null }, { status: 400 });
      const problem = readingProblem(submission.value.engineHours, rig);
      if (problem) return data({ ruleId: id, result: submission.reply({ fieldErrors: { engineHours: [problem] } }), message: null }, { status: 400 });
      await recordService(user, rig, id, submission.value);
      const hours = rig.hasHourMeter && submission.value.engineHours !== null ? ` at ${fmt(submission.value.engineHours, 1)} engine hours` : "";
      return { ruleId: id, result: null, message: `Recorded as done now${hours}.` };
    }
    case "add-rule":
    case "edit-rule": {
      requireCan(user, "edit-service-rules");
      const id = intent === "edit-rule" ? pickRule() : null;
      const submission = parseForm(form, serviceRuleSchema);
      if (submission.status !== "success") return data({ ruleId: id ?? "new", result: submission.reply(), message: null }, { status: 400 });
      if (await sameNameOnRig(user, rig.id, submission.value.name, id ?? undefined)) {
        const taken = `${rig.code} already keeps “${submission.value.name}”. Change that one instead.`;
        return data({ ruleId: id ?? "new", result: submission.reply({ fieldErrors: { name: [taken] } }), message: null }, { status: 400 });
      }
      const taken = await taskTakenOnRig(user, rig.id, submission.value.task, id ?? undefined);
      if (taken) {
        const message = `${rig.code}'s “${taken}” is already recorded by that card task. Choose another task, or none.`;
        return data({ ruleId: id ?? "new", result: submission.reply({ fieldErrors: { task: [message] } }), message: null }, { status: 400 });
      }
      if (id === null) await addServiceRule(user, rig.id, submission.value);
      else await updateServiceRule(user, rig.id, id, submission.value);
      return { ruleId: id ?? "new", result: null, message: `Saved: ${submission.value.name}.` };
    }
    case "retire-rule": {
      requireCan(user, "edit-service-rules");
      const id = pickRule();
      if (form.get("confirmed") !== "yes") fail(400, "Confirm that this service is no longer kept.");
      await retireServiceRule(user, rig.id, id);
      return { ruleId: "new", result: null, message: "Stopped: that service is no longer kept for this rig." };
    }
    default:
      fail(400, "Say what to do: record a service done, or add, change or retire a service.");
  }
}

const TONES: Record<ServiceStatus, string> = {
  overdue: "border-stop bg-paper text-stop",
  due: "border-ink bg-caution text-ink",
  never: "border-ink bg-caution text-ink",
  soon: "border-ink bg-paper text-ink",
  ok: "border-go bg-paper text-go",
  "no-meter": "border-rule bg-paper text-ink",
};

export default function RigService({ loaderData, actionData }: Route.ComponentProps) {
  const { rig, lines, canRecord, canEditRules } = loaderData;
  const times = useTimes();
  return (
    <>
      <PageTitle
        lead={
          <>
            {rig.hasHourMeter ? `Hour meter last read ${fmt(rig.engineHours, 1)} h.` : "No hour meter: services go by the calendar."}{" "}
            <Link to={`/rigs/${rig.code}`}>Back to {rig.code}</Link>
          </>
        }
      >
        Service · {rig.code} {rig.name}
      </PageTitle>
      {lines.length === 0 ? <p className="text-lg">No routine service is set for this rig yet.{canEditRules ? " Add the first below." : ""}</p> : null}
      <ul className="space-y-3">
        {lines.map((line) => (
          <ServiceCard
            key={line.ruleId}
            cardTasks={loaderData.cardTasks}
            line={line}
            rig={rig}
            canRecord={canRecord && !rig.retired}
            canEditRules={canEditRules}
            message={actionData?.ruleId === line.ruleId ? actionData.message : null}
            errors={actionData?.ruleId === line.ruleId ? actionData.result?.error : undefined}
            when={line.last ? times.dateTime(line.last.doneAt) : null}
          />
        ))}
      </ul>
      {canEditRules && !rig.retired ? (
        <section aria-labelledby="add-service" className="mt-6 rounded-lg border-2 border-ink bg-paper p-4">
          <h2 id="add-service" className="text-xl font-bold">
            Add a service
          </h2>
          <DoneNote message={actionData?.ruleId === "new" ? actionData.message : null} />
          {/* A fresh form after each save, so a second tap cannot add the same service again. */}
          <RuleFields
            key={actionData?.ruleId === "new" && actionData.message ? actionData.message : "add"}
            intent="add-rule"
            cardTasks={loaderData.cardTasks}
            errors={actionData?.ruleId === "new" ? actionData.result?.error : undefined}
          />
        </section>
      ) : null}
    </>
  );
}

type Errors = Record<string, string[] | null> | null | undefined;
const errorOf = (errors: Errors, field: string) => errors?.[field]?.join(" ") ?? null;

function ServiceCard({
  cardTasks,
  line,
  rig,
  canRecord,
  canEditRules,
  message,
  errors,
  when,
}: {
  cardTasks: ServiceTask[];
  line: ServiceLine;
  rig: { hasHourMeter: boolean; engineHours: number };
  canRecord: boolean;
  canEditRules: boolean;
  message: string | null;
  errors: Errors;
  when: string | null;
}) {
  const busy = useNavigation().state === "submitting";
  const hoursError = errorOf(errors, "engineHours");
  return (
    <li id={`service-${line.ruleId}`} className={`scroll-mt-4 rounded-lg border-4 p-3 ${TONES[line.due.status]}`} aria-label={line.name}>
      <p className="text-xl font-bold">
        {line.name} · {SERVICE_STATUS_LABELS[line.due.status]}
      </p>
      <p className="text-ink">
        {intervalWords(line)} · {dueText(line.due)}
        {line.task ? ` · also recorded by the rig cards' “${SERVICE_TASKS[line.task]}” item` : ""}
      </p>
      <p className="text-sm text-ink">
        {line.last
          ? `Last done ${when}${line.last.engineHours !== null ? ` at ${fmt(line.last.engineHours, 1)} h` : ""}${line.last.by ? ` by ${line.last.by}` : ""}${line.last.note ? `: ${line.last.note}` : ""}`
          : "No record yet."}
      </p>
      <DoneNote message={message} />
      {canRecord ? (
        <Form method="post" className="mt-2 space-y-2 text-ink">
          <input type="hidden" name="ruleId" value={line.ruleId} />
          {rig.hasHourMeter ? (
            <label className="block font-bold">
              Hour meter now (required)
              <input
                name="engineHours"
                inputMode="decimal"
                // Left empty: the last reading offered as the answer would be saved unread with one tap.
                placeholder={`last ${fmt(rig.engineHours, 1)}`}
                aria-invalid={hoursError ? true : undefined}
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg"
              />
            </label>
          ) : null}
          {hoursError ? <p className="font-bold text-stop">{hoursError}</p> : null}
          <label className="block font-bold">
            Note (optional)
            <input name="note" maxLength={500} className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg" />
          </label>
          <button name="intent" value="done" disabled={busy} className="min-h-14 w-full rounded-lg bg-go text-lg font-bold text-white">
            Done now: record it
          </button>
        </Form>
      ) : null}
      {canEditRules ? (
        <details className="mt-2 text-ink">
          <summary className="min-h-12 cursor-pointer py-3 font-bold">Change or stop this service</summary>
          <RuleFields intent="edit-rule" line={line} errors={errors} cardTasks={cardTasks} />
          <div className="mt-2">
            <ConfirmAction
              label="Stop keeping this service"
              question={`Stop keeping “${line.name}” on this rig? It leaves the list; its records stay.`}
              confirmLabel="Yes, stop keeping it"
              intent="retire-rule"
              hidden={{ ruleId: String(line.ruleId) }}
            />
          </div>
        </details>
      ) : null}
    </li>
  );
}

function RuleFields({ intent, line, errors, cardTasks }: { intent: "add-rule" | "edit-rule"; line?: ServiceLine; errors: Errors; cardTasks: ServiceTask[] }) {
  const input = "mt-1 block min-h-14 w-full rounded-md border-2 border-ink bg-paper px-3 text-lg";
  const field = (name: string, label: string, value: string, hint?: string) => (
    <label className="block font-bold">
      {label}
      {hint ? <span className="block text-sm font-normal">{hint}</span> : null}
      <input
        name={name}
        defaultValue={value}
        inputMode={name === "name" ? undefined : "decimal"}
        className={input}
        aria-invalid={errorOf(errors, name) ? true : undefined}
      />
      {errorOf(errors, name) ? <span className="block font-bold text-stop">{errorOf(errors, name)}</span> : null}
    </label>
  );
  return (
    <Form method="post" className="mt-2 space-y-2">
      {line ? <input type="hidden" name="ruleId" value={line.ruleId} /> : null}
      {field("name", "Service", line?.name ?? "", "Like: Grease points, Lubricator refill, Hydraulic oil and filter")}
      {field("everyHours", "Every … engine hours", line?.everyHours != null ? String(line.everyHours) : "", "Blank if it goes by the calendar only.")}
      {field(
        "everyDays",
        "Every … days",
        line?.everyDays != null ? String(line.everyDays) : "",
        "Blank if it goes by engine hours only. With both, whichever comes first.",
      )}
      <label className="block font-bold">
        Also recorded by a rig card
        <span className="block text-sm font-normal">When a card item for this task is done, the service is recorded with the card's hours.</span>
        <select name="task" defaultValue={line?.task ?? ""} className={input} aria-invalid={errorOf(errors, "task") ? true : undefined}>
          <option value="">No: recorded by hand only</option>
          {SERVICE_TASK_KEYS.filter((t) => cardTasks.includes(t) || line?.task === t).map((t) => (
            <option key={t} value={t}>
              {SERVICE_TASKS[t]}
            </option>
          ))}
        </select>
        {errorOf(errors, "task") ? <span className="block font-bold text-stop">{errorOf(errors, "task")}</span> : null}
      </label>
      <button name="intent" value={intent} className="min-h-14 w-full rounded-lg border-2 border-ink bg-paper text-lg font-bold">
        {intent === "add-rule" ? "Add this service" : "Save the change"}
      </button>
    </Form>
  );
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `Service · ${data?.rig.code ?? "Rig"} · Tankside` }];
