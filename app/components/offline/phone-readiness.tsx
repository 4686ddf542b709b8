import { useEffect, useState } from "react";
import { useTranslation } from "react-i18next";
import { Link } from "react-router";
import { useTimes } from "~/components/use-time-zone";
import { useKeptSummary } from "./kept-sync";
import { useKitStatus } from "./phone-kit";

/** Says on the home screen whether this phone can start a fix with no signal, and what waits to be sent. */
export function PhoneReadiness({ personId }: { personId: number }) {
  const { status, read } = useKitStatus(personId);
  const kept = useKeptSummary();
  const times = useTimes();
  const { t } = useTranslation();
  // Once fixes were waiting here, say when the last of them has gone, rather than just going quiet.
  const [wasWaiting, setWasWaiting] = useState(false);
  const [allSent, setAllSent] = useState(false);
  useEffect(() => {
    if (!kept) return;
    if (kept.waiting > 0) {
      setWasWaiting(true);
      setAllSent(false);
    } else if (wasWaiting && kept.refused.length === 0) setAllSent(true);
  }, [kept, wasWaiting]);
  // The line keeps its place while the phone is read (the server cannot know), so nothing below it jumps.
  const line = "flex min-h-[4.5rem] items-center rounded-md border-2 px-3 py-2 font-bold";
  if (!read)
    return (
      <div className="mb-4" data-testid="phone-readiness">
        <p className={`${line} border-ink bg-paper text-ink`}>{t("readiness.looking")}</p>
      </div>
    );
  const ready = status && status.pagesAt && status.pagesFailed === 0;
  return (
    <div className="mb-4 space-y-2" data-testid="phone-readiness">
      <p className={`${line} ${ready ? "border-go bg-paper text-go" : "border-ink bg-caution text-ink"}`}>
        {ready ? t("readiness.ready", { time: times.time(status.madeAt) }) : status ? t("readiness.partly") : t("readiness.notReady")}
      </p>
      {kept && kept.waiting > 0 ? (
        <p role="status" className="rounded-md border-2 border-ink bg-caution px-3 py-2 font-bold">
          {t(kept.signedOut ? "readiness.waitingSignedOut" : "readiness.waiting", { count: kept.waiting })}
        </p>
      ) : null}
      {allSent ? (
        <p role="status" className="rounded-md border-2 border-go bg-paper px-3 py-2 font-bold text-go">
          {t("readiness.allSent")}
        </p>
      ) : null}
      {kept?.refused.map((r) => (
        <p key={r.caseId} role="alert" className="rounded-md border-2 border-stop bg-paper px-3 py-2 font-bold text-stop">
          {t(/supervisor/i.test(r.message) ? "readiness.refused" : "readiness.refusedTell", { reason: r.message })}{" "}
          <Link to={`/cases/${r.caseId}/walk`} className="text-stop">
            {t("readiness.openIt")}
          </Link>
        </p>
      ))}
    </div>
  );
}
