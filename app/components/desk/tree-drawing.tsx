import { useMemo } from "react";
import { layoutTree, NODE } from "~/lib/guides/tree-layout";

const FILL: Record<string, string> = { check: "#ffffff", task: "#e8efe9", safety: "#ffd23f", fixed: "#0f4a2c", handoff: "#7f1111" };

/** The decision tree as a picture; clicking a step opens it in the editor. */
export function TreeDrawing({
  states,
  selected,
  onSelect,
}: {
  states: Record<string, { on?: Record<string, string>; meta?: { kind?: string } }>;
  selected: string | null;
  onSelect: (id: string) => void;
}) {
  const tree = useMemo(() => layoutTree(states), [states]);
  return (
    <div
      className="overflow-auto rounded-lg border-2 border-ink bg-paper"
      style={{ maxHeight: 520 }}
      tabIndex={0}
      role="region"
      aria-label="Drawing of the guide"
    >
      <svg width={tree.width} height={tree.height} role="img" aria-label="Decision tree of this guide">
        <defs>
          <marker id="arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="7" markerHeight="7" orient="auto-start-reverse">
            <path d="M0,0 L10,5 L0,10 z" fill="#101418" />
          </marker>
        </defs>
        {tree.edges.map((e) => {
          const mid = e.points[Math.floor(e.points.length / 2)];
          return (
            <g key={`${e.from}-${e.answer}`}>
              <polyline points={e.points.map((p) => `${p.x},${p.y}`).join(" ")} fill="none" stroke="#101418" strokeWidth={1.5} markerEnd="url(#arrow)" />
              {mid ? (
                <text x={mid.x + 4} y={mid.y} fontSize={11} fill="#101418">
                  {e.answer}
                </text>
              ) : null}
            </g>
          );
        })}
        {tree.nodes.map((n) => {
          const dark = n.kind === "fixed" || n.kind === "handoff";
          return (
            <g
              key={n.id}
              transform={`translate(${n.x - NODE.width / 2},${n.y - NODE.height / 2})`}
              onClick={() => onSelect(n.id)}
              style={{ cursor: "pointer" }}
            >
              <title>{`${n.kind}: ${n.id}`}</title>
              <rect
                width={NODE.width}
                height={NODE.height}
                rx={6}
                fill={FILL[n.kind] ?? "#ddd"}
                stroke={selected === n.id ? "#123f8c" : "#101418"}
                strokeWidth={selected === n.id ? 4 : 1.5}
              />
              <text x={8} y={17} fontSize={10} fill={dark ? "#ffffff" : "#101418"}>
                {n.kind}
              </text>
              <text x={8} y={33} fontSize={12} fontWeight={700} fill={dark ? "#ffffff" : "#101418"}>
                {n.id.length > 20 ? `${n.id.slice(0, 19)}…` : n.id}
              </text>
            </g>
          );
        })}
      </svg>
    </div>
  );
}
