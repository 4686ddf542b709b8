import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import { useTranslation } from "react-i18next";
import type { AgitatorDirection } from "~/lib/rigs/schema";
import { Form, Link, useRouteLoaderData } from "react-router";
import type { loader as shellLoader } from "~/routes/shell";
import { useTimes } from "~/components/use-time-zone";
import { startOfTodayIn } from "~/lib/format";
import { mergeDayFacts, type DayFacts } from "~/lib/walk/day-facts";
import type { Guide } from "~/lib/guides/schema";
import { guideSteps } from "~/lib/walk/next-step";
import { replayFrom, replayWalk } from "~/lib/walk/replay";
import type { CaseKind, Outcome } from "~/lib/vocabulary";
import { appendEvent, loadRecord, mergeServerEvents, saveRecord, type QueuedEvent, type WalkRecord } from "~/lib/walk/queue";
import { MAX_PHOTO_BYTES } from "~/lib/cases/limits";
import { dayFactsOnPhone, fixesFromCardOnPhone, lastHoursOnPhone, noteHoursOnPhone, PHOTO_WAIT_CAP_BYTES, waitingPhotoBytes } from "~/lib/walk/kept";
import { keepPhotoBytes } from "~/components/offline/photo-store";
import { EndCard } from "./end-card";
import { PhotoPicker } from "./photo-picker";
import { StepCard } from "./step-card";
import { SyncBadge } from "./sync-badge";
import { useWalkSync } from "./use-walk-sync";

export interface WalkScreenProps {
  caseId: string;
  guide: Guide;
  guideTitle: string;
  rig: { code: string; name: string; hasHourMeter: boolean; engineHours: number; agitatorMixes: AgitatorDirection };
  stepsToEnd: Record<string, number>;
  causeNames: Record<string, string>;
  serverEvents: QueuedEvent[];
  /** How the server has the case closed, or null while it is open. */
  closedAs: Outcome | null;
  offlineReady?: boolean;
  /** The data was rebuilt on the phone (not drawn by the server): the phone's answers can be read at once. */
  fromPhone?: boolean;
  /** A fix or a rig card: a card's ends say complete or not ready, and it asks no hours at the end. */
  kind?: CaseKind;
  /** The card this fix was opened from: its end offers the way back. */
  fromCard?: { caseId: string; title: string } | null;
  /** Today's card answers for the facts this guide asks again, as the server has them. */
  serverDayFacts?: DayFacts;
  /** On a card: the fixes its items opened, as the server has them (the phone adds its own). */
  serverFixesOpened?: { caseId: string; title: string; outcome: string }[];
  renderFieldMath?: (widget: string) => React.ReactNode;
  /** Steps shown in English because the reader's language has no up-to-date text for them. */
  inEnglish?: string[];
}

