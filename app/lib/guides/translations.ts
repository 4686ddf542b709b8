import type { Language } from "../i18n/languages";
import type { Guide } from "./schema";

/**
 * A guide file's text in other languages. English is the guide itself; each other language keeps
 * its title, summary, symptoms and step texts under `translations.<lang>`, each stamped with the
 * English it was written from (`from`). When the English changes, the stamp no longer matches:
 * the desk shows the text as out of date and the crew reads the English, marked, until a trainer
 * brings it up to date. A guide's safety wording is never older than its English.
 */
export interface StepTranslation {
  prompt: string;
  help?: string;
  /** Stamp of the English prompt and help this was written from. */
  from: string;
}
export interface GuideTranslation {
  title?: string;
  summary?: string;
  symptoms?: string[];
  /** Stamp of the English title, summary and symptoms these were written from. */
  from?: string;
  steps?: Record<string, StepTranslation>;
}
export type TranslationState = "current" | "stale" | "missing";

/** A short, stable fingerprint of a text (FNV-1a, 32 bits): enough to notice that the English changed. */
export function stamp(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, "0");
}

type StepText = { prompt: string; help?: string };
type HeadText = { title: string; summary: string; symptoms: string[] };

export const stepStamp = (meta: StepText) => stamp(`${meta.prompt}\u0000${meta.help ?? ""}`);
export const headStamp = (g: HeadText) => stamp(`${g.title}\u0000${g.summary}\u0000${g.symptoms.join("\u0001")}`);

/** Where one step's text stands in a language. */
export function stepState(meta: StepText, t: StepTranslation | undefined): TranslationState {
  if (!t?.prompt.trim() || (meta.help?.trim() && !t.help?.trim())) return "missing";
  return t.from === stepStamp(meta) ? "current" : "stale";
}

export function headState(g: HeadText, t: GuideTranslation | undefined): TranslationState {
  if (!t?.title?.trim() || !t.summary?.trim() || !t.symptoms?.length) return "missing";
  return t.from === headStamp(g) ? "current" : "stale";
}

type Translatable = HeadText & { states: Record<string, { meta: StepText }>; translations?: Partial<Record<Language, GuideTranslation>> };

/** Per step (and the title block), what a language has: the desk's "missing / out of date" list. */
export function translationReport(guide: Translatable, lang: Language) {
  const t = guide.translations?.[lang];
  const steps = Object.fromEntries(Object.entries(guide.states).map(([id, s]) => [id, stepState(s.meta, t?.steps?.[id])])) as Record<string, TranslationState>;
  const ids = Object.keys(steps);
  return {
    head: headState(guide, t),
    steps,
    missing: ids.filter((id) => steps[id] === "missing"),
    stale: ids.filter((id) => steps[id] === "stale"),
  };
}

/**
 * The guide as a crew member reading `lang` sees it: every text that has an up-to-date translation
 * in it, the rest in English; `inEnglish` names the steps left in English (the walk marks them).
 * The result carries no translations, so the phone receives one language.
 */
export function localizeGuide<G extends Guide>(guide: G, lang: Language): { guide: G; inEnglish: string[] } {
  const { translations, ...english } = guide;
  if (lang === "en") return { guide: english as G, inEnglish: [] };
  const t = translations?.[lang];
  const inEnglish: string[] = [];
  const states = Object.fromEntries(
    Object.entries(guide.states).map(([id, step]) => {
      const tr = t?.steps?.[id];
      if (stepState(step.meta, tr) !== "current") {
        inEnglish.push(id);
        return [id, step];
      }
      const meta = { ...step.meta, prompt: tr!.prompt };
      if (step.meta.help) meta.help = tr!.help;
      return [id, { ...step, meta }];
    }),
  );
  // The title block in Spanish even when the English changed since (the desk flags it): a title or a
  // symptom phrase carries no safety wording, and a guide that falls back to an English title is one a
  // Spanish reader cannot find. Steps, which do carry it, fall back.
  const head = headState(guide, t) !== "missing" ? { title: t!.title!, summary: t!.summary!, symptoms: t!.symptoms! } : {};
  return { guide: { ...english, ...head, states } as G, inEnglish };
}

/** A guide's title in a language (the English when it has none). */
export function localizedTitle(guide: Translatable, lang: Language): string {
  if (lang === "en") return guide.title;
  const t = guide.translations?.[lang];
  return headState(guide, t) !== "missing" ? t!.title! : guide.title;
}
