import { useTranslation } from "react-i18next";

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
  const { t } = useTranslation();
  let text: string;
  let tone: string;
  const what = [
    waiting.answers ? t("sync.answers", { count: waiting.answers }) : "",
    waiting.photos ? t("sync.photos", { count: waiting.photos }) : "",
    waiting.close ? t(noun === "card" ? "sync.endCard" : "sync.endFix") : "",
  ].filter(Boolean);
  const count = what.length;
  const list = what.length > 1 ? t("sync.and", { list: what.slice(0, -1).join(", "), last: what[what.length - 1] }) : (what[0] ?? "");
  if (rejected) {
    text = t(/supervisor/i.test(rejected) ? "sync.rejected" : "sync.rejectedTell", { reason: rejected });
    tone = "border-stop bg-paper text-stop";
  } else if (count === 0 && !startWaiting) {
    text = t("sync.allSaved");
    tone = "border-go bg-paper text-go";
  } else if (count === 0) {
    text = online ? t(noun === "card" ? "sync.sendingCard" : "sync.sendingFix") : t(noun === "card" ? "sync.keptCard" : "sync.keptFix");
    tone = "border-ink bg-caution text-ink";
  } else if (signedOut) {
    text = t("sync.signedOut", { list });
    tone = "border-ink bg-caution text-ink";
  } else {
    const List = `${list[0].toUpperCase()}${list.slice(1)}`;
    const one = what.length === 1 && (waiting.answers === 1 || waiting.photos === 1 || waiting.close);
    text = online ? t("sync.keptSending", { list, List }) : t(one ? "sync.keptOneLater" : "sync.keptLater", { list, List });
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
