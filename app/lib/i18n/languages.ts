/**
 * The languages Tankside speaks to crews. A person's choice is kept on their account; before the
 * first sign-in it comes from the browser. Numbers and dates use the US form of each language
 * (es-US writes 1,500.5 as English does, and "3 dic 2026"): crews here read US numbers either way.
 */
export const LANGUAGES = ["en", "es"] as const;
export type Language = (typeof LANGUAGES)[number];

export const LANGUAGE_NAMES: Record<Language, string> = { en: "English", es: "Español" };
export const LOCALES: Record<Language, string> = { en: "en-US", es: "es-US" };

export const isLanguage = (value: unknown): value is Language => typeof value === "string" && (LANGUAGES as readonly string[]).includes(value);

/** The first language of an Accept-Language header that we speak, by its weights ("es-MX,es;q=0.9,en;q=0.8" → es). */
export function languageFromHeader(header: string | null | undefined): Language {
  if (!header) return "en";
  const ranked = header
    .split(",")
    .map((part, i) => {
      const [tag, ...params] = part.trim().split(";");
      const q = params.map((p) => p.trim()).find((p) => p.startsWith("q="));
      return { base: tag.trim().toLowerCase().split("-")[0], q: q ? Number(q.slice(2)) || 0 : 1, i };
    })
    .filter((t) => t.q > 0)
    .sort((a, b) => b.q - a.q || a.i - b.i);
  return ranked.map((t) => t.base).find(isLanguage) ?? "en";
}
