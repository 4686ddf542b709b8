import { useMemo, useState } from "react";
import { GuideTextProvider } from "~/components/ui/guide-text";
import { Markdown, markdownRenderer } from "~/components/ui/markdown";
import { StepCard } from "~/components/walk/step-card";
import { compileGuide, machineSteps } from "~/lib/guides/compile";
import { stepsToEnd } from "~/lib/guides/graph";
import type { Guide } from "~/lib/guides/schema";

/** Walks a draft exactly as the crew's screen shows it, in a phone-sized frame; nothing is saved. */
export function PreviewWalk({ guide, lang = "en", inEnglish = [] }: { guide: Guide; lang?: "en" | "es"; inEnglish?: string[] }) {
  // The desk walks the compiled machine itself, so a trainer tries exactly what XState makes of the draft.
  const steps = useMemo(() => machineSteps(compileGuide(guide)), [guide]);
  const left = useMemo(() => stepsToEnd(guide), [guide]);
  const [path, setPath] = useState<string[]>([guide.initial]);
  const here = path[path.length - 1];
  const meta = guide.states[here].meta;
  const end = meta.kind === "fixed" || meta.kind === "handoff";
  return (
    <GuideTextProvider value={markdownRenderer}>
      <div lang={lang} className="mx-auto w-[360px] max-w-full rounded-xl border-8 border-ink bg-field p-3">
        <p className="mb-2 text-base">
          Preview · step {path.length}
          {end ? " · end" : ` · at least ${left[here]} more to an end`}
        </p>
        {end ? (
          <section className={`rounded-lg border-4 bg-paper p-4 ${meta.kind === "fixed" ? "border-go" : "border-stop"}`}>
            <h2 className="text-2xl font-bold">{meta.kind === "fixed" ? "Fixed" : "Handed off"}</h2>
            <Markdown className="mt-2 text-xl">{meta.prompt}</Markdown>
            {meta.help ? <Markdown className="mt-3 text-lg">{meta.help}</Markdown> : null}
          </section>
        ) : (
          <StepCard
            key={`${here}-${path.length}`}
            guide={guide}
            steps={steps}
            stepId={here}
            inEnglish={inEnglish.includes(here)}
            note=""
            onNoteChange={() => {}}
            onAdvance={(_answer, to) => setPath([...path, to])}
            headingLevel={2}
            beforeAnswers={
              meta.opensGuide ? (
                <p className="mb-3 rounded-lg border-4 border-ink bg-caution p-3 text-lg font-bold">
                  Crews see an “Open the guide now” button here, for the guide “{meta.opensGuide}”.
                </p>
              ) : null
            }
          />
        )}
        <div className="mt-3 grid grid-cols-2 gap-2">
          <button
            type="button"
            disabled={path.length < 2}
            onClick={() => setPath(path.slice(0, -1))}
            className="min-h-12 rounded-md border-2 border-ink bg-paper font-bold"
          >
            Back one step
          </button>
          <button type="button" onClick={() => setPath([guide.initial])} className="min-h-12 rounded-md border-2 border-ink bg-paper font-bold">
            Start again
          </button>
        </div>
      </div>
    </GuideTextProvider>
  );
}
