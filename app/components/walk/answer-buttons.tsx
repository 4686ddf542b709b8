import type { StepKind } from "~/lib/guides/schema";

const LABELS: Record<string, { answer: string; label: string; primary: boolean }[]> = {
  check: [
    { answer: "YES", label: "Yes", primary: true },
    { answer: "NO", label: "No", primary: true },
  ],
  task: [
    { answer: "DONE", label: "Done", primary: true },
    { answer: "CANT", label: "Can't do it", primary: false },
  ],
  safety: [{ answer: "ACK", label: "Machine is shut down and locked out", primary: true }],
};

/** The answers for a step's kind, big and at the bottom of the screen where a thumb reaches. */
export function AnswerButtons({ kind, onAnswer }: { kind: StepKind; onAnswer: (answer: string) => void }) {
  const buttons = LABELS[kind] ?? [];
  return (
    <div className={`grid gap-3 ${buttons.length === 2 ? "grid-cols-2" : "grid-cols-1"}`}>
      {buttons.map((b) => (
        <button
          key={b.answer}
          type="button"
          onClick={() => onAnswer(b.answer)}
          className={`min-h-16 rounded-lg border-4 px-3 text-xl font-bold ${
            kind === "safety" ? "border-ink bg-ink text-white" : b.primary ? "border-go bg-go text-white" : "border-ink bg-paper text-ink"
          }`}
        >
          {b.label}
        </button>
      ))}
    </div>
  );
}
