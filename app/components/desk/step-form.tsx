import { Markdown } from "~/components/ui/markdown";
import { stepStamp, stepState, type StepTranslation } from "~/lib/guides/translations";
import { TranslationState } from "./translation-status";
import { FIELD_MATH_WIDGETS, STEP_KINDS, type StepKind } from "~/lib/guides/schema";
import { DAY_CHECK_KEYS, DAY_CHECKS, SERVICE_TASK_KEYS, SERVICE_TASKS, type DayCheck, type ServiceTask } from "~/lib/guides/kinds";
import { ANSWERS_BY_KIND } from "~/lib/vocabulary";
import { CHECKLIST_ITEMS, CHECKLIST_LABELS, HAZARD_NEEDS, HAZARDS, STANDARD_STOP, type ChecklistItem, type Hazard } from "~/lib/guides/safety";

export interface LooseStep {
  type?: "final";
  on?: Record<string, string>;
  meta: {
    kind: StepKind;
    prompt: string;
    help?: string;
    handsOn?: boolean;
    energizes?: boolean;
    returnsToService?: boolean;
    checklist?: ChecklistItem[];
    hazards?: Hazard[];
    minutes?: number;
    fieldMath?: string;
    cause?: string;
    component?: string;
    dayCheck?: DayCheck;
    service?: ServiceTask;
    opensGuide?: string;
  };
}

const NEW = "__new__";
const field = "mt-1 block min-h-12 w-full rounded-md border-2 border-ink bg-paper px-2";

