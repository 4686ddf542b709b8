import type { AgitatorDirection } from "../rigs/schema";

/**
 * Words a guide step takes from the case's rig, written `{{agitator.mixing}}` in its text: rigs
 * differ (some mix in reverse), and a step that says "reverse" to a crew whose rig mixes in reverse
 * would send them the wrong way. Without a rig (the desk's preview) the words say what they stand for.
 */
export const RIG_WORDS = {
  "agitator.mixing": { forRig: (d: AgitatorDirection) => d, unknown: "the direction this rig mixes in" },
  "agitator.opposite": {
    forRig: (d: AgitatorDirection) => (d === "forward" ? "reverse" : "forward"),
    unknown: "the opposite of the direction this rig mixes in",
  },
} as const;

export type RigWord = keyof typeof RIG_WORDS;

const TOKEN = /\{\{\s*([a-z.]+)\s*\}\}/g;

/** The `{{…}}` names in a text that are not rig words (the checker names them). */
export function unknownRigWords(text: string): string[] {
  return [...text.matchAll(TOKEN)].map((m) => m[1]).filter((name) => !(name in RIG_WORDS));
}

/** A step's text with this rig's words filled in (or their plain meaning when there is no rig). */
export function fillRigWords(text: string, rig: { agitatorMixes?: AgitatorDirection } | null | undefined): string {
  return text.replace(TOKEN, (whole, name: string) => {
    const word = RIG_WORDS[name as RigWord];
    if (!word) return whole;
    return rig?.agitatorMixes ? word.forRig(rig.agitatorMixes) : word.unknown;
  });
}
