import { translationReport, type GuideTranslation, type TranslationState } from "~/lib/guides/translations";

type Summary = { head: TranslationState; missing: number; stale: number; steps: number } | null;

const HEAD: Record<TranslationState, string> = {
  current: "",
  missing: "title, summary or symptoms missing (crews reading Spanish see the English title and cannot search in Spanish)",
  stale: "title, summary or symptoms older than the English (crews still see the Spanish; check it)",
};

/** One line on what a version's Spanish lacks (the desk's versions list). */
export function spanishLine(s: Summary): string {
  if (!s) return "Spanish: not readable";
  if (s.head === "current" && !s.missing && !s.stale) return "Spanish: complete and up to date";
  const parts = [
    HEAD[s.head],
    s.missing ? `${s.missing} of ${s.steps} steps missing` : "",
    s.stale ? `${s.stale} out of date (English changed after the Spanish was written)` : "",
  ].filter(Boolean);
  return `Spanish: ${parts.join("; ")}.${s.missing || s.stale ? " Crews reading Spanish see those steps in English, marked." : ""}`;
}

interface Translatable {
  title: string;
  summary: string;
  symptoms: string[];
  states: Record<string, { meta: { prompt: string; help?: string } }>;
  translations?: { es?: GuideTranslation };
}

/** A version's Spanish, step by step: what is missing or out of date, with the English to translate. */
export function TranslationPanel({ definition, onSelect }: { definition: Translatable; onSelect?: (stepId: string) => void }) {
  const report = translationReport(definition, "es");
  const todo = [...report.missing.map((id) => [id, "missing"] as const), ...report.stale.map((id) => [id, "out of date"] as const)];
  return (
    <section aria-labelledby="spanish-h" className="mb-4 rounded-lg border-2 border-ink bg-paper p-3" data-testid="spanish-status">
      <h2 id="spanish-h" className="text-xl font-bold">
        Spanish text
      </h2>
      <p className="mt-1">
        {spanishLine({ head: report.head, missing: report.missing.length, stale: report.stale.length, steps: Object.keys(report.steps).length })}
      </p>
      {todo.length ? (
        <ul className="mt-2 space-y-1">
          {todo.map(([id, state]) => (
            <li key={id}>
              {onSelect ? (
                <button type="button" onClick={() => onSelect(id)} className="min-h-11 text-left font-bold underline">
                  {id}
                </button>
              ) : (
                <strong>{id}</strong>
              )}{" "}
              ({state}): <span lang="en">{definition.states[id].meta.prompt}</span>
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}

/** Where a piece of Spanish stands, and a way to say it still matches English that changed. */
export function TranslationState({
  id,
  state,
  onStillRight,
  head = false,
  reason,
}: {
  id: string;
  state: "current" | "stale" | "missing";
  onStillRight: () => void;
  /** The title block: out of date, crews still read its Spanish (steps fall back to English). */
  head?: boolean;
  /** Why it counts as missing, when that is not plain (a help text the Spanish lacks). */
  reason?: string;
}) {
  const text =
    state === "current"
      ? "Spanish up to date."
      : state === "missing"
        ? `Spanish missing${reason ? `: ${reason}` : ""}. Crews reading Spanish see the English.`
        : head
          ? "Out of date: the English changed after the Spanish was written. Crews still see this Spanish: check it."
          : "Out of date: the English changed after the Spanish was written. Crews see the English until it is checked.";
  return (
    <p id={id} lang="en" className={`font-bold ${state === "current" ? "text-go" : "text-stop"}`}>
      {text}{" "}
      {state === "stale" ? (
        <button type="button" onClick={onStillRight} className="ml-1 min-h-11 rounded-md border-2 border-ink bg-paper px-2 font-bold text-ink">
          The Spanish still says the same
        </button>
      ) : null}
    </p>
  );
}
