import { useEffect, useState } from "react";
import { useTranslation } from "react-i18next";
import { useSay } from "~/components/ui/say";
import type { CardLoad } from "~/lib/field-math/load-card";
import { fmt } from "~/lib/field-math/units";
import { startOfTodayIn } from "~/lib/format";
import { keepLoad, keptLoads, takeBackLoad, type KeptLoad } from "~/lib/jobs/kept-loads";
import type { JobSummary } from "~/lib/jobs/today";
import { KEPT_CHANGED } from "~/components/offline/kept-sync";
import { sendKeptLoads } from "~/components/offline/send-loads";
import { useTimes } from "~/components/use-time-zone";

const acres = (sqFt: number) => `${fmt(sqFt / 43_560, 2)} ac`;

/**
 * "Load 3 sprayed": each tap records one load of the card on the job (its area and water), which is
 * how the job's progress grows. Kept on the phone first, so it works with no signal; sent at once
 * when there is signal, else when it returns. The last load marked can be taken back.
 */
export function SprayedLoads({ job, rigCode, loads }: { job: JobSummary; rigCode: string | null; loads: CardLoad[] }) {
  const times = useTimes();
  const { t } = useTranslation();
  const say = useSay();
  const [marked, setMarked] = useState<KeptLoad[]>([]);
  const [asking, setAsking] = useState(false);
  const read = () => {
    const since = startOfTodayIn(times.zone).getTime();
    setMarked(keptLoads(window.localStorage).filter((l) => l.jobId === job.id && !l.takeBack && Date.parse(l.sprayedAt) >= since));
  };
  useEffect(() => {
    read();
    // The frame sends what waits when signal returns: show it as saved then.
    const sendNow = () => void sendKeptLoads().then(read);
    window.addEventListener(KEPT_CHANGED, read);
    window.addEventListener("online", sendNow);
    return () => {
      window.removeEventListener(KEPT_CHANGED, read);
      window.removeEventListener("online", sendNow);
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- read depends only on these
  }, [job.id, times.zone]);
  const next = loads[Math.min(marked.length, loads.length - 1)];
  const allDone = marked.length >= loads.length;
  const last = marked.at(-1);

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

  async function takeBack(id: string) {
    takeBackLoad(window.localStorage, id);
    setAsking(false);
    read();
    await sendKeptLoads();
    read();
  }

  return (
    <section aria-labelledby="sprayed-h" className="no-print mt-4 rounded-lg border-2 border-ink bg-paper p-4">
      <h2 id="sprayed-h" className="text-xl font-bold">
        {t("fm.sprayed.title", { job: job.name })}
      </h2>
      <button type="button" disabled={resting} onClick={() => void mark()} className="mt-3 min-h-16 w-full rounded-md bg-go px-4 text-lg font-bold text-white">
        {allDone ? t("fm.sprayed.another", { area: acres(next.areaSqFt) }) : t("fm.sprayed.next", { n: marked.length + 1, area: acres(next.areaSqFt) })}
      </button>
      {marked.length ? (
        <ul className="mt-3 space-y-1">
          {marked.map((l) => (
            <li key={l.id}>
              {t("fm.sprayed.line", { n: l.number, area: acres(l.areaSqFt), time: times.time(l.sprayedAt) })}
              {l.refused ? <span className="font-bold text-stop">{say(l.refused)}</span> : l.sent ? t("fm.sprayed.saved") : t("fm.sprayed.kept")}
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-2">{t("fm.sprayed.none")}</p>
      )}
      {last && !last.refused ? (
        asking ? (
          <div className="mt-3 space-y-2 rounded-md border-2 border-stop p-3">
            <p className="font-bold">{t("fm.sprayed.ask", { n: last.number })}</p>
            <button type="button" onClick={() => void takeBack(last.id)} className="min-h-12 w-full rounded-md bg-stop px-4 font-bold text-white">
              {t("fm.sprayed.yes", { n: last.number })}
            </button>
            <button type="button" onClick={() => setAsking(false)} className="min-h-12 w-full rounded-md border-2 border-ink px-4 font-bold">
              {t("fm.sprayed.keep")}
            </button>
          </div>
        ) : (
          <button type="button" onClick={() => setAsking(true)} className="mt-3 min-h-12 w-full rounded-md border-2 border-ink px-4 font-bold">
            {t("fm.sprayed.mistake", { n: last.number })}
          </button>
        )
      ) : null}
    </section>
  );
}
