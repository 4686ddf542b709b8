import { useTranslation } from "react-i18next";
import type { StepKind } from "~/lib/guides/schema";
import { ANSWER_MARKS, ANSWERS_BY_KIND, type StepAnswer } from "~/lib/vocabulary";

/**
 * Each answer has its own shade as well as its own word and mark, so a glance in glare (or a
 * colour-blind eye) tells Yes from No: the first of a pair is filled, the second outlined.
 */
const SHADE: Record<StepAnswer, string> = {
  YES: "border-go bg-go text-white",
  DONE: "border-go bg-go text-white",
  NO: "border-ink bg-paper text-ink",
  CANT: "border-ink bg-paper text-ink",
  ACK: "border-ink bg-ink text-white",
};

/** The answers for a step's kind, big and at the bottom of the screen where a thumb reaches. */
export function AnswerButtons({
  kind,
  onAnswer,
  suggested,
  disabled = false,
}: {
  kind: StepKind;
  onAnswer: (answer: StepAnswer) => void;
  suggested?: StepAnswer;
  /** For a moment after a step opens: no look change (that would flicker), the tap just does nothing. */
  disabled?: boolean;
}) {
  const { t } = useTranslation();
  const answers: readonly StepAnswer[] = ANSWERS_BY_KIND[kind];
  return (
    <div className={`grid gap-3 ${answers.length === 2 ? "grid-cols-2" : "grid-cols-1"}`}>
      {answers.map((a) => (
        <button
          key={a}
          type="button"
          onClick={() => onAnswer(a)}
          disabled={disabled}
          aria-describedby={suggested === a ? "todays-answer-mark" : undefined}
          className={`flex min-h-16 items-center justify-center gap-2 rounded-lg border-4 px-3 text-xl font-bold ${SHADE[a]} ${
            suggested === a ? "outline-4 outline-offset-4 outline-ink" : ""
          }`}
        >
          <span aria-hidden="true" className="text-2xl leading-none">
            {ANSWER_MARKS[a]}
          </span>
          {t(`answers.${a}`)}
          {suggested === a ? (
            <span id="todays-answer-mark" className="text-base font-normal">
              {t("step.todaysMark")}
            </span>
          ) : null}
        </button>
      ))}
    </div>
  );
}