/** The crew's walk-through: state lives on the phone, the server hears about it in batches. */
export function WalkScreen({
  caseId,
  guide,
  guideTitle,
  rig,
  stepsToEnd,
  causeNames,
  serverEvents,
  closedAs,
  offlineReady,
  fromPhone,
  kind = "fix",
  fromCard = null,
  serverDayFacts,
  serverFixesOpened,
  renderFieldMath,
  inEnglish = [],
}: WalkScreenProps) {
  const { t } = useTranslation();
  const steps = useMemo(() => guideSteps(guide), [guide]);
  // A page the server drew starts from the server's answers (the phone's are read after hydration);
  // one rebuilt on the phone opens straight at the phone's step.
  const [record, setRecord] = useState<WalkRecord>(() =>
    mergeServerEvents(fromPhone ? loadRecord(window.localStorage, caseId) : { caseId, events: [], synced: [] }, serverEvents),
  );
  const [note, setNote] = useState("");
  const [confirmStop, setConfirmStop] = useState(false);
  const stopQuestion = useRef<HTMLHeadingElement>(null);
  const stopButton = useRef<HTMLButtonElement>(null);
  // The question opens in view with focus on it; "Keep going" gives focus back to where it was.
  const askedStop = useRef(false);
  useEffect(() => {
    if (confirmStop) {
      askedStop.current = true;
      stopQuestion.current?.scrollIntoView({ block: "center" });
      stopQuestion.current?.focus({ preventScroll: true });
    } else if (askedStop.current) {
      askedStop.current = false;
      stopButton.current?.focus();
    }
  }, [confirmStop]);
  // The newest hour-meter reading this phone knows (a fix finished here with no signal counts).
  const [phoneHours, setPhoneHours] = useState<number | null>(null);
  useEffect(() => setPhoneHours(lastHoursOnPhone(window.localStorage, rig.code)), [rig.code]);

  // Today's facts: the server's, and cards this phone walked today that it may not have sent yet.
  const shell = useRouteLoaderData<typeof shellLoader>("routes/shell");
  const { zone } = useTimes();
  const [facts, setFacts] = useState<DayFacts>(serverDayFacts ?? {});
  const asksFacts = useMemo(() => kind === "fix" && Object.values(guide.states).some((st) => st.meta.dayCheck), [guide, kind]);
  useEffect(() => {
    if (!asksFacts) return;
    const since = startOfTodayIn(zone).toISOString();
    setFacts(mergeDayFacts(serverDayFacts ?? {}, dayFactsOnPhone(window.localStorage, rig.code, since, shell?.user.name ?? null)));
  }, [asksFacts, serverDayFacts, rig.code, zone, shell?.user.name]);

  // A card's fixes: the server's, and any this phone started from it and has not sent.
  const [fixesOpened, setFixesOpened] = useState(serverFixesOpened ?? []);
  useEffect(() => {
    if (kind !== "card") return;
    const known = new Set((serverFixesOpened ?? []).map((f) => f.caseId));
    const onPhone = fixesFromCardOnPhone(window.localStorage, caseId).filter((f) => !known.has(f.caseId));
    setFixesOpened([...(serverFixesOpened ?? []), ...onPhone]);
  }, [kind, caseId, serverFixesOpened]);

  // After hydration: what this phone kept (possibly more than the server has) wins.
  useEffect(() => {
    setRecord(mergeServerEvents(loadRecord(window.localStorage, caseId), serverEvents));
  }, [caseId, serverEvents]);

  const update = useCallback((change: (r: WalkRecord) => WalkRecord) => {
    setRecord((r) => {
      const next = change(r);
      saveRecord(window.localStorage, next);
      return next;
    });
  }, []);
  const sync = useWalkSync(record, update);

  // Replayed when the answers change, not on every render; a new answer goes on from the last
  // path rather than replaying the whole walk.
  const replayed = useRef<{ events: QueuedEvent[]; path: string[] } | null>(null);
  const path = useMemo(() => {
    const before = replayed.current;
    const events = record.events;
    const lastSeq = before?.events[before.events.length - 1]?.seq ?? 0;
    const goesOn =
      before !== null &&
      before.events.length <= events.length &&
      before.events.every((e, i) => events[i].id === e.id) &&
      events.slice(before.events.length).every((e) => e.seq > lastSeq);
    const next = goesOn ? replayFrom(steps, before.path, events.slice(before.events.length)) : replayWalk(steps, events);
    replayed.current = { events, path: next };
    return next;
  }, [steps, record.events]);
  const here = path[path.length - 1];
  const meta = guide.states[here].meta;
  const atEnd = meta.kind === "fixed" || meta.kind === "handoff";
  // Closed on the server and not by this phone (another phone finished it): read-only.
  const closedElsewhere = closedAs !== null && !record.close;
  // Stopped on this phone: nothing more to answer, whatever step it was on.
  const stoppedHere = record.close?.outcome === "abandoned";

  // Every step opens at its top with its prompt in focus: a shut-down stop below the fold is no stop.
  const top = useRef<HTMLDivElement>(null);
  const stepKey = `${here}-${path.length}`;
  const firstStep = useRef(true);
  useEffect(() => {
    const root = document.documentElement;
    const before = root.style.overflowAnchor;
    root.style.overflowAnchor = "none"; // the browser's scroll anchoring would push the new step down
    return () => void (root.style.overflowAnchor = before);
  }, []);
  useLayoutEffect(() => {
    if (firstStep.current) return void (firstStep.current = false);
    window.scrollTo({ top: 0, left: 0, behavior: "instant" });
    top.current?.querySelector<HTMLElement>("[data-step-heading]")?.focus({ preventScroll: true });
  }, [stepKey]);

  const takePhoto = async (file: File): Promise<string | null> => {
    if (file.size === 0) return t("walk.photoEmpty");
    if (file.size > MAX_PHOTO_BYTES) return t("walk.photoTooBig", { max: MAX_PHOTO_BYTES / 1024 / 1024, size: (file.size / 1024 / 1024).toFixed(1) });
    if (waitingPhotoBytes(window.localStorage) + file.size > PHOTO_WAIT_CAP_BYTES) return t("walk.photoCap", { max: PHOTO_WAIT_CAP_BYTES / 1024 / 1024 });
    const id = crypto.randomUUID();
    try {
      await keepPhotoBytes(id, file);
    } catch {
      return t("walk.photoNoRoom");
    }
    update((r) => ({ ...r, photos: [...(r.photos ?? []), { id, stepId: here, name: file.name || "photo.jpg", bytes: file.size }] }));
    setTimeout(sync.flushNow, 0);
    return null;
  };

  const record_ = (answer: QueuedEvent["answer"], stepId: string) =>
    update((r) => appendEvent(r, { id: crypto.randomUUID(), stepId, answer, at: new Date().toISOString(), ...(note.trim() ? { note: note.trim() } : {}) }));

  return (
    <div ref={top} className="flex flex-col gap-3">
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-lg">
          <strong>{rig.code}</strong> · {guideTitle}
        </p>
        {closedElsewhere || stoppedHere ? null : (
          <p className="text-base" aria-label={t("walk.progress")}>
            {t("walk.stepOf", { n: path.length })}
            {atEnd ? t("walk.end") : t("walk.toEnd", { count: stepsToEnd[here] })}
          </p>
        )}
      </header>
      {closedElsewhere || stoppedHere ? (
        <ClosedCard outcome={stoppedHere ? "abandoned" : closedAs!} synced={stoppedHere ? !!record.closeResult : true} kind={kind} />
      ) : atEnd ? (
        <EndCard
          kind={kind}
          fromCard={fromCard}
          meta={meta}
          causeName={meta.cause ? causeNames[meta.cause] : undefined}
          record={record}
          hourMeter={{ has: rig.hasHourMeter, current: Math.max(rig.engineHours, phoneHours ?? 0) }}
          online={sync.online}
          onFinish={(close) => {
            if (close.engineHours !== undefined) noteHoursOnPhone(window.localStorage, rig.code, close.engineHours);
            update((r) => ({ ...r, close: { ...close, outcome: meta.kind as "fixed" | "handoff", finalStep: here, at: new Date().toISOString() } }));
            setTimeout(sync.flushNow, 0);
          }}
        />
      ) : (
        <StepCard
          guide={guide}
          steps={steps}
          stepId={here}
          inEnglish={inEnglish.includes(here)}
          rig={rig}
          note={note}
          onNoteChange={setNote}
          dayFact={kind === "fix" && meta.dayCheck ? facts[meta.dayCheck] : undefined}
          beforeAnswers={
            kind === "card" && meta.opensGuide ? (
              <OpenGuide rigCode={rig.code} guideSlug={meta.opensGuide} cardId={caseId} cardTitle={guideTitle} opened={fixesOpened} />
            ) : null
          }
          onAdvance={(answer) => {
            record_(answer as QueuedEvent["answer"], here);
            setNote("");
          }}
        >
          {meta.fieldMath && renderFieldMath ? renderFieldMath(meta.fieldMath) : null}
          <PhotoPicker
            caseId={caseId}
            photos={(record.photos ?? []).filter((p) => p.stepId === here)}
            progress={sync.photoProgress}
            online={sync.online}
            onTake={takePhoto}
          />
        </StepCard>
      )}
      <SyncBadge
        noun={kind === "card" ? "card" : "fix"}
        online={sync.online}
        waiting={sync.waiting}
        startWaiting={sync.startWaiting}
        rejected={record.rejected}
        signedOut={sync.signedOut}
      />
      {/* Its place is kept until the phone has answered, so the buttons below do not jump. */}
      <p className="min-h-12 text-base">{offlineReady ? t("walk.keptOnPhone") : null}</p>
      {path.length > 1 && !record.close && !closedElsewhere ? (
        <button
          type="button"
          onClick={() => {
            // A note typed on this step goes with "went back a step", once.
            record_("BACK", here);
            setNote("");
          }}
          className="min-h-14 rounded-lg border-2 border-ink bg-paper text-lg font-bold"
        >
          {t("walk.back")}
        </button>
      ) : null}
      {!atEnd && !record.close && !closedElsewhere ? (
        confirmStop ? (
          // Asked on the page with big buttons (gloves), not in the browser's small dialog.
          <section aria-labelledby="stop-q" className="rounded-lg border-4 border-stop bg-paper p-4">
            <h2 id="stop-q" ref={stopQuestion} tabIndex={-1} className="text-xl font-bold">
              {t("walk.stopQuestion")}
            </h2>
            <p className="mt-1 text-lg">{sync.online ? t("walk.stopSaved") : t("walk.stopSavedLater")}</p>
            <div className="mt-3 grid grid-cols-2 gap-2">
              <button
                type="button"
                onClick={() => {
                  update((r) => ({ ...r, close: { outcome: "abandoned", finalStep: undefined, at: new Date().toISOString() } }));
                  setConfirmStop(false);
                  setTimeout(sync.flushNow, 0);
                }}
                className="min-h-14 rounded-lg bg-stop text-lg font-bold text-white"
              >
                {t("walk.yesStop")}
              </button>
              <button type="button" onClick={() => setConfirmStop(false)} className="min-h-14 rounded-lg border-2 border-ink bg-paper text-lg font-bold">
                {t("walk.keepGoing")}
              </button>
            </div>
          </section>
        ) : (
          <button type="button" ref={stopButton} onClick={() => setConfirmStop(true)} className="min-h-12 text-base underline">
            {t("walk.stopWithout")}
          </button>
        )
      ) : null}
    </div>
  );
}

