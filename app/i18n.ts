import { createInstance, type i18n, type Resource } from "i18next";
import { initReactI18next } from "react-i18next";
import { isLanguage, LOCALES, type Language } from "~/lib/i18n/languages";

/**
 * One i18next instance per language, made once and never switched: a page is drawn in one language
 * from first byte to hydration. The server registers both (entry.server); the phone registers only
 * the language of the page it opened (entry.client loads that one file), so it never ships both.
 */
const instances = new Map<Language, i18n>();
const rewrites = new Map<string, [RegExp, string][]>();

/**
 * Registers a language: its screen words, whole messages by their English text, and patterns for
 * the sentences the field math composes with figures in them ("Water to 750 gal…"): each is a regular
 * expression over the English and its replacement ($1… keep the figures).
 */
export function registerLanguage(lang: Language, strings: Resource[string][string], messages: Record<string, string> = {}, patterns: [string, string][] = []) {
  if (instances.has(lang)) return instances.get(lang)!;
  rewrites.set(
    lang,
    patterns.map(([from, to]) => [new RegExp(from, "g"), to]),
  );
  const instance = createInstance();
  void instance.use(initReactI18next).init({
    lng: lang,
    fallbackLng: false,
    resources: { [lang]: { translation: strings, messages } },
    initAsync: false,
    // React escapes what it draws.
    interpolation: { escapeValue: false },
    returnNull: false,
  });
  // Numbers inside messages take the language's own form.
  instance.services.formatter?.add("num", (value: number, _lng, options: { digits?: number }) =>
    new Intl.NumberFormat(LOCALES[lang], { maximumFractionDigits: options?.digits ?? 0 }).format(value),
  );
  instances.set(lang, instance);
  return instance;
}

/** A message the server or a form said in English, in the instance's language (English when it has none). */
export function sayIn(instance: i18n, message: string): string {
  const whole = instance.getResource(instance.language, "messages", message, { keySeparator: false }) as string | undefined;
  if (whole !== undefined) return whole;
  let said = message;
  for (const [from, to] of rewrites.get(instance.language) ?? []) said = said.replace(from, to);
  return said;
}

/** The instance for a language (the one registered when the phone has only that one). */
export function i18nFor(lang: Language): i18n {
  const instance = instances.get(lang) ?? instances.values().next().value;
  if (!instance) throw new Error("No language registered: entry.server or entry.client registers them before drawing.");
  return instance;
}

/** On the phone: the instance of the language the page was drawn in (a client action speaking with no signal). */
export const pageI18n = () => i18nFor(isLanguage(document.documentElement.lang) ? document.documentElement.lang : "en");
