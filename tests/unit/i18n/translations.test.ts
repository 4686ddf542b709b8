import { describe, expect, it } from "vitest";
import en from "~/locales/en";
import es from "~/locales/es";
import { loadLibrary } from "~/lib/guides/files.server";
import { localizeGuide, localizedTitle, stamp, stepStamp, translationReport } from "~/lib/guides/translations";
import { validateGuide } from "~/lib/guides/validate";
import { languageFromHeader } from "~/lib/i18n/languages";
import { causes, root } from "../../helpers/guides";

const library = loadLibrary(root);

describe("every shipped guide and card in Spanish", () => {
  it.each(library.map((g) => [g.id, g] as const))("%s has every text translated from its current English", (_id, guide) => {
    const report = translationReport(guide, "es");
    expect(report.head).toBe("current");
    expect(report.missing).toEqual([]);
    expect(report.stale).toEqual([]);
    expect(localizeGuide(guide, "es").inEnglish).toEqual([]);
  });

  it("every cause has a Spanish name", () => {
    expect(causes.filter((c) => !c.names?.es).map((c) => c.code)).toEqual([]);
  });
});

describe("a step with no up-to-date Spanish", () => {
  const guide = structuredClone(library.find((g) => g.id === "lost-prime")!);
  const first = guide.initial;

  it("falls back to English, named in inEnglish, when the English changed after the Spanish was written", () => {
    guide.states[first].meta.prompt += " (Check both ends.)";
    const { guide: shown, inEnglish } = localizeGuide(guide, "es");
    expect(translationReport(guide, "es").stale).toEqual([first]);
    expect(inEnglish).toEqual([first]);
    expect(shown.states[first].meta.prompt).toBe(guide.states[first].meta.prompt);
    // Every other step is still Spanish.
    const other = Object.keys(guide.states).find((id) => id !== first)!;
    expect(shown.states[other].meta.prompt).toBe(guide.translations!.es!.steps![other].prompt);
  });

  it("falls back when the step has no Spanish at all, or lacks the help the English has", () => {
    const copy = structuredClone(library.find((g) => g.id === "foaming")!);
    const [a, b] = Object.entries(copy.states)
      .filter(([, s]) => s.meta.help)
      .map(([id]) => id);
    delete copy.translations!.es!.steps![a];
    delete copy.translations!.es!.steps![b].help;
    expect(translationReport(copy, "es").missing.sort()).toEqual([a, b].sort());
    expect(localizeGuide(copy, "es").inEnglish.sort()).toEqual([a, b].sort());
  });

  it("keeps the Spanish title while the English title block changed (flagged on the desk), the English when it has none, and English readers get the guide as written", () => {
    const copy = structuredClone(library.find((g) => g.id === "foaming")!);
    expect(localizedTitle(copy, "es")).toBe("Espuma en el tanque");
    copy.symptoms.push("white froth");
    expect(translationReport(copy, "es").head).toBe("stale");
    expect(localizedTitle(copy, "es")).toBe("Espuma en el tanque");
    delete copy.translations!.es!.title;
    expect(localizedTitle(copy, "es")).toBe(copy.title);
    const english = localizeGuide(copy, "en");
    expect(english.inEnglish).toEqual([]);
    expect(english.guide).not.toHaveProperty("translations");
    expect(english.guide.states[copy.initial].meta.prompt).toBe(copy.states[copy.initial].meta.prompt);
  });

  it("stamps change with the English text and nothing else", () => {
    expect(stamp("abc")).toMatch(/^[0-9a-f]{8}$/);
    expect(stepStamp({ prompt: "a", help: "b" })).not.toBe(stepStamp({ prompt: "a", help: "c" }));
    expect(stepStamp({ prompt: "a" })).toBe(stepStamp({ prompt: "a", help: "" }));
  });

  it("the checker refuses Spanish for a step that does not exist, and unknown rig words in Spanish", () => {
    const copy = structuredClone(library.find((g) => g.id === "foaming")!);
    copy.translations!.es!.steps!["no-such-step"] = { prompt: "Hola", from: "00000000" };
    copy.translations!.es!.steps![copy.initial].prompt = "Pon el agitador en {{agitador.mezcla}}.";
    const { problems } = validateGuide(copy, { causes });
    expect(problems.map((p) => p.message)).toEqual(
      expect.arrayContaining([expect.stringMatching(/names step "no-such-step"/), expect.stringMatching(/\{\{agitador\.mezcla\}\}/)]),
    );
  });
});

/** Every key path of an object, with its value. */
function leaves(obj: object, prefix = ""): [string, string][] {
  return Object.entries(obj).flatMap(([k, v]) => (typeof v === "string" ? [[`${prefix}${k}`, v] as [string, string]] : leaves(v as object, `${prefix}${k}.`)));
}
const placeholders = (text: string) => [...text.matchAll(/\{\{(\w+)\}\}/g)].map((m) => m[1].toLowerCase()).sort();

describe("the crew screens' words", () => {
  const english = new Map(leaves(en));
  const spanish = new Map(leaves(es));

  it("Spanish has every English key, none empty and none extra", () => {
    expect([...english.keys()].filter((k) => !spanish.has(k))).toEqual([]);
    expect([...spanish.keys()].filter((k) => !english.has(k))).toEqual([]);
    expect([...spanish.entries()].filter(([, v]) => !v.trim()).map(([k]) => k)).toEqual([]);
  });

  it("each Spanish text fills the same blanks as its English", () => {
    const differ = [...english.entries()].filter(([k, v]) => placeholders(v).join() !== placeholders(spanish.get(k) ?? "").join()).map(([k]) => k);
    expect(differ).toEqual([]);
  });
});

describe("the language a first sign-in takes from the browser", () => {
  it.each([
    ["es-MX,es;q=0.9,en;q=0.8", "es"],
    ["en-US,en;q=0.9,es;q=0.8", "en"],
    ["fr-FR,es;q=0.5", "es"],
    ["es;q=0.2,en;q=0.9", "en"],
    ["de-DE", "en"],
    ["", "en"],
    [null, "en"],
  ])("%s → %s", (header, lang) => {
    expect(languageFromHeader(header)).toBe(lang);
  });
});
