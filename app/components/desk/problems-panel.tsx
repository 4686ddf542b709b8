import { plainProblem, type GuideProblem } from "~/lib/guides/validate";

/** Live checks: every problem, each with a way to jump to its step. */
export function ProblemsPanel({ problems, onSelect }: { problems: GuideProblem[]; onSelect: (step: string) => void }) {
  return (
    <section
      aria-labelledby="checks-h"
      aria-live="polite"
      className={`rounded-lg border-4 p-3 ${problems.length ? "border-stop bg-paper" : "border-go bg-paper"}`}
    >
      <h2 id="checks-h" className="font-bold">
        {problems.length
          ? `${problems.length} problem${problems.length === 1 ? "" : "s"}: this draft can be saved but not sent for review`
          : "Checks pass: every path ends, every step is reachable, every hands-on step is behind a safety stop"}
      </h2>
      {problems.length ? (
        <ul className="mt-2 space-y-1">
          {problems.map((p, i) => (
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
          ))}
        </ul>
      ) : null}
    </section>
  );
}
