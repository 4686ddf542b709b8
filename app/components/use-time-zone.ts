import { useRouteLoaderData } from "react-router";
import { formatDate, formatDateTime, formatTime } from "~/lib/format";
import type { loader as shellLoader } from "~/routes/shell";

/** The signed-in company's time zone (from the shell's loader) and formatters bound to it. */
export function useTimes() {
  const zone = useRouteLoaderData<typeof shellLoader>("routes/shell")?.user.timeZone ?? "UTC";
  return {
    zone,
    date: (iso: string | Date) => formatDate(iso, zone),
    dateTime: (iso: string | Date) => formatDateTime(iso, zone),
    time: (iso: string | Date) => formatTime(iso, zone),
  };
}
