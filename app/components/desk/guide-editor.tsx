import { useEffect, useMemo, useState } from "react";
import { useBlocker } from "react-router";
import { type Cause } from "~/lib/guides/causes";
import { validateGuide } from "~/lib/guides/validate";
import { headStamp, headState, stepState, type GuideTranslation } from "~/lib/guides/translations";
import { ProblemsPanel } from "./problems-panel";
import { TranslationPanel, TranslationState } from "./translation-status";
import { StepForm, type LooseStep } from "./step-form";
import { TreeDrawing } from "./tree-drawing";

export interface Draft {
  kind?: "guide" | "card";
  id: string;
  title: string;
  summary: string;
  symptoms: string[];
  initial: string;
  states: Record<string, LooseStep>;
  /** The guide's text in Spanish, edited beside the English (lib/guides/translations). */
  translations?: { es?: GuideTranslation };
}

const field = "mt-1 block min-h-12 w-full rounded-md border-2 border-ink bg-paper px-2";

function uniqueId(states: Record<string, unknown>, base: string) {
  let id = base;
  for (let n = 2; id in states; n++) id = `${base}-${n}`;
  return id;
}

/** Edit a draft: guide fields, steps, answers; the validator runs on every change. Saving sends the whole draft. */
export function GuideEditor({
  initial,
  causes,
  guides,
  saveUrl,
  footer,
}: {
  initial: Draft;
  causes: Cause[];
  /** The fault guides a card item may open. */
  guides: { slug: string; title: string }[];
  saveUrl: string;
  /** What goes under the editor (sending for review), told whether there are unsaved changes and how many edits so far. */
  footer?: (state: { dirty: boolean; edits: number }) => React.ReactNode;
}) {
  const [draft, setDraft] = useState<Draft>(initial);
  const [edits, setEdits] = useState(0);
  const [selected, select] = useState<string | null>(initial.initial in initial.states ? initial.initial : null);
  // On a phone the step's form sits below the list: bring it into view when a step is picked.
  const setSelected = (id: string | null) => {
    select(id);
    if (id && window.innerWidth < 768) requestAnimationFrame(() => document.getElementById("selected-step")?.scrollIntoView({ block: "start" }));
  };
  const [saved, setSaved] = useState<"saved" | "unsaved" | "saving" | "failed">("saved");
  const { problems, warnings } = useMemo(() => validateGuide(draft, { causes, guideIds: guides.map((g) => g.slug) }), [draft, causes, guides]);
  useWarnBeforeLeaving(saved !== "saved");
  const ids = Object.keys(draft.states);

  const change = (next: Draft) => {
    setDraft(next);
    setEdits((n) => n + 1);
    setSaved("unsaved");
  };
  const setStep = (id: string, step: LooseStep) => change({ ...draft, states: { ...draft.states, [id]: step } });
  const es: GuideTranslation = draft.translations?.es ?? {};
  const withEs = (base: Draft, next: GuideTranslation): Draft => ({ ...base, translations: { ...base.translations, es: next } });
  /** Spanish steps follow their step's renames and removals, so none points at a step that is gone. */
  const esSteps = (base: Draft, edit: (steps: NonNullable<GuideTranslation["steps"]>) => void): Draft => {
    const steps = { ...(base.translations?.es?.steps ?? {}) };
    edit(steps);
    return withEs(base, { ...(base.translations?.es ?? {}), steps });
  };
  // Editing the Spanish title block stamps it with the English it now matches.
  const setEsHead = (change_: Partial<GuideTranslation>) => change(withEs(draft, { ...es, ...change_, from: headStamp(draft) }));
  const esHead = headState(draft, es);
  const addStep = (kind: LooseStep["meta"]["kind"] = "check") => {
    const id = uniqueId(draft.states, `new-${kind}`);
    const on: Record<string, string> | undefined =
      kind === "check" ? { YES: "", NO: "" } : kind === "task" ? { DONE: "", CANT: "" } : kind === "safety" ? { ACK: "" } : undefined;
    change({ ...draft, states: { ...draft.states, [id]: { ...(on ? { on } : { type: "final" as const }), meta: { kind, prompt: "" } } } });
    setSelected(id);
    return id;
  };
  const removeStep = (id: string) => {
    const states = Object.fromEntries(
      Object.entries(draft.states)
        .filter(([k]) => k !== id)
        .map(([k, s]) => [k, s.on ? { ...s, on: Object.fromEntries(Object.entries(s.on).map(([a, t]) => [a, t === id ? "" : t])) } : s]),
    );
    change(esSteps({ ...draft, states }, (steps) => delete steps[id]));
    setSelected(null);
  };
  const rename = (from: string, to: string) => {
    if (to in draft.states) return;
    const states = Object.fromEntries(
      Object.entries(draft.states).map(([k, s]) => [
        k === from ? to : k,
        s.on ? { ...s, on: Object.fromEntries(Object.entries(s.on).map(([a, t]) => [a, t === from ? to : t])) } : s,
      ]),
    );
    change(
      esSteps({ ...draft, initial: draft.initial === from ? to : draft.initial, states }, (steps) => {
        if (steps[from]) steps[to] = steps[from];
        delete steps[from];
      }),
    );
    setSelected(to);
  };
  const move = (id: string, by: number) => {
    const keys = Object.keys(draft.states);
    const i = keys.indexOf(id);
    const j = i + by;
    if (j < 0 || j >= keys.length) return;
    [keys[i], keys[j]] = [keys[j], keys[i]];
    change({ ...draft, states: Object.fromEntries(keys.map((k) => [k, draft.states[k]])) });
  };
  const save = async () => {
    setSaved("saving");
    try {
      const res = await fetch(saveUrl, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify({ definition: draft }) });
      setSaved(res.ok ? "saved" : "failed");
    } catch {
      setSaved("failed");
    }
  };

  return (
    <div className="space-y-4">
      <div className="sticky top-0 z-10 flex flex-wrap items-center gap-3 border-b-2 border-ink bg-field py-2">
        <button type="button" onClick={save} disabled={saved === "saving"} className="min-h-12 rounded-md bg-go px-4 font-bold text-white">
          Save draft
        </button>
        <span role="status" className="font-bold">
          {saved === "saved" ? "All changes saved." : saved === "saving" ? "Saving…" : saved === "failed" ? "Not saved: try again." : "Unsaved changes."}
        </span>
      </div>
      <ProblemsPanel problems={problems} warnings={warnings} onSelect={setSelected} />
      <TranslationPanel definition={draft} onSelect={setSelected} />
      <div className="grid gap-4 lg:grid-cols-2">
        <fieldset className="space-y-3 rounded-lg border-2 border-ink bg-paper p-3">
          <legend className="px-1 font-bold">{draft.kind === "card" ? "Rig card" : "Guide"} (English)</legend>
          <label className="block font-bold">
            Title
            <input value={draft.title} onChange={(e) => change({ ...draft, title: e.target.value })} className={field} />
          </label>
          <label className="block font-bold">
            Summary
            <textarea value={draft.summary} onChange={(e) => change({ ...draft, summary: e.target.value })} rows={2} className={`${field} py-2`} />
          </label>
          <label className="block font-bold">
            {draft.kind === "card" ? "Words a crew member would use for it (one per line)" : "Symptom phrases (one per line, as a crew member would say them)"}
            <textarea
              value={draft.symptoms.join("\n")}
              onChange={(e) => change({ ...draft, symptoms: e.target.value.split("\n") })}
              onBlur={() => change({ ...draft, symptoms: draft.symptoms.map((s) => s.trim()).filter(Boolean) })}
              rows={4}
              className={`${field} py-2`}
            />
          </label>
          <label className="block font-bold">
            First step
            <select value={draft.initial} onChange={(e) => change({ ...draft, initial: e.target.value })} className={field}>
              {ids.map((id) => (
                <option key={id}>{id}</option>
              ))}
            </select>
          </label>
        </fieldset>
        <fieldset lang="es" className="space-y-3 rounded-lg border-2 border-ink bg-paper p-3" aria-describedby="es-head-state">
          <legend className="px-1 font-bold" lang="en">
            Spanish
          </legend>
          <TranslationState id="es-head-state" state={esHead} onStillRight={() => setEsHead({})} head />
          <label className="block font-bold">
            <span lang="en">Title in Spanish</span>
            <input value={es.title ?? ""} onChange={(e) => setEsHead({ title: e.target.value })} className={field} />
          </label>
          <label className="block font-bold">
            <span lang="en">Summary in Spanish</span>
            <textarea value={es.summary ?? ""} onChange={(e) => setEsHead({ summary: e.target.value })} rows={2} className={`${field} py-2`} />
          </label>
          <label className="block font-bold">
            <span lang="en">Symptom phrases in Spanish (one per line; add the words crews use)</span>
            <textarea
              value={(es.symptoms ?? []).join("\n")}
              onChange={(e) => setEsHead({ symptoms: e.target.value.split("\n") })}
              onBlur={() => es.symptoms && setEsHead({ symptoms: es.symptoms.map((s) => s.trim()).filter(Boolean) })}
              rows={4}
              className={`${field} py-2`}
            />
          </label>
        </fieldset>
      </div>
      <TreeDrawing states={draft.states} selected={selected} onSelect={setSelected} />
      <div className="grid gap-4 md:grid-cols-[16rem_1fr]">
        <section aria-label="Steps" className="space-y-2">
          <ul className="space-y-1">
            {ids.map((id) => (
              <li key={id} className="flex items-center gap-1">
                <button
                  type="button"
                  onClick={() => setSelected(id)}
                  aria-current={selected === id ? "true" : undefined}
                  className={`min-h-11 flex-1 truncate rounded-md border-2 px-2 text-left ${selected === id ? "border-link bg-paper font-bold" : "border-rule bg-paper"}`}
                >
                  {draft.states[id].meta.kind === "safety" ? <span className="mr-1 rounded bg-ink px-1 text-sm font-bold text-white">STOP</span> : null}
                  {stepState(draft.states[id].meta, es.steps?.[id]) !== "current" ? (
                    <span className="mr-1 rounded border border-ink px-1 text-sm" title="Spanish missing or out of date">
                      ES?
                    </span>
                  ) : null}
                  {id}
                </button>
                <button
                  type="button"
                  aria-label={`Move ${id} up`}
                  onClick={() => move(id, -1)}
                  className="min-h-11 min-w-11 rounded-md border-2 border-rule bg-paper"
                >
                  ↑
                </button>
                <button
                  type="button"
                  aria-label={`Move ${id} down`}
                  onClick={() => move(id, 1)}
                  className="min-h-11 min-w-11 rounded-md border-2 border-rule bg-paper"
                >
                  ↓
                </button>
              </li>
            ))}
          </ul>
          <div className="flex flex-wrap gap-2">
            {(["check", "task", "safety", "fixed", "handoff"] as const).map((k) => (
              <button key={k} type="button" onClick={() => addStep(k)} className="min-h-11 rounded-md border-2 border-ink bg-paper px-2 font-bold">
                + {k}
              </button>
            ))}
          </div>
        </section>
        <section id="selected-step" aria-label="Selected step" className="scroll-mt-20 rounded-lg border-2 border-ink bg-paper p-3">
          {selected && draft.states[selected] ? (
            <>
              <StepForm
                id={selected}
                step={draft.states[selected]}
                stepIds={ids}
                causes={causes}
                card={draft.kind === "card"}
                guides={guides}
                onChange={(s) => setStep(selected, s)}
                translation={es.steps?.[selected]}
                onTranslate={(tr) =>
                  change(
                    esSteps(draft, (steps) => {
                      if (tr) steps[selected] = tr;
                      else delete steps[selected];
                    }),
                  )
                }
                onRename={(to) => rename(selected, to)}
                onCreateTarget={(answer) => {
                  const kind = "check";
                  const id = uniqueId(draft.states, `new-${kind}`);
                  const from = draft.states[selected];
                  change({
                    ...draft,
                    states: {
                      ...draft.states,
                      [selected]: { ...from, on: { ...from.on, [answer]: id } },
                      [id]: { on: { YES: "", NO: "" }, meta: { kind, prompt: "" } },
                    },
                  });
                  setSelected(id);
                }}
              />
              <button type="button" onClick={() => removeStep(selected)} className="mt-4 min-h-12 rounded-md border-2 border-stop px-3 font-bold text-stop">
                Remove step “{selected}”
              </button>
            </>
          ) : (
            <p>Pick a step in the list or the drawing.</p>
          )}
        </section>
      </div>
      {footer?.({ dirty: saved !== "saved", edits })}
    </div>
  );
}

/** Asks before leaving the editor with changes not yet saved: links in the app, reloads and closing the tab. */
function useWarnBeforeLeaving(dirty: boolean) {
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (blocker.state !== "blocked") return;
    if (window.confirm("Leave the editor? Your changes to this draft are not saved.")) blocker.proceed();
    else blocker.reset();
  }, [blocker]);
  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);
}
