import { isValidElement, type ReactNode } from "react";
import Markdown from "react-markdown";
import { DISALLOWED_ELEMENTS, htmlAsText } from "~/lib/guides/markdown-safety";
import type { Guide } from "~/lib/guides/schema";
import type { Language } from "~/lib/i18n/languages";
import { guideTextSources, isTextTag, type GuideTexts, type TextNode } from "~/lib/guides/text-tree";

/** One piece of guide markdown as a safe element tree, through the same react-markdown settings as the desk. */
export function textTree(markdown: string): TextNode[] {
  return toTree(Markdown({ children: markdown, remarkPlugins: [htmlAsText], disallowedElements: DISALLOWED_ELEMENTS, unwrapDisallowed: true }));
}

function toTree(node: ReactNode): TextNode[] {
  if (node === null || node === undefined || typeof node === "boolean") return [];
  if (typeof node === "string" || typeof node === "number") return [String(node)];
  if (Array.isArray(node)) return node.flatMap(toTree);
  if (!isValidElement(node)) return [];
  const props = node.props as { children?: ReactNode; href?: unknown };
  const children = toTree(props.children);
  // Fragments and anything not on the list give their children only.
  if (typeof node.type !== "string" || !isTextTag(node.type)) return children;
  const attrs = node.type === "a" && typeof props.href === "string" ? { href: props.href } : null;
  return [[node.type, attrs, ...children]];
}

// A published version never changes, so its trees are made once per version and language.
const byVersion = new Map<string, GuideTexts>();

/** Trees for every prompt and help text of a guide version (as localized for one language). */
export function guideTexts(versionId: number, guide: Guide, lang: Language = "en"): GuideTexts {
  const key = `${versionId}:${lang}`;
  let texts = byVersion.get(key);
  if (!texts) {
    texts = Object.fromEntries(guideTextSources(guide).map((md) => [md, textTree(md)]));
    if (byVersion.size >= 500) byVersion.delete(byVersion.keys().next().value!);
    byVersion.set(key, texts);
  }
  return texts;
}
