import { fmt } from "~/lib/field-math/units";
import type { JobProgress } from "~/lib/jobs/progress";

/** A job's progress in words and a bar: area sprayed of the spec's, loads, faults, downtime, open hand-offs. */
export function JobProgressView({ progress: p, brief = false, closed = false }: { progress: JobProgress; brief?: boolean; closed?: boolean }) {
  const pct = Math.min(100, p.percent);
  return (
    <div className="space-y-2">
      <p className="text-lg font-bold">
        {fmt(p.sprayedAcres, 2)} of {fmt(p.targetAcres, 2)} acres sprayed ({fmt(p.percent)} %)
        {closed ? " · job closed" : ` · ${fmt(p.remainingAcres, 2)} acres to go`}
      </p>
      <div
        role="progressbar"
        aria-label="Area sprayed"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(pct)}
        className="h-4 w-full overflow-hidden rounded-full border-2 border-ink bg-paper"
      >
        <div className="h-full bg-go" style={{ width: `${pct}%` }} />
      </div>
      <p>
        {p.loads} load{p.loads === 1 ? "" : "s"}
        {brief ? "" : ` (${fmt(p.waterGal)} gal of water)`} · {p.fixes} fault{p.fixes === 1 ? "" : "s"} · {fmt(p.downtimeHours, 1)} h down
        {p.openHandoffs ? ` · ${p.openHandoffs} open hand-off${p.openHandoffs === 1 ? "" : "s"}` : ""}
        {brief ? "" : ` · ${p.cards} rig card${p.cards === 1 ? "" : "s"}`}
      </p>
    </div>
  );
}
