import dagre from "@dagrejs/dagre";

export interface TreeNode {
  id: string;
  kind: string;
  x: number;
  y: number;
}

export interface TreeEdge {
  from: string;
  to: string;
  answer: string;
  points: { x: number; y: number }[];
}

export const NODE = { width: 150, height: 44 };

/** A top-down drawing of a guide's steps and answers, laid out by dagre. Tolerates half-written drafts. */
export function layoutTree(states: Record<string, { on?: Record<string, string>; meta?: { kind?: string } }>) {
  const g = new dagre.graphlib.Graph({ multigraph: true });
  g.setGraph({ rankdir: "TB", nodesep: 24, ranksep: 48, marginx: 8, marginy: 8 });
  g.setDefaultEdgeLabel(() => ({}));
  const ids = Object.keys(states);
  for (const id of ids) g.setNode(id, { ...NODE });
  for (const id of ids) {
    for (const [answer, to] of Object.entries(states[id]?.on ?? {})) {
      if (typeof to === "string" && to in states) g.setEdge(id, to, { label: answer, width: 36, height: 18 }, `${id}:${answer}`);
    }
  }
  dagre.layout(g);
  const nodes: TreeNode[] = ids.map((id) => ({ id, kind: states[id]?.meta?.kind ?? "?", x: g.node(id).x, y: g.node(id).y }));
  const edges: TreeEdge[] = g.edges().map((e) => ({ from: e.v, to: e.w, answer: String(e.name).split(":").pop()!, points: g.edge(e).points ?? [] }));
  const graph = g.graph();
  return { nodes, edges, width: graph.width ?? 0, height: graph.height ?? 0 };
}
