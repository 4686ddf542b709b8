import { Link } from "react-router";
import { useState } from "react";
import { ErrorList } from "~/components/ui/error-list";
import { GuideText } from "~/components/ui/guide-text";
import type { StepMeta } from "~/lib/guides/schema";
import type { QueuedClose, WalkRecord } from "~/lib/walk/queue";
import { useTimes } from "../use-time-zone";
import { CARD_OUTCOME_LABELS, type CaseKind } from "~/lib/vocabulary";

/** What the crew is told about the hand-off mail: what will happen until the server says what did. */
function handoffNews(record: WalkRecord, finished: boolean, online: boolean, time: (iso: string) => string): string {
  const result = record.closeResult;
  if (result?.mailFailed) return "The e-mail to your supervisor could not be sent. Call your supervisor.";
  if (result?.notified.length) return `E-mailed to ${result.notified.join(", ")}${result.mailedAt ? ` at ${time(result.mailedAt)}` : ""}.`;
  if (result?.mailPending) return "The case is closed; the e-mail to your supervisor is being sent.";
  if (result) return "The case is closed; the e-mail to your supervisor is not confirmed yet. Call if it is urgent.";
  if (!finished) return "When you finish, your supervisor will be e-mailed with your answers.";
  return online ? "Sending… your supervisor will be e-mailed when the server has the case." : "Your supervisor will be e-mailed when this phone has signal.";
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
  const { time } = useTimes();
  const fixed = meta.kind === "fixed";
  const finished = !!record.close;
  const card = kind === "card";
  // A card took the hour meter as it started; a fix takes it at its end.
  const asksHours = hourMeter.has && !card;

  const finish = () => {
    let engineHours: number | undefined;
    if (asksHours && hours.trim() !== "") {
      engineHours = Number(hours);
      if (!Number.isFinite(engineHours) || engineHours < 0 || engineHours > 100_000) return setError("Engine hours must be a number from 0 to 100,000.");
      if (engineHours < hourMeter.current) return setError(`The meter read ${hourMeter.current} h before; enter the reading now (the same or more).`);
    }
    setError(null);
    onFinish({ engineHours, note: note.trim() || undefined });
  };

  return (
    <section aria-labelledby="end-title" className={`rounded-lg border-4 p-4 ${fixed ? "border-go bg-paper" : "border-stop bg-paper"}`}>
      <h1 id="end-title" tabIndex={-1} data-step-heading className={`text-2xl font-bold ${fixed ? "text-go" : "text-stop"}`}>
        {card ? CARD_OUTCOME_LABELS[fixed ? "fixed" : "handoff"] : fixed ? "Fixed" : "Handed off"}
      </h1>
      <GuideText text={meta.prompt} className="mt-2 text-xl" />
      {fixed && causeName ? (
        <p className="mt-2 text-lg">
          <strong>Cause:</strong> {causeName}
          {meta.component ? ` (${meta.component})` : ""}
        </p>
      ) : null}
      {meta.help ? <GuideText text={meta.help} className="mt-3 text-lg" /> : null}
      {!fixed ? (
        <p className="mt-3 text-lg font-bold" data-testid="handoff-mail">
          {handoffNews(record, finished, online, time)}
        </p>
      ) : null}
      {finished ? (
        <>
          <p className="mt-4 text-lg font-bold">
            {record.closeResult
              ? `${card ? "Card" : "Case"} closed and saved.`
              : online
                ? `Finished. Saving the ${card ? "card" : "case"}…`
                : `Finished. The ${card ? "card" : "case"} is saved when this phone has signal.`}
          </p>
          <p className="mt-4 flex flex-wrap gap-2">
            {fromCard ? (
              <Link
                to={`/cases/${fromCard.caseId}/walk`}
                className="inline-flex min-h-14 items-center rounded-lg bg-go px-4 text-lg font-bold text-white no-underline"
              >
                Back to the {fromCard.title} card
              </Link>
            ) : null}
            <Link to="/" className="inline-flex min-h-14 items-center rounded-lg border-2 border-ink bg-paper px-4 text-lg font-bold no-underline">
              {card ? "Back to the rigs" : "Start a new fix"}
            </Link>
          </p>
        </>
      ) : (
        <div className="mt-4 space-y-3">
          {asksHours ? (
            <label className="block font-bold">
              Engine hours now (hour meter; last reading {hourMeter.current.toLocaleString("en-US")} h)
              <input
                value={hours}
                onChange={(e) => setHours(e.target.value)}
                inputMode="decimal"
                className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink px-3 text-lg"
              />
            </label>
          ) : null}
          <label className="block font-bold">
            Note for the {card ? "card" : "case"} (optional)
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
            Finish
          </button>
        </div>
      )}
    </section>
  );
}
