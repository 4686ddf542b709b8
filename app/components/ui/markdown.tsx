import ReactMarkdown from "react-markdown";

type Node = { type: string; value?: string; children?: Node[] };

/** Turns raw HTML in guide markdown into plain text, so `<script>` shows as the letters it is. */
function htmlAsText() {
  const walk = (node: Node) => {
    for (const child of node.children ?? []) {
      if (child.type === "html") child.type = "text";
      walk(child);
    }
  };
  return (tree: Node) => walk(tree);
}

/** Guide text: markdown only, links and emphasis; never HTML. */
export function Markdown({ children, className = "" }: { children: string; className?: string }) {
  return (
    <div className={`space-y-2 [&_a]:underline [&_ol]:list-decimal [&_ol]:pl-6 [&_ul]:list-disc [&_ul]:pl-6 ${className}`}>
      <ReactMarkdown remarkPlugins={[htmlAsText]} disallowedElements={["img"]} unwrapDisallowed>
        {children}
      </ReactMarkdown>
    </div>
  );
}
