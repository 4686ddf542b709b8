import { useEffect, useState } from "react";
import { useTranslation } from "react-i18next";
import { Link, useLocation } from "react-router";
import { SEED_CLOCK_CHANGED as CHANGED, SEED_CLOCK_KEY as KEY, seedClock } from "~/lib/field-math/seed-clock";

interface Running {
  startedAt: number;
  limitMinutes: number;
  label: string;
}

function readClock(): Running | null {
  try {
    const kept = JSON.parse(localStorage.getItem(KEY) ?? "null") as Running | null;
    return kept && typeof kept.startedAt === "number" ? kept : null;
  } catch {
    return null;
  }
}

/**
 * The seed clock as the phone keeps it: a reload, a lost signal, a locked screen or another
 * screen (a guide opened because the pump plugged) does not lose it. Ticks once a second while running.
 */
function useSeedClock() {
  const [running, setRunning] = useState<Running | null>(null);
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const read = () => setRunning(readClock());
    read();
    window.addEventListener(CHANGED, read);
    window.addEventListener("storage", read);
    return () => {
      window.removeEventListener(CHANGED, read);
      window.removeEventListener("storage", read);
    };
  }, []);
  useEffect(() => {
    if (!running) return;
    setNow(Date.now());
    const tick = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(tick);
  }, [running]);
  const set = (next: Running | null) => {
    if (next) localStorage.setItem(KEY, JSON.stringify(next));
    else localStorage.removeItem(KEY);
    window.dispatchEvent(new Event(CHANGED));
  };
  return { running, now, start: (limitMinutes: number, label: string) => set({ startedAt: Date.now(), limitMinutes, label }), stop: () => set(null) };
}

/** On the load card: start the clock when the seed goes in; while it runs, the time left and a stop that asks first. */
export function SeedClock({ limitMinutes, label }: { limitMinutes: number; label: string }) {
  const { running, now, start, stop } = useSeedClock();
  const { t } = useTranslation();
  const [confirming, setConfirming] = useState(false);
  // Arriving from the bar on another screen, the clock comes into view, not the top of the form.
  const { hash } = useLocation();
  useEffect(() => {
    if (hash !== "#seed-clock" || !running) return;
    // After the card has filled in what the phone kept (which moves the clock down the page).
    const later = setTimeout(() => document.getElementById("seed-clock")?.scrollIntoView({ block: "center" }), 150);
    return () => clearTimeout(later);
  }, [hash, running]);
  if (!running) {
    return (
      <button
        type="button"
        onClick={() => start(limitMinutes, label)}
        className="no-print min-h-16 w-full rounded-lg border-4 border-ink bg-caution px-3 text-xl font-bold text-ink"
      >
        {t("fm.seed.start", { min: limitMinutes })}
      </button>
    );
  }
  const clock = seedClock(running.startedAt, now, running.limitMinutes);
  return (
    <section
      id="seed-clock"
      aria-label={t("fm.seed.label")}
      className={`no-print rounded-lg border-4 p-3 ${clock.over ? "border-stop bg-paper text-stop" : "border-ink bg-caution text-ink"}`}
    >
      <p className="text-lg font-bold">{t("fm.seed.title", { label: running.label })}</p>
      <p className="text-5xl font-bold tabular-nums" data-testid="seed-clock">
        {clock.over ? t("fm.seed.overBy", { time: clock.text }) : clock.text}
      </p>
      <p className="font-bold">{clock.over ? t("fm.seed.sprayNow") : t("fm.seed.sprayBefore", { min: running.limitMinutes })}</p>
      {confirming ? (
        <div className="mt-2 grid grid-cols-2 gap-2">
          <button
            type="button"
            onClick={() => {
              stop();
              setConfirming(false);
            }}
            className="min-h-14 rounded-lg bg-go text-lg font-bold text-white"
          >
            {t("fm.seed.yes")}
          </button>
          <button type="button" onClick={() => setConfirming(false)} className="min-h-14 rounded-lg border-2 border-ink bg-paper text-lg font-bold text-ink">
            {t("fm.seed.keep")}
          </button>
        </div>
      ) : (
        <button
          type="button"
          onClick={() => setConfirming(true)}
          className="mt-2 min-h-14 w-full rounded-lg border-2 border-ink bg-paper text-lg font-bold text-ink"
        >
          {t("fm.seed.stop")}
        </button>
      )}
    </section>
  );
}

/** On every other screen while the clock runs (a guide opened mid-load included): the time left, one tap from the card. */
export function SeedClockBar() {
  const { running, now } = useSeedClock();
  const { t } = useTranslation();
  const onCard = useLocation().pathname === "/field-math/load";
  if (!running || onCard) return null;
  const clock = seedClock(running.startedAt, now, running.limitMinutes);
  return (
    <p
      className={`no-print border-b-4 px-3 py-1 text-center text-lg font-bold ${clock.over ? "border-stop bg-paper text-stop" : "border-ink bg-caution text-ink"}`}
    >
      <Link to="/field-math/load#seed-clock" className="inline-flex min-h-12 items-center text-inherit" data-testid="seed-clock-bar">
        {t(clock.over ? "fm.seed.barOver" : "fm.seed.bar", { label: running.label, time: clock.text })}
      </Link>
    </p>
  );
}
