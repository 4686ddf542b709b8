import { useRouteLoaderData } from "react-router";
import { formatDate, formatDateTime, formatTime } from "~/lib/format";
import { LOCALES } from "~/lib/i18n/languages";
import type { loader as rootLoader } from "~/root";
import type { loader as shellLoader } from "~/routes/shell";

/**
 * The signed-in company's time zone (from the shell's loader) and formatters bound to it and to the
 * reader's language: "Dec 3, 2026, 8:05 AM MST" or "3 dic 2026, 8:05 a.m. MST".
 */
export function useTimes() {
  const zone = useRouteLoaderData<typeof shellLoader>("routes/shell")?.user.timeZone ?? "UTC";
  const locale = LOCALES[useRouteLoaderData<typeof rootLoader>("root")?.lang ?? "en"];
  return {
    zone,
    locale,
    date: (iso: string | Date) => formatDate(iso, zone, locale),
    dateTime: (iso: string | Date) => formatDateTime(iso, zone, locale),
    time: (iso: string | Date) => formatTime(iso, zone, locale),
    /** A number in the reader's language, to at most `digits` decimals. */
    number: (value: number, digits = 0) => value.toLocaleString(locale, { maximumFractionDigits: digits }),
  };
}
