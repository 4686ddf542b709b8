import type { Language } from "../i18n/languages";
import type { AgitatorDirection } from "../rigs/schema";

/**
 * Words a guide step takes from the case's rig, written `{{agitator.mixing}}` in its text: rigs
 * differ (some mix in reverse), and a step that says "reverse" to a crew whose rig mixes in reverse
 * would send them the wrong way. Without a rig (the desk's preview) the words say what they stand for.
 */
const OPPOSITE: Record<AgitatorDirection, AgitatorDirection> = { forward: "reverse", reverse: "forward" };
// The words as the rig's controls are usually marked: "reversa" is what US crews say for reverse.
const DIRECTION: Record<Language, Record<AgitatorDirection, string>> = {
  en: { forward: "forward", reverse: "reverse" },
  es: { forward: "adelante", reverse: "reversa" },
};

export const RIG_WORDS = {
  "agitator.mixing": {
    forRig: (d: AgitatorDirection, lang: Language = "en") => DIRECTION[lang][d],
    unknown: { en: "the direction this rig mixes in", es: "la dirección en que mezcla este equipo" },
  },
  "agitator.opposite": {
    forRig: (d: AgitatorDirection, lang: Language = "en") => DIRECTION[lang][OPPOSITE[d]],
    unknown: { en: "the opposite of the direction this rig mixes in", es: "la dirección contraria a la que mezcla este equipo" },
  },
} as const;

export type RigWord = keyof typeof RIG_WORDS;

const TOKEN = /\{\{\s*([a-z.]+)\s*\}\}/g;

/** The `{{…}}` names in a text that are not rig words (the checker names them). */
export function unknownRigWords(text: string): string[] {
  return [...text.matchAll(TOKEN)].map((m) => m[1]).filter((name) => !(name in RIG_WORDS));
}

/** A step's text with this rig's words filled in, in the reader's language (or their plain meaning when there is no rig). */
export function fillRigWords(text: string, rig: { agitatorMixes?: AgitatorDirection } | null | undefined, lang: Language = "en"): string {
  return text.replace(TOKEN, (whole, name: string) => {
    const word = RIG_WORDS[name as RigWord];
    if (!word) return whole;
    return rig?.agitatorMixes ? word.forRig(rig.agitatorMixes, lang) : word.unknown[lang];
  });
}
