import type { Guide } from "./schema";

/**
 * Guide text as a safe element tree: markdown is turned into it on the server (by the same
 * react-markdown the desk uses), so the phone renders guide text without a markdown parser.
 * Only the tags below are ever drawn, and only links carry an attribute; there is no raw HTML.
 */
export type TextNode = string | [tag: TextTag, attrs: { href: string } | null, ...children: TextNode[]];

export const TEXT_TAGS = ["p", "strong", "em", "ul", "ol", "li", "a", "code", "br", "hr", "blockquote", "h1", "h2", "h3", "h4", "del"] as const;
export type TextTag = (typeof TEXT_TAGS)[number];
export const isTextTag = (tag: string): tag is TextTag => (TEXT_TAGS as readonly string[]).includes(tag);

/** Trees by their markdown source: every prompt and help text of a guide. */
export type GuideTexts = Record<string, TextNode[]>;

/** Every distinct piece of markdown in a guide (prompts and help). */
export function guideTextSources(guide: Guide): string[] {
  const texts = new Set<string>();
  for (const step of Object.values(guide.states)) {
    texts.add(step.meta.prompt);
    if (step.meta.help) texts.add(step.meta.help);
  }
  return [...texts];
}
