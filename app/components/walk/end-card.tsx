import type { TFunction } from "i18next";
import { useTranslation } from "react-i18next";
import { Link } from "react-router";
import { useState } from "react";
import { ErrorList } from "~/components/ui/error-list";
import { GuideText } from "~/components/ui/guide-text";
import type { StepMeta } from "~/lib/guides/schema";
import type { QueuedClose, WalkRecord } from "~/lib/walk/queue";
import { useTimes } from "../use-time-zone";
import type { CaseKind } from "~/lib/vocabulary";

/** What the crew is told about the hand-off mail: what will happen until the server says what did. */
function handoffNews(record: WalkRecord, finished: boolean, online: boolean, time: (iso: string) => string, t: TFunction): string {
  const result = record.closeResult;
  if (result?.mailFailed) return t("end.mailFailed");
  if (result?.notified.length) {
    const to = result.notified.join(", ");
    return result.mailedAt ? t("end.mailedAt", { to, time: time(result.mailedAt) }) : t("end.mailed", { to });
  }
  if (result?.mailPending) return t("end.mailPending");
  if (result) return t("end.mailUnconfirmed");
  if (!finished) return t("end.mailWhenFinished");
  return online ? t("end.mailSending") : t("end.mailNoSignal");
}

/** The end of a walk-through: what was found (or who is told), engine hours, and Finish. */
export function EndCard({
  kind = "fix",
  fromCard = null,
  meta,
  causeName,
  record,
  hourMeter,
  online,
  onFinish,
}: {
  kind?: CaseKind;
  fromCard?: { caseId: string; title: string } | null;
  meta: StepMeta;
  causeName?: string;
  record: WalkRecord;
  hourMeter: { has: boolean; current: number };
  online: boolean;
  onFinish: (close: Omit<QueuedClose, "at" | "outcome" | "finalStep">) => void;
}) {
  // Left empty: the last reading offered as the answer would be saved unread with one tap.
  const [hours, setHours] = useState("");
  const [note, setNote] = useState("");
  const [error, setError] = useState<string | null>(null);
  const { time, number } = useTimes();
  const { t } = useTranslation();
  const fixed = meta.kind === "fixed";
  const finished = !!record.close;
  const card = kind === "card";
  // A card took the hour meter as it started; a fix takes it at its end.
  const asksHours = hourMeter.has && !card;

  const finish = () => {
    let engineHours: number | undefined;
    if (asksHours && hours.trim() !== "") {
      engineHours = Number(hours);
      if (!Number.isFinite(engineHours) || engineHours < 0 || engineHours > 100_000) return setError(t("end.hoursBad"));
      if (engineHours < hourMeter.current) return setError(t("end.hoursLow", { last: number(hourMeter.current, 1) }));
    }
    setError(null);
    onFinish({ engineHours, note: note.trim() || undefined });
  };

  return (
    <section aria-labelledby="end-title" className={`rounded-lg border-4 p-4 ${fixed ? "border-go bg-paper" : "border-stop bg-paper"}`}>
      <h1 id="end-title" tabIndex={-1} data-step-heading className={`text-2xl font-bold ${fixed ? "text-go" : "text-stop"}`}>
        {card ? t(`cardOutcomes.${fixed ? "fixed" : "handoff"}`) : fixed ? t("end.fixed") : t("end.handoff")}
      </h1>
      <GuideText text={meta.prompt} className="mt-2 text-xl" />
      {fixed && causeName ? (
        <p className="mt-2 text-lg">
          <strong>{t("end.cause")}</strong> {causeName}
          {meta.component ? ` (${t(`components.${meta.component}`)})` : ""}
        </p>
      ) : null}
      {meta.help ? <GuideText text={meta.help} className="mt-3 text-lg" /> : null}
      {!fixed ? (
        <p className="mt-3 text-lg font-bold" data-testid="handoff-mail">
          {handoffNews(record, finished, online, time, t)}
        </p>
      ) : null}
      {finished ? (
        <>
          <p className="mt-4 text-lg font-bold">
            {record.closeResult
              ? t(card ? "end.savedCard" : "end.savedFix")
              : online
                ? t(card ? "end.savingCard" : "end.savingFix")
                : t(card ? "end.laterCard" : "end.laterFix")}
          </p>
          <p className="mt-4 flex flex-wrap gap-2">
            {fromCard ? (
              <Link
                to={`/cases/${fromCard.caseId}/walk`}
                className="inline-flex min-h-14 items-center rounded-lg bg-go px-4 text-lg font-bold text-white no-underline"
              >
                {t("end.backToCard", { title: fromCard.title })}
              </Link>
            ) : null}
            <Link to="/" className="inline-flex min-h-14 items-center rounded-lg border-2 border-ink bg-paper px-4 text-lg font-bold no-underline">
              {card ? t("walk.backToRigs") : t("walk.newFix")}
            </Link>
          </p>
        </>
      ) : (
        <div className="mt-4 space-y-3">
          {asksHours ? (
            <label className="block font-bold">
              {t("end.hours", { last: number(hourMeter.current, 1) })}
              <input
                value={hours}
                onChange={(e) => setHours(e.target.value)}
                inputMode="decimal"
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink px-3 text-lg"
              />
            </label>
          ) : null}
          <label className="block font-bold">
            {t(card ? "end.noteCard" : "end.noteFix")}
            <textarea
              value={note}
              onChange={(e) => setNote(e.target.value)}
              rows={2}
              maxLength={2000}
              className="mt-1 block w-full rounded-md border-2 border-ink p-2 text-lg font-normal"
            />
          </label>
          {error ? <ErrorList error={error} /> : null}
          <button type="button" onClick={finish} className="min-h-16 w-full rounded-lg bg-go text-xl font-bold text-white">
            {t("end.finish")}
          </button>
        </div>
      )}
    </section>
  );
}
