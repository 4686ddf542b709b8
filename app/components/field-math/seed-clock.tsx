import { useEffect, useState } from "react";
import { seedClock } from "~/lib/field-math/load-card";

const KEY = "tankside.seed-clock";

interface Running {
  startedAt: number;
  limitMinutes: number;
  label: string;
}

/**
 * Counts down from the moment seed goes in. Kept on the phone, so a reload, a lost signal or
 * a locked screen does not lose it.
 */
export function SeedClock({ limitMinutes, label }: { limitMinutes: number; label: string }) {
  const [running, setRunning] = useState<Running | null>(null);
  const [now, setNow] = useState(() => Date.now());

  useEffect(() => {
    try {
      const kept = JSON.parse(localStorage.getItem(KEY) ?? "null") as Running | null;
      if (kept && typeof kept.startedAt === "number") setRunning(kept);
    } catch {
      // An unreadable clock is no clock.
    }
  }, []);
  useEffect(() => {
    if (!running) return;
    const tick = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(tick);
  }, [running]);

  const start = () => {
    const r = { startedAt: Date.now(), limitMinutes, label };
    localStorage.setItem(KEY, JSON.stringify(r));
    setNow(r.startedAt);
    setRunning(r);
  };
  const stop = () => {
    localStorage.removeItem(KEY);
    setRunning(null);
  };

  if (!running) {
    return (
      <button type="button" onClick={start} className="no-print min-h-16 w-full rounded-lg border-4 border-ink bg-caution px-3 text-xl font-bold text-ink">
        Seed is in: start the {limitMinutes}-minute clock
      </button>
    );
  }
  const clock = seedClock(running.startedAt, now, running.limitMinutes);
  return (
    <section
      aria-label="Seed clock"
      className={`no-print rounded-lg border-4 p-3 ${clock.over ? "border-stop bg-paper text-stop" : "border-ink bg-caution text-ink"}`}
    >
      <p className="text-lg font-bold">Seed clock · {running.label}</p>
      <p className="text-5xl font-bold tabular-nums" data-testid="seed-clock">
        {clock.over ? `Over by ${clock.text}` : clock.text}
      </p>
      <p className="font-bold">
        {clock.over
          ? "Spray this load now. Next time, put the seed in closer to spraying."
          : `Spray before it reaches 0:00 (${running.limitMinutes} minutes from seed in).`}
      </p>
      <button type="button" onClick={stop} className="mt-2 min-h-14 w-full rounded-lg border-2 border-ink bg-paper text-lg font-bold text-ink">
        Load sprayed: stop the clock
      </button>
    </section>
  );
}
