type Node = { type: string; value?: string; children?: Node[] };

/** A remark plugin: raw HTML in guide markdown becomes plain text, so `<script>` shows as the letters it is. */
export function htmlAsText() {
  const walk = (node: Node) => {
    for (const child of node.children ?? []) {
      if (child.type === "html") child.type = "text";
      walk(child);
    }
  };
  return (tree: Node) => walk(tree);
}

/** What guide markdown may not contain even as markdown: pictures are not loaded from guide text. */
export const DISALLOWED_ELEMENTS = ["img"];
