import { useEffect, useState } from "react";
import { useTranslation } from "react-i18next";

/** How long a new step's answers wait before taking a tap (ms). */
const ARM_MS = 350;
import { GuideText } from "~/components/ui/guide-text";
import type { Guide } from "~/lib/guides/schema";
import type { Stepper } from "~/lib/walk/next-step";
import { AnswerButtons } from "./answer-buttons";
import { SafetyCaution } from "./safety-caution";
import { checklistOf } from "~/lib/guides/safety";
import { fillRigWords } from "~/lib/guides/rig-words";
import type { AgitatorDirection } from "~/lib/rigs/schema";
import { suggestedAnswer, type DayFact } from "~/lib/walk/day-facts";
import { useTimes } from "~/components/use-time-zone";
import type { Answer } from "~/lib/vocabulary";

/**
 * One step of the guide. Answering asks the stepper (the guide's own table on the phone, the
 * machine on the desk) where the answer leads and reports it; nothing here touches the network.
 * The card stays mounted from step to step: only what changed is redrawn.
 */
export function StepCard({
  guide,
  steps,
  stepId,
  rig,
  note,
  onNoteChange,
  onAdvance,
  dayFact,
  beforeAnswers,
  children,
  headingLevel = 1,
  inEnglish = false,
}: {
  /** The step has no up-to-date text in the reader's language: it shows in English, marked. */
  inEnglish?: boolean;
  /** What a step offers before its answers (a card item's "open the guide"), so it is seen first. */
  beforeAnswers?: React.ReactNode;
  /** What today's card said about the fact this check asks (its answer is offered, never taken silently). */
  dayFact?: DayFact;
  guide: Guide;
  steps: Stepper;
  stepId: string;
  /** The case's rig, for the words a step takes from it (none in the desk's preview). */
  rig?: { agitatorMixes: AgitatorDirection } | null;
  note: string;
  onNoteChange: (note: string) => void;
  onAdvance: (answer: string, to: string) => void;
  children?: React.ReactNode;
  /** 1 on the walk (the step is the page); 2 inside the desk's preview, under the page's own title. */
  headingLevel?: 1 | 2;
}) {
  const { t, i18n } = useTranslation();
  const Heading = headingLevel === 1 ? "h1" : "h2";
  // Help and the note box open per step: a new step starts with both as a fresh card would.
  const [open, setOpen] = useState({ step: stepId, help: false, note: note !== "" });
  if (open.step !== stepId) setOpen({ step: stepId, help: false, note: note !== "" });
  const showHelp = open.step === stepId && open.help;
  const showNote = open.step === stepId ? open.note : note !== "";
  const setShowHelp = (help: boolean) => setOpen((o) => ({ ...o, help }));
  const setShowNote = (shown: boolean) => setOpen((o) => ({ ...o, note: shown }));
  const meta = guide.states[stepId].meta;
  // Rig words in the language of the text: a step left in English keeps English words.
  const fill = (text: string) => fillRigWords(text, rig, inEnglish || i18n.language !== "es" ? "en" : "es");
  // A new step's buttons take taps only after a moment: a glove's double tap must not answer a
  // question that was never on screen (the next step's button appears where the thumb just was).
  const [armed, setArmed] = useState<string | null>(null);
  useEffect(() => {
    const t = window.setTimeout(() => setArmed(stepId), ARM_MS);
    return () => window.clearTimeout(t);
  }, [stepId]);

  const answer = (type: string) => {
    const to = steps.next(stepId, type);
    if (to !== stepId) onAdvance(type, to);
  };

  const safety = meta.kind === "safety";
  return (
    <section aria-labelledby="step-prompt" className="flex flex-1 flex-col gap-4">
      {safety ? <SafetyCaution compact /> : null}
      <div className={`rounded-lg border-2 p-4 ${safety ? "border-ink bg-caution" : "border-ink bg-paper"}`}>
        <Heading className="text-sm font-bold tracking-wide uppercase">
          {safety ? t("step.stop") : meta.kind === "check" ? t("step.check") : t("step.doThis")}
          {meta.minutes ? t("step.minutes", { minutes: meta.minutes < 1 ? "½" : meta.minutes }) : ""}
          {meta.handsOn ? t("step.handsOn") : ""}
        </Heading>
        {inEnglish ? (
          <p lang="en" data-testid="in-english" className="mt-1 inline-block rounded border-2 border-ink px-2 text-sm font-bold">
            {t("step.inEnglish")}
          </p>
        ) : null}
        <div
          id="step-prompt"
          tabIndex={-1}
          lang={inEnglish ? "en" : undefined}
          data-step-heading
          className={`mt-1 leading-snug ${safety ? "text-xl" : "text-[1.45rem] font-bold"}`}
        >
          <GuideText text={meta.prompt} fill={fill} />
        </div>
        {safety ? (
          <ul aria-label={t("step.beforeYouGoOn")} className="mt-3 list-disc space-y-1 pl-6 text-lg font-bold">
            {checklistOf(meta).map((item) => (
              <li key={item}>{t(`checklist.${item}`)}</li>
            ))}
          </ul>
        ) : null}
        {meta.help ? (
          <div className="mt-3">
            <button
              type="button"
              aria-expanded={showHelp}
              onClick={() => setShowHelp(!showHelp)}
              className="min-h-12 rounded-md border-2 border-ink px-3 font-bold"
            >
              {showHelp ? t("step.less") : t("step.more")}
            </button>
            {showHelp ? <GuideText text={meta.help} fill={fill} className="mt-2 text-lg" /> : null}
          </div>
        ) : null}
      </div>
      {/* Answers stay under the thumb; the shut-down stop is read to the end before it is acknowledged. */}
      <div className={safety ? "pb-2" : "sticky bottom-0 z-10 -mx-3 border-t-2 border-ink bg-field px-3 pt-2 pb-3"}>
        {dayFact ? <TodaysAnswer fact={dayFact} /> : null}
        {beforeAnswers}
        <AnswerButtons kind={meta.kind} onAnswer={answer} suggested={suggestedAnswer(dayFact)} disabled={armed !== stepId} />
      </div>
      {children}
      <div>
        {showNote ? (
          <label className="block font-bold">
            {t("step.note")}
            <textarea
              value={note}
              onChange={(e) => onNoteChange(e.target.value)}
              rows={2}
              maxLength={2000}
              className="mt-1 block w-full rounded-md border-2 border-ink bg-paper p-2 text-lg font-normal"
            />
          </label>
        ) : (
          <button type="button" onClick={() => setShowNote(true)} className="min-h-12 rounded-md border-2 border-ink bg-paper px-3 font-bold">
            {t("step.addNote")}
          </button>
        )}
      </div>
    </section>
  );
}

/** Today's card answer for this check, with its time: the matching button is marked, the crew taps to confirm. */
function TodaysAnswer({ fact }: { fact: DayFact }) {
  const { time } = useTimes();
  const { t } = useTranslation();
  return (
    <p data-testid="todays-answer" className="mb-2 rounded-md border-2 border-ink bg-paper px-3 py-2 text-lg">
      <strong>
        {t("step.todays", {
          card: fact.card,
          time: time(fact.at),
          by: fact.by ? ` (${fact.by})` : "",
          answer: t(`answers.${suggestedAnswer(fact)! as Answer}`),
        })}
      </strong>{" "}
      {t("step.todaysConfirm")}
    </p>
  );
}