/**
 * A card item that opens a guide: the fix starts on the same rig, linked to this card, with or
 * without signal (the fix page's own start). Done on the card, afterwards, carries on.
 */
function OpenGuide({
  rigCode,
  guideSlug,
  cardId,
  cardTitle,
  opened,
}: {
  rigCode: string;
  guideSlug: string;
  cardId: string;
  cardTitle: string;
  opened: { caseId: string; title: string; outcome: string }[];
}) {
  const [fixId] = useState(() => crypto.randomUUID());
  const { t } = useTranslation();
  const still = opened.find((f) => f.outcome === "open");
  return (
    <Form method="post" action={`/rigs/${rigCode}/fix`} className="mb-3">
      <input type="hidden" name="guideSlug" value={guideSlug} />
      <input type="hidden" name="caseId" value={fixId} />
      <input type="hidden" name="fromCaseId" value={cardId} />
      <input type="hidden" name="fromTitle" value={cardTitle} />
      {opened.length ? (
        <ul aria-label={t("walk.openedFromCard")} className="mb-2 rounded-md border-2 border-ink bg-paper px-3 py-2 text-lg">
          {opened.map((f) => (
            <li key={f.caseId}>
              <Link to={`/cases/${f.caseId}/walk`}>{f.title}</Link>: {f.outcome}
            </li>
          ))}
        </ul>
      ) : null}
      {still ? (
        // One guide at a time from a card: an open one is carried on, not started twice.
        <Link
          to={`/cases/${still.caseId}/walk`}
          className="flex min-h-16 w-full items-center justify-center rounded-lg border-4 border-ink bg-caution px-3 text-xl font-bold text-ink no-underline"
        >
          {t("walk.carryOnGuide")}
        </Link>
      ) : (
        <button type="submit" className="min-h-16 w-full rounded-lg border-4 border-ink bg-caution px-3 text-xl font-bold text-ink">
          {opened.length ? t("walk.openGuideAgain") : t("walk.openGuideNow")}
        </button>
      )}
      <p className="mt-1 text-base">{t("walk.cardStaysOpen")}</p>
    </Form>
  );
}

