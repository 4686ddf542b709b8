import { useCallback, useEffect, useMemo, useState } from "react";
import { compileGuide } from "~/lib/guides/compile";
import type { Guide } from "~/lib/guides/schema";
import { replayWalk } from "~/lib/guides/walk";
import { appendEvent, loadRecord, mergeServerEvents, saveRecord, type QueuedEvent, type WalkRecord } from "~/lib/walk-queue";
import { EndCard } from "./end-card";
import { PhotoPicker } from "./photo-picker";
import { StepCard } from "./step-card";
import { SyncBadge } from "./sync-badge";
import { useWalkSync } from "./use-walk-sync";

export interface WalkScreenProps {
  caseId: string;
  guide: Guide;
  guideTitle: string;
  rig: { code: string; name: string; hasHourMeter: boolean; engineHours: number };
  stepsToEnd: Record<string, number>;
  causeNames: Record<string, string>;
  serverEvents: QueuedEvent[];
  closed: boolean;
  offlineReady?: boolean;
  renderCalc?: (calc: string) => React.ReactNode;
}

/** The crew's walk-through: state lives on the phone, the server hears about it in batches. */
export function WalkScreen({ caseId, guide, guideTitle, rig, stepsToEnd, causeNames, serverEvents, closed, offlineReady, renderCalc }: WalkScreenProps) {
  const machine = useMemo(() => compileGuide(guide), [guide]);
  const [record, setRecord] = useState<WalkRecord>(() => mergeServerEvents({ caseId, events: [], synced: [] }, serverEvents));
  const [note, setNote] = useState("");

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

  const path = replayWalk(machine, record.events);
  const here = path[path.length - 1];
  const meta = guide.states[here].meta;
  const atEnd = meta.kind === "fixed" || meta.kind === "handoff";

  const record_ = (answer: QueuedEvent["answer"], stepId: string) =>
    update((r) => appendEvent(r, { id: crypto.randomUUID(), stepId, answer, at: new Date().toISOString(), ...(note.trim() ? { note: note.trim() } : {}) }));

  return (
    <div className="flex flex-col gap-3">
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-lg">
          <strong>{rig.code}</strong> · {guideTitle}
        </p>
        <p className="text-base" aria-label="Progress">
          Step {path.length}
          {atEnd ? " · end" : ` · at least ${stepsToEnd[here]} more to an end`}
        </p>
      </header>
      {closed && !record.close ? <p className="font-bold">This case is already closed.</p> : null}
      {atEnd ? (
        <EndCard
          meta={meta}
          causeName={meta.cause ? causeNames[meta.cause] : undefined}
          record={record}
          hourMeter={{ has: rig.hasHourMeter, current: rig.engineHours }}
          onFinish={(close) => {
            update((r) => ({ ...r, close: { ...close, outcome: meta.kind as "fixed" | "handoff", finalStep: here, at: new Date().toISOString() } }));
            setTimeout(sync.flushNow, 0);
          }}
        />
      ) : (
        <StepCard
          key={`${here}-${path.length}`}
          machine={machine}
          stepId={here}
          note={note}
          onNoteChange={setNote}
          onAdvance={(answer) => {
            record_(answer as QueuedEvent["answer"], here);
            setNote("");
          }}
        >
          {meta.calc && renderCalc ? renderCalc(meta.calc) : null}
          <PhotoPicker caseId={caseId} stepId={here} online={sync.online} />
        </StepCard>
      )}
      <SyncBadge online={sync.online} waiting={sync.waiting} rejected={record.rejected} />
      {offlineReady ? <p className="text-base">This walk-through is kept on this phone: it opens again even with no signal.</p> : null}
      {path.length > 1 && !record.close ? (
        <button type="button" onClick={() => record_("BACK", here)} className="min-h-14 rounded-lg border-2 border-ink bg-paper text-lg font-bold">
          Back one step
        </button>
      ) : null}
      {!atEnd && !record.close ? (
        <button
          type="button"
          onClick={() => {
            if (!window.confirm("Stop this walk-through without an answer? It is saved as abandoned.")) return;
            update((r) => ({ ...r, close: { outcome: "abandoned", finalStep: undefined, at: new Date().toISOString() } }));
            setTimeout(sync.flushNow, 0);
          }}
          className="min-h-12 text-base underline"
        >
          Stop without finishing
        </button>
      ) : null}
      {record.close?.outcome === "abandoned" ? <p className="font-bold">Stopped. The case is saved as abandoned.</p> : null}
    </div>
  );
}