/** One step's fields, with a live preview of its markdown and answer targets picked from the guide's steps or made on the spot. */
export function StepForm({
  id,
  step,
  stepIds,
  causes,
  card = false,
  guides = [],
  onChange,
  onRename,
  onCreateTarget,
  translation,
  onTranslate,
}: {
  /** The step's Spanish, edited beside its English; undefined when there is none. */
  translation?: StepTranslation;
  onTranslate: (translation: StepTranslation | undefined) => void;
  id: string;
  step: LooseStep;
  stepIds: string[];
  causes: { code: string; name: string; component: string }[];
  /** A rig card's step: no cause; it may record a service, open a guide, establish a fact of the day. */
  card?: boolean;
  guides?: { slug: string; title: string }[];
  onChange: (step: LooseStep) => void;
  onRename: (to: string) => void;
  onCreateTarget: (answer: string) => void;
}) {
  const meta = step.meta;
  const set = (change: Partial<LooseStep["meta"]>) => onChange({ ...step, meta: { ...meta, ...change } });
  const setKind = (kind: StepKind) => {
    const events: readonly string[] = ANSWERS_BY_KIND[kind];
    const on = Object.fromEntries(events.map((e) => [e, step.on?.[e] ?? ""]));
    const final = events.length === 0;
    onChange({
      ...(final ? { type: "final" as const } : { on }),
      meta: { ...meta, kind, ...(kind === "fixed" ? {} : { cause: undefined, component: undefined }) },
    });
  };
  return (
    <div className="space-y-3">
      <label className="block font-bold">
        Step id
        <input
          key={id}
          defaultValue={id}
          onBlur={(e) => e.target.value.trim() && e.target.value.trim() !== id && onRename(e.target.value.trim())}
          className={field}
        />
        <span className="text-sm font-normal">Lower-case words with dashes. Renaming updates every answer that points here.</span>
      </label>
      <label className="block font-bold">
        Kind
        <select value={meta.kind} onChange={(e) => setKind(e.target.value as StepKind)} className={field}>
          {STEP_KINDS.map((k) => (
            <option key={k} value={k}>
              {card && k === "fixed" ? "complete (end)" : card && k === "handoff" ? "rig not ready (end)" : k}
            </option>
          ))}
        </select>
      </label>
      <div className="grid gap-3 lg:grid-cols-2">
        <div className="space-y-3">
          <label className="block font-bold">
            Prompt (markdown, short)
            <textarea value={meta.prompt} onChange={(e) => set({ prompt: e.target.value })} rows={3} className={`${field} py-2`} />
          </label>
          <div className="rounded-md border-2 border-dashed border-rule p-2" aria-label="Prompt preview">
            <p className="text-sm font-bold">Preview</p>
            <Markdown className="text-lg">{meta.prompt || "—"}</Markdown>
          </div>
          <label className="block font-bold">
            Help (markdown, shown behind “More about this”)
            <textarea value={meta.help ?? ""} onChange={(e) => set({ help: e.target.value || undefined })} rows={3} className={`${field} py-2`} />
          </label>
          {meta.help ? (
            <div className="rounded-md border-2 border-dashed border-rule p-2" aria-label="Help preview">
              <Markdown>{meta.help}</Markdown>
            </div>
          ) : null}
        </div>
        <SpanishText meta={meta} translation={translation} onTranslate={onTranslate} />
      </div>
      <div className="grid grid-cols-2 gap-3">
        <label className="flex min-h-12 items-center gap-2 font-bold">
          <input type="checkbox" checked={!!meta.handsOn} onChange={(e) => set({ handsOn: e.target.checked || undefined })} className="h-6 w-6 shrink-0" />
          Hands-on
        </label>
        <label className="block font-bold">
          Minutes
          <input
            inputMode="decimal"
            value={meta.minutes ?? ""}
            onChange={(e) => set({ minutes: e.target.value === "" ? undefined : Number(e.target.value) })}
            className={field}
          />
        </label>
      </div>
      {meta.kind === "safety" ? (
        <fieldset className="rounded-md border-2 border-rule p-2">
          <legend className="font-bold">What this stop isolates (the crew reads each line)</legend>
          {CHECKLIST_ITEMS.map((item) => {
            const list = meta.checklist?.length ? meta.checklist : STANDARD_STOP;
            return (
              <label key={item} className="flex min-h-12 items-center gap-2">
                <input
                  type="checkbox"
                  checked={list.includes(item)}
                  onChange={(e) => set({ checklist: e.target.checked ? [...list, item] : list.filter((i) => i !== item) })}
                  className="h-6 w-6 shrink-0"
                />
                {CHECKLIST_LABELS[item]}
              </label>
            );
          })}
        </fieldset>
      ) : (
        <div className="grid gap-1">
          <label className="flex min-h-12 items-center gap-2 font-bold">
            <input
              type="checkbox"
              checked={!!meta.energizes}
              onChange={(e) => set({ energizes: e.target.checked || undefined })}
              className="h-6 w-6 shrink-0"
            />
            Puts energy back (engine, clutch, pump or agitator run, line pressurized): ends the shut-down
          </label>
          {meta.kind === "task" && !meta.handsOn ? (
            <label className="flex min-h-12 items-center gap-2 font-bold">
              <input
                type="checkbox"
                checked={!!meta.returnsToService}
                onChange={(e) => set({ returnsToService: e.target.checked || undefined })}
                className="h-6 w-6 shrink-0"
              />
              Return to service: tips, plugs, gaskets and guards back on, everyone clear
            </label>
          ) : null}
        </div>
      )}
      {meta.handsOn ? (
        <fieldset className="rounded-md border-2 border-rule p-2">
          <legend className="font-bold">What this hands-on step opens (the stop before it must cover each)</legend>
          {HAZARDS.map((h) => (
            <label key={h} className="flex min-h-12 items-center gap-2">
              <input
                type="checkbox"
                checked={!!meta.hazards?.includes(h)}
                onChange={(e) => {
                  const next = e.target.checked ? [...(meta.hazards ?? []), h] : (meta.hazards ?? []).filter((x) => x !== h);
                  set({ hazards: next.length ? next : undefined });
                }}
                className="h-6 w-6 shrink-0"
              />
              It {HAZARD_NEEDS[h].words}
            </label>
          ))}
        </fieldset>
      ) : null}
      <label className="block font-bold">
        Field-math widget
        <select value={meta.fieldMath ?? ""} onChange={(e) => set({ fieldMath: e.target.value || undefined })} className={field}>
          <option value="">None</option>
          {FIELD_MATH_WIDGETS.map((c) => (
            <option key={c}>{c}</option>
          ))}
        </select>
      </label>
      {card && (meta.kind === "check" || meta.kind === "task") ? (
        <Choice
          label="Done (or yes) records the service"
          value={meta.service}
          options={SERVICE_TASK_KEYS.map((t) => [t, SERVICE_TASKS[t]])}
          onChange={(service) => set({ service })}
        />
      ) : null}
      {card && meta.kind === "task" ? (
        <Choice
          label="Opens a guide on the spot (its Done then means “sorted, carry on”)"
          value={meta.opensGuide}
          options={guides.map((g) => [g.slug, g.title])}
          onChange={(opensGuide) => set({ opensGuide })}
        />
      ) : null}
      {(card && (meta.kind === "check" || meta.kind === "task")) || (!card && meta.kind === "check") ? (
        <Choice
          label={card ? "Tells the guides today that (yes or done: so)" : "Shows today's card answer for"}
          value={meta.dayCheck}
          options={DAY_CHECK_KEYS.map((k) => [k, DAY_CHECKS[k]])}
          onChange={(dayCheck) => set({ dayCheck })}
        />
      ) : null}
      {meta.kind === "fixed" && !card ? (
        <label className="block font-bold">
          Cause
          <select
            value={meta.cause ?? ""}
            onChange={(e) => {
              const c = causes.find((x) => x.code === e.target.value);
              set({ cause: e.target.value || undefined, component: c?.component });
            }}
            className={field}
          >
            <option value="">Choose a cause…</option>
            {causes.map((c) => (
              <option key={c.code} value={c.code}>
                {c.name}
              </option>
            ))}
          </select>
        </label>
      ) : null}
      {(ANSWERS_BY_KIND[meta.kind] as readonly string[]).map((answer) => (
        <label key={answer} className="block font-bold">
          On {answer} go to
          <select
            value={step.on?.[answer] ?? ""}
            onChange={(e) => (e.target.value === NEW ? onCreateTarget(answer) : onChange({ ...step, on: { ...step.on, [answer]: e.target.value } }))}
            className={field}
          >
            <option value="">Choose a step…</option>
            {stepIds
              .filter((s) => s !== id)
              .map((s) => (
                <option key={s}>{s}</option>
              ))}
            <option value={NEW}>+ A new step</option>
          </select>
        </label>
      ))}
    </div>
  );
}

