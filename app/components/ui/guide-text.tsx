import { createContext, createElement, Fragment, useContext, type ReactNode } from "react";
import { isTextTag, type GuideTexts, type TextNode } from "~/lib/guides/text-tree";
import { MARKDOWN_CLASSES } from "./markdown-classes";

/** How guide text is drawn on this screen: from trees made on the server (the walk), or by a markdown renderer (the desk). */
export type TextRenderer = (markdown: string, fill: (text: string) => string) => ReactNode;

const Renderer = createContext<TextRenderer>((markdown, fill) => <p>{fill(markdown)}</p>);
export const GuideTextProvider = Renderer.Provider;

/** Guide text (markdown source), with the rig's own words filled in. */
export function GuideText({ text, fill = (t) => t, className = "" }: { text: string; fill?: (text: string) => string; className?: string }) {
  const render = useContext(Renderer);
  return <div className={`${MARKDOWN_CLASSES} ${className}`}>{render(text, fill)}</div>;
}

const VOID = new Set(["br", "hr"]);

function draw(nodes: TextNode[], fill: (text: string) => string): ReactNode[] {
  return nodes.map((node, i) => {
    if (typeof node === "string") return fill(node);
    const [tag, attrs, ...children] = node;
    if (!isTextTag(tag)) return <Fragment key={i}>{draw(children, fill)}</Fragment>;
    const props = { key: i, ...(tag === "a" && attrs?.href ? { href: attrs.href } : {}) };
    return VOID.has(tag) ? createElement(tag, props) : createElement(tag, props, ...draw(children, fill));
  });
}

/** Draws guide text from the trees the server made; text without a tree shows as plain words. */
export function treeRenderer(texts: GuideTexts): TextRenderer {
  return (markdown, fill) => {
    const tree = texts[markdown];
    return tree ? draw(tree, fill) : <p>{fill(markdown)}</p>;
  };
}
