/** Says plainly whether the answers are safe on the server or still only on this phone. */
export function SyncBadge({ online, waiting, rejected }: { online: boolean; waiting: number; rejected?: string }) {
  let text: string;
  let tone: string;
  if (rejected) {
    text = `Not saved: ${rejected} Tell your supervisor.`;
    tone = "border-stop bg-paper text-stop";
  } else if (waiting === 0) {
    text = "All answers saved to Tankside.";
    tone = "border-go bg-paper text-go";
  } else {
    text = `${waiting} answer${waiting === 1 ? "" : "s"} kept on this phone${online ? ", sending…" : ` — no signal; ${waiting === 1 ? "it" : "they"} will be sent when there is.`}`;
    tone = "border-ink bg-caution text-ink";
  }
  return (
    <p
      role="status"
      aria-live="polite"
      data-synced={waiting === 0 && !rejected ? "yes" : "no"}
      className={`rounded-md border-2 px-3 py-2 text-base font-bold ${tone}`}
    >
      {text}
    </p>
  );
}