/** A closed case (stopped here, or finished elsewhere): shown as it ended, with nothing to answer. */
function ClosedCard({ outcome, synced, kind }: { outcome: Outcome; synced: boolean; kind: CaseKind }) {
  const { t } = useTranslation();
  const card = kind === "card";
  const label = (card ? t(`cardOutcomes.${outcome}`) : t(`outcomes.${outcome}`)).toLowerCase();
  return (
    <section aria-labelledby="closed-title" className="rounded-lg border-4 border-ink bg-paper p-4">
      <h1 id="closed-title" tabIndex={-1} data-step-heading className="text-2xl font-bold">
        {outcome === "abandoned" ? t("walk.stoppedTitle") : card ? t("walk.closedTitleCard", { label }) : t("walk.closedTitleFix", { label })}
      </h1>
      <p className="mt-2 text-lg">
        {outcome === "abandoned"
          ? synced
            ? t(card ? "walk.stoppedSavedCard" : "walk.stoppedSavedFix")
            : t("walk.stoppedLater")
          : t(card ? "walk.closedCard" : "walk.closedFix")}
      </p>
      <p className="mt-4">
        <Link to="/" className="inline-flex min-h-14 items-center rounded-lg border-2 border-ink bg-paper px-4 text-lg font-bold no-underline">
          {card ? t("walk.backToRigs") : t("walk.newFix")}
        </Link>
      </p>
    </section>
  );
}
