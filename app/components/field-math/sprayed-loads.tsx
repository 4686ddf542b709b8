import { useEffect, useState } from "react";
import type { CardLoad } from "~/lib/field-math/load-card";
import { fmt } from "~/lib/field-math/units";
import { startOfTodayIn } from "~/lib/format";
import { keepLoad, keptLoads, type KeptLoad } from "~/lib/jobs/kept-loads";
import type { JobSummary } from "~/lib/jobs/today";
import { sendKeptLoads } from "~/components/offline/send-loads";
import { useTimes } from "~/components/use-time-zone";

/**
 * "Load 3 sprayed": each tap records one load of the card on the job (its area and water), which is
 * how the job's progress grows. Kept on the phone first, so it works with no signal; sent at once
 * when there is signal, else when it returns.
 */
export function SprayedLoads({ job, rigCode, loads }: { job: JobSummary; rigCode: string | null; loads: CardLoad[] }) {
  const times = useTimes();
  const [marked, setMarked] = useState<KeptLoad[]>([]);
  const read = () => {
    const since = startOfTodayIn(times.zone).getTime();
    setMarked(keptLoads(window.localStorage).filter((l) => l.jobId === job.id && Date.parse(l.sprayedAt) >= since));
  };
  useEffect(read, [job.id, times.zone]);
  const next = loads[Math.min(marked.length, loads.length - 1)];
  const allDone = marked.length >= loads.length;

  // A gloved double tap must not mark two loads: the button rests for a moment after each.
  const [resting, setResting] = useState(false);
  async function mark() {
    if (resting) return;
    setResting(true);
    window.setTimeout(() => setResting(false), 1500);
    keepLoad(window.localStorage, {
      id: crypto.randomUUID(),
      jobId: job.id,
      number: marked.length + 1,
      ...(rigCode ? { rigCode } : {}),
      sprayedAt: new Date().toISOString(),
      areaSqFt: next.areaSqFt,
      waterGal: next.fillToGal,
    });
    read();
    await sendKeptLoads();
    read();
  }

  return (
    <section aria-labelledby="sprayed-h" className="no-print mt-4 rounded-lg border-2 border-ink bg-paper p-4">
      <h2 id="sprayed-h" className="text-xl font-bold">
        Loads sprayed on {job.name} today
      </h2>
      {marked.length ? (
        <ul className="mt-2 space-y-1">
          {marked.map((l) => (
            <li key={l.id}>
              Load {l.number}: {fmt(l.areaSqFt)} ft² at {times.time(l.sprayedAt)} ·{" "}
              {l.refused ? (
                <span className="font-bold text-stop">not taken: {l.refused}</span>
              ) : l.sent ? (
                "saved"
              ) : (
                "kept on this phone, sent when there is signal"
              )}
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-2">None marked yet. Tap once each load is sprayed out: the job&apos;s progress counts them.</p>
      )}
      <button type="button" disabled={resting} onClick={() => void mark()} className="mt-3 min-h-16 w-full rounded-md bg-go px-4 text-lg font-bold text-white">
        {allDone ? `Another load sprayed (${fmt(next.acres, 2)} ac)` : `Load ${marked.length + 1} sprayed (${fmt(next.acres, 2)} ac)`}
      </button>
    </section>
  );
}
