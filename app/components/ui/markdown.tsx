import ReactMarkdown from "react-markdown";
import { DISALLOWED_ELEMENTS, htmlAsText } from "~/lib/guides/markdown-safety";
import { MARKDOWN_CLASSES } from "./markdown-classes";

/** Guide text: markdown only, links and emphasis; never HTML. */
export function Markdown({ children, className = "" }: { children: string; className?: string }) {
  return (
    <div className={`${MARKDOWN_CLASSES} ${className}`}>
      <ReactMarkdown remarkPlugins={[htmlAsText]} disallowedElements={DISALLOWED_ELEMENTS} unwrapDisallowed>
        {children}
      </ReactMarkdown>
    </div>
  );
}

/** For screens that draw guide text from its markdown (the desk's preview). */
export const markdownRenderer = (markdown: string, fill: (text: string) => string) => (
  <ReactMarkdown remarkPlugins={[htmlAsText]} disallowedElements={DISALLOWED_ELEMENTS} unwrapDisallowed>
    {fill(markdown)}
  </ReactMarkdown>
);
