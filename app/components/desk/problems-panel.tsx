import { plainProblem, type GuideProblem } from "~/lib/guides/validate";

/** Live checks: every problem, each with a way to jump to its step. */
export function ProblemsPanel({
  problems,
  warnings = [],
  onSelect,
}: {
  problems: GuideProblem[];
  warnings?: GuideProblem[];
  onSelect: (step: string) => void;
}) {
  const item = (p: GuideProblem, i: number) => (
    <li key={i}>
      {p.step ? (
        <button type="button" onClick={() => onSelect(p.step!)} className="min-h-10 text-left font-bold text-link underline">
          Step “{p.step}”
        </button>
      ) : (
        <strong>Guide</strong>
      )}
      : {plainProblem(p.message)}
    </li>
  );
  return (
    <section
      aria-labelledby="checks-h"
      aria-live="polite"
      className={`rounded-lg border-4 p-3 ${problems.length ? "border-stop bg-paper" : "border-go bg-paper"}`}
    >
      <h2 id="checks-h" className="font-bold">
        {problems.length
          ? `${problems.length} problem${problems.length === 1 ? "" : "s"}: this draft can be saved but not sent for review`
          : "Checks pass: every path ends, every step is reachable, and every hands-on step has a safety stop since the last restart that covers what it opens"}
      </h2>
      {problems.length ? <ul className="mt-2 space-y-1">{problems.map(item)}</ul> : null}
      {warnings.length ? (
        <>
          <h3 className="mt-3 font-bold">{warnings.length} to look at before publishing (allowed, but a reviewer should agree)</h3>
          <ul className="mt-1 space-y-1">{warnings.map(item)}</ul>
        </>
      ) : null}
    </section>
  );
}