/** A choice that may be left at "None". */
function Choice<T extends string>({
  label,
  value,
  options,
  onChange,
}: {
  label: string;
  value?: T;
  options: [T, string][];
  onChange: (value: T | undefined) => void;
}) {
  return (
    <label className="block font-bold">
      {label}
      <select value={value ?? ""} onChange={(e) => onChange((e.target.value || undefined) as T | undefined)} className={field}>
        <option value="">None</option>
        {options.map(([v, text]) => (
          <option key={v} value={v}>
            {text}
          </option>
        ))}
      </select>
    </label>
  );
}

/** The step's Spanish beside its English: editing stamps it with the English it now matches. */
function SpanishText({
  meta,
  translation,
  onTranslate,
}: {
  meta: LooseStep["meta"];
  translation?: StepTranslation;
  onTranslate: (translation: StepTranslation | undefined) => void;
}) {
  const set = (change: Partial<StepTranslation>) => {
    const next = { prompt: translation?.prompt ?? "", ...(translation?.help ? { help: translation.help } : {}), ...change, from: stepStamp(meta) };
    if (!next.help) delete next.help;
    onTranslate(next.prompt || next.help ? next : undefined);
  };
  return (
    <div lang="es" className="space-y-3 rounded-md border-2 border-rule p-2" aria-label="Spanish">
      <p lang="en" className="font-bold">
        Spanish
      </p>
      <TranslationState
        id="es-step-state"
        state={stepState(meta, translation)}
        onStillRight={() => set({})}
        reason={translation?.prompt.trim() && meta.help?.trim() && !translation.help?.trim() ? "the English has help text and the Spanish has none" : undefined}
      />
      <label className="block font-bold">
        <span lang="en">Prompt in Spanish</span>
        <textarea value={translation?.prompt ?? ""} onChange={(e) => set({ prompt: e.target.value })} rows={3} className={`${field} py-2`} />
      </label>
      {translation?.prompt ? (
        <div className="rounded-md border-2 border-dashed border-rule p-2" aria-label="Spanish prompt preview">
          <Markdown className="text-lg">{translation.prompt}</Markdown>
        </div>
      ) : null}
      <label className="block font-bold">
        <span lang="en">Help in Spanish{meta.help ? "" : " (the English has none)"}</span>
        <textarea value={translation?.help ?? ""} onChange={(e) => set({ help: e.target.value || undefined })} rows={3} className={`${field} py-2`} />
      </label>
    </div>
  );
}
