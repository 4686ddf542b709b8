/**
 * Times and durations for people, always in the company's time zone and always naming it
 * ("Jun 1, 2026, 8:05 AM MDT"), so a reader never wonders which clock a time is on.
 */
const OPTIONS = {
  dateTime: { month: "short", day: "numeric", year: "numeric", hour: "numeric", minute: "2-digit", timeZoneName: "short" },
  time: { hour: "numeric", minute: "2-digit", second: "2-digit", timeZoneName: "short" },
  date: { month: "short", day: "numeric", year: "numeric" },
  iso: {
    hourCycle: "h23",
    year: "numeric",
    month: "2-digit",
    day: "2-digit",
    hour: "2-digit",
    minute: "2-digit",
    second: "2-digit",
    timeZoneName: "longOffset",
  },
} satisfies Record<string, Intl.DateTimeFormatOptions>;

// Building a formatter costs far more than using one: one per kind and zone, kept (a CSV of
// thousands of rows, a page of cases).
const formatters = new Map<string, Intl.DateTimeFormat>();
function formatter(kind: keyof typeof OPTIONS, timeZone: string, locale = "en-US"): Intl.DateTimeFormat {
  const key = `${kind} ${timeZone} ${locale}`;
  let f = formatters.get(key);
  if (!f) formatters.set(key, (f = new Intl.DateTimeFormat(locale, { ...OPTIONS[kind], timeZone })));
  return f;
}

/** In the reader's locale (en-US unless given: e-mails, CSV and supervisor screens are English). */
export const formatDateTime = (iso: string | Date, timeZone: string, locale?: string) => formatter("dateTime", timeZone, locale).format(new Date(iso));
export const formatTime = (iso: string | Date, timeZone: string, locale?: string) => formatter("time", timeZone, locale).format(new Date(iso));
export const formatDate = (iso: string | Date, timeZone: string, locale?: string) => formatter("date", timeZone, locale).format(new Date(iso));

/** A label cut at a word boundary (never mid-word), with an ellipsis when cut. */
export function shortLabel(text: string, max: number): string {
  if (text.length <= max) return text;
  const cut = text.slice(0, max - 1);
  const space = cut.lastIndexOf(" ");
  return `${(space > max / 3 ? cut.slice(0, space) : cut).replace(/[,;:]$/, "")}…`;
}

/** ISO 8601 in the zone's local time with its offset, e.g. 2026-06-01T08:05:00-06:00 (for CSV files). */
export function isoInZone(iso: string | Date, timeZone: string): string {
  const parts = Object.fromEntries(
    formatter("iso", timeZone)
      .formatToParts(new Date(iso))
      .map((p) => [p.type, p.value]),
  );
  const offset = parts.timeZoneName === "GMT" ? "+00:00" : parts.timeZoneName.replace("GMT", "");
  return `${parts.year}-${parts.month}-${parts.day}T${parts.hour}:${parts.minute}:${parts.second}${offset}`;
}

/** The zone's offset from UTC at an instant, in minutes (Denver in winter: −420). */
function offsetMinutes(at: Date, timeZone: string): number {
  const m = isoInZone(at, timeZone).match(/([+-])(\d{2}):(\d{2})$/)!;
  return (m[1] === "-" ? -1 : 1) * (Number(m[2]) * 60 + Number(m[3]));
}

/** The instant a calendar day (YYYY-MM-DD) starts in a zone: a company's "June 1" runs from its own midnight. */
export function startOfDayIn(day: string, timeZone: string): Date {
  const [y, mo, d] = day.split("-").map(Number);
  const utcMidnight = Date.UTC(y, mo - 1, d);
  let at = new Date(utcMidnight - offsetMinutes(new Date(utcMidnight), timeZone) * 60_000);
  // Across a daylight-saving change the offset at the guess can differ from the offset at midnight.
  at = new Date(utcMidnight - offsetMinutes(at, timeZone) * 60_000);
  return at;
}

/** The instant today (as the zone's calendar reads `now`) began: where "today's cards" start. */
export const startOfTodayIn = (timeZone: string, now = new Date()): Date => startOfDayIn(isoInZone(now, timeZone).slice(0, 10), timeZone);

/** Is this an IANA zone this runtime knows? */
export function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat("en-US", { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

export function formatDuration(ms: number): string {
  if (!Number.isFinite(ms) || ms < 0) return "—";
  const s = Math.round(ms / 1000);
  if (s < 60) return `${s} s`;
  const m = Math.floor(s / 60);
  if (m < 60) return `${m} min ${s % 60 ? `${s % 60} s` : ""}`.trim();
  const h = Math.floor(m / 60);
  return `${h} h ${m % 60} min`;
}

const dayFormat = new Intl.DateTimeFormat("en-US", { weekday: "short", month: "short", day: "numeric", year: "numeric", timeZone: "UTC" });
/** A calendar day (YYYY-MM-DD) as people read it, "Tue, Jun 2, 2026": already the company's own day, so no zone applies. */
export const formatDay = (day: string) => dayFormat.format(new Date(`${day}T00:00:00Z`));
