import { fmt } from "../field-math/units";
import { formatDateTime, isoInZone } from "../format";
import type { Board } from "../stats/board";

/** The weekly digest for a company's supervisors: what to look at, in plain text. */
export function digestMail(
  company: string,
  board: Board,
  window: { from: string; to: string },
  causeName: (code: string) => string,
  appUrl: string,
  timeZone: string,
) {
  const day = (iso: string) => isoInZone(iso, timeZone).slice(0, 10);
  const flagged = board.rigs.filter((r) => r.outOfLine);
  const lines = [
    `Tankside weekly digest for ${company}, ${window.from} to ${window.to}.`,
    "",
    `${board.fleet.cases} cases; ${board.fleet.failures} ended fixed or handed off.`,
    "",
    "Rigs failing more often than the rest of the fleet (a prompt to look, not a verdict):",
    ...(flagged.length
      ? flagged.map((r) => `  ${r.rigCode}: ${fmt(r.ratePer100h ?? 0, 1)} per 100 engine hours against ${fmt(r.fleetRatePer100h ?? 0, 1)} for the others`)
      : ["  none"]),
    "",
    "Top causes:",
    ...(board.pareto.length ? board.pareto.slice(0, 5).map((p) => `  ${causeName(p.cause)}: ${p.count} (${fmt(p.share * 100)} %)`) : ["  none"]),
    "",
    "Repeats (same cause on the same rig):",
    ...(board.repeats.length
      ? board.repeats.slice(0, 10).map((g) => `  ${g.rigCode}: ${causeName(g.cause)}, ${g.count} times (${day(g.firstAt)} to ${day(g.lastAt)})`)
      : ["  none"]),
    "",
    "Open hand-offs:",
    ...(board.openHandoffs.length
      ? board.openHandoffs.slice(0, 10).map((o) => `  ${o.rigCode} ${o.guideTitle} (${formatDateTime(o.openedAt, timeZone)}): ${appUrl}/cases/${o.caseId}`)
      : ["  none"]),
    "",
    `The fault board: ${appUrl}/board`,
  ];
  return {
    subject: `Tankside weekly digest: ${flagged.length ? `${flagged.map((r) => r.rigCode).join(", ")} to look at` : "no rig flagged"}`,
    text: lines.join("\n"),
  };
}
