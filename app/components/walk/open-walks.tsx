import { Link } from "react-router";
import { useTranslation } from "react-i18next";
import { useTimes } from "~/components/use-time-zone";

export interface OpenWalk {
  id: string;
  guideTitle: string;
  openedAt: string;
  onPhoneOnly: boolean;
}

/** Walk-throughs (fixes or cards) left open on a rig: "carry on" beats starting a second one. */
export function OpenWalks({ walks }: { walks: OpenWalk[] }) {
  const times = useTimes();
  const { t } = useTranslation();
  if (!walks.length) return null;
  return (
    <section aria-labelledby="open-h" className="mt-4 rounded-lg border-4 border-go bg-paper p-3">
      <h2 id="open-h" className="text-lg font-bold">
        {t("openWalks.title")}
      </h2>
      <ul className="mt-2 space-y-2">
        {walks.map((w) => (
          <li key={w.id}>
            <Link to={`/cases/${w.id}/walk`} className="flex min-h-14 flex-col justify-center rounded-lg bg-go px-4 py-2 text-white no-underline">
              <span className="text-xl font-bold">{w.guideTitle}</span>
              <span>
                {t("openWalks.started", { when: times.dateTime(w.openedAt) })}
                {w.onPhoneOnly ? t("openWalks.phoneOnly") : ""}
              </span>
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}
