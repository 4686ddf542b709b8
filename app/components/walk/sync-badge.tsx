/** Says plainly whether the answers are safe on the server or still only on this phone, and why. */
export function SyncBadge({
  online,
  waiting,
  startWaiting = false,
  rejected,
  signedOut,
}: {
  online: boolean;
  /** Answers, photos and the close still only on this phone. */
  waiting: number;
  /** The fix itself (started with no signal) is not on the server yet. */
  startWaiting?: boolean;
  rejected?: string;
  signedOut?: boolean;
}) {
  let text: string;
  let tone: string;
  if (rejected) {
    text = `Not saved to Tankside. ${rejected}${/supervisor/i.test(rejected) ? "" : " Tell your supervisor."} Everything you answered stays on this phone.`;
    tone = "border-stop bg-paper text-stop";
  } else if (waiting === 0 && !startWaiting) {
    text = "All answers saved to Tankside.";
    tone = "border-go bg-paper text-go";
  } else if (waiting === 0) {
    text = online ? "Sending the fix to Tankside…" : "This fix is kept on this phone — no signal; it will be sent when there is.";
    tone = "border-ink bg-caution text-ink";
  } else if (signedOut) {
    text = `${waiting} kept on this phone: your sign-in has ended. Sign in again on this phone and they will be sent.`;
    tone = "border-ink bg-caution text-ink";
  } else {
    text = `${waiting} answer${waiting === 1 ? "" : "s"} kept on this phone${online ? ", sending…" : ` — no signal; ${waiting === 1 ? "it" : "they"} will be sent when there is.`}`;
    tone = "border-ink bg-caution text-ink";
  }
  return (
    <p
      role="status"
      aria-live="polite"
      data-synced={waiting === 0 && !startWaiting && !rejected ? "yes" : "no"}
      className={`rounded-md border-2 px-3 py-2 text-base font-bold ${tone}`}
    >
      {text}
    </p>
  );
}
