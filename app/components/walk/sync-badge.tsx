/** Says plainly whether the answers are safe on the server or still only on this phone, and why. */
export function SyncBadge({
  online,
  waiting,
  startWaiting = false,
  rejected,
  signedOut,
  noun = "fix",
}: {
  /** What is being kept: "fix" or "card". */
  noun?: "fix" | "card";
  online: boolean;
  /** Answers, photos and the close still only on this phone. */
  waiting: { answers: number; photos: number; close: boolean };
  /** The fix itself (started with no signal) is not on the server yet. */
  startWaiting?: boolean;
  rejected?: string;
  signedOut?: boolean;
}) {
  let text: string;
  let tone: string;
  const what = [
    waiting.answers ? `${waiting.answers} answer${waiting.answers === 1 ? "" : "s"}` : "",
    waiting.photos ? `${waiting.photos} photo${waiting.photos === 1 ? "" : "s"}` : "",
    waiting.close ? `the end of the ${noun}` : "",
  ].filter(Boolean);
  const count = what.length;
  const listed = what.length > 1 ? `${what.slice(0, -1).join(", ")} and ${what[what.length - 1]}` : (what[0] ?? "");
  if (rejected) {
    text = `Not saved to Tankside. ${rejected}${/supervisor/i.test(rejected) ? "" : " Tell your supervisor."} Everything you answered stays on this phone.`;
    tone = "border-stop bg-paper text-stop";
  } else if (count === 0 && !startWaiting) {
    text = "All answers saved to Tankside.";
    tone = "border-go bg-paper text-go";
  } else if (count === 0) {
    text = online ? `Sending the ${noun} to Tankside…` : `This ${noun} is kept on this phone — no signal; it will be sent when there is.`;
    tone = "border-ink bg-caution text-ink";
  } else if (signedOut) {
    text = `Kept on this phone: ${listed}. Your sign-in has ended: sign in again on this phone and they will be sent.`;
    tone = "border-ink bg-caution text-ink";
  } else {
    const one = what.length === 1 && (waiting.answers === 1 || waiting.photos === 1 || waiting.close);
    text = `${listed[0].toUpperCase()}${listed.slice(1)} kept on this phone${online ? ", sending…" : ` — no signal; ${one ? "it" : "they"} will be sent when there is.`}`;
    tone = "border-ink bg-caution text-ink";
  }
  return (
    <p
      role="status"
      aria-live="polite"
      data-synced={count === 0 && !startWaiting && !rejected ? "yes" : "no"}
      className={`rounded-md border-2 px-3 py-2 text-base font-bold ${tone}`}
    >
      {text}
    </p>
  );
}
